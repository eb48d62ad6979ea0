import type { InquiryDetail, InquirySummary } from '@layerbook/contracts';

/** Columns every inquiry listing selects (raw SQL, so the list stays one indexed query). */
export const SUMMARY_COLUMNS = `i.id, i.contact_name, i.email, i.phone, i.site_address, i.stage, i.source, i.referrer_name,
  i.estimated_value::text as estimated_value, i.assignee_user_id, u.name as assignee_name,
  i.next_follow_up::text as next_follow_up, i.created_at, i.created_at::text as created_at_text`;

export const SUMMARY_FROM = `from inquiries i left join users u on u.id = i.assignee_user_id`;

export interface SummaryRow {
  id: string;
  contact_name: string;
  email: string;
  phone: string;
  site_address: string;
  stage: InquirySummary['stage'];
  source: InquirySummary['source'];
  referrer_name: string;
  estimated_value: string | null;
  assignee_user_id: string | null;
  assignee_name: string | null;
  next_follow_up: string | null;
  created_at: Date;
  created_at_text: string;
}

export function toSummary(r: SummaryRow, today: string): InquirySummary {
  const open = r.stage !== 'won' && r.stage !== 'lost';
  return {
    id: r.id,
    contactName: r.contact_name,
    email: r.email,
    phone: r.phone,
    siteAddress: r.site_address,
    stage: r.stage,
    source: r.source,
    referrerName: r.referrer_name,
    estimatedValue: r.estimated_value,
    assigneeUserId: r.assignee_user_id,
    assigneeName: r.assignee_name,
    nextFollowUp: r.next_follow_up,
    isFollowUpOverdue: open && r.next_follow_up !== null && r.next_follow_up < today,
    createdAt: r.created_at.toISOString(),
  };
}

export type DetailExtras = Omit<InquiryDetail, keyof InquirySummary | 'activities'>;
