import { isoUtcText } from '@layerbook/db';
import { isBudgetRange, isOpenStage, type InquiryDetail, type InquirySummary } from '@layerbook/contracts';

/** Columns every inquiry listing selects (raw SQL, so the list stays one indexed query). */
export const SUMMARY_COLUMNS = `i.id, i.contact_name, i.email, i.phone, i.site_address, i.stage, i.source, i.referrer_name,
  i.estimated_value::text as estimated_value, i.assignee_user_id, u.name as assignee_name,
  i.next_follow_up::text as next_follow_up, ${isoUtcText('i.created_at')} as created_at, i.created_at::text as created_at_text`;

export const SUMMARY_FROM = `from inquiries i left join users u on u.id = i.assignee_user_id`;

/** One row of SUMMARY_COLUMNS. */
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
  /** ISO 8601, UTC */
  created_at: string;
  created_at_text: string;
}

/** The columns the detail page adds to the summary's. */
export const DETAIL_COLUMNS = `i.year_built, i.rooms, i.finish_idea, i.timeline, i.budget_range,
  i.consent_to_contact, i.lost_reason, i.client_id, i.site_id`;

/** One row of SUMMARY_COLUMNS and DETAIL_COLUMNS. */
export interface DetailRow extends SummaryRow {
  year_built: number | null;
  rooms: string;
  finish_idea: string;
  timeline: string;
  budget_range: string;
  consent_to_contact: boolean;
  lost_reason: string;
  client_id: string | null;
  site_id: string | null;
}

export function toSummary(r: SummaryRow, today: string): InquirySummary {
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
    isFollowUpOverdue: isOpenStage(r.stage) && r.next_follow_up !== null && r.next_follow_up < today,
    createdAt: r.created_at,
  };
}

export function toDetail(r: DetailRow, today: string, activities: InquiryDetail['activities']): InquiryDetail {
  return {
    ...toSummary(r, today),
    yearBuilt: r.year_built,
    rooms: r.rooms,
    finishIdea: r.finish_idea,
    timeline: r.timeline,
    // The column is free text; anything the form no longer offers reads as not said.
    budgetRange: isBudgetRange(r.budget_range) ? r.budget_range : '',
    consentToContact: r.consent_to_contact,
    lostReason: r.lost_reason,
    clientId: r.client_id,
    siteId: r.site_id,
    activities,
  };
}
