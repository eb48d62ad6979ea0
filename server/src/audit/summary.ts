import type { AuditRecordLink } from '@layerbook/contracts';

export type AuditData = Readonly<Record<string, unknown>>;

/** A value of the entry's data as text ('' when absent or not a plain value). */
function t(data: AuditData, key: string): string {
  const v = data[key];
  return typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean' ? String(v) : '';
}

/** " (reason)" when there is one. */
const paren = (text: string) => (text ? ` (${text})` : '');
/** The names of changed fields: `changed`/`fields` arrays, or the keys of a `changed` object. */
function fieldsOf(data: AuditData): string {
  const v = data['changed'] ?? data['fields'];
  const names = Array.isArray(v) ? v.map(String) : v && typeof v === 'object' ? Object.keys(v) : [];
  return names.length ? `: ${names.join(', ')}` : '';
}
/** " to a@b.example", ", receipt RCT-0003": the value after its word, when there is one. */
const of = (data: AuditData, key: string, word: string) =>
  t(data, key) ? `${word.startsWith(',') ? '' : ' '}${word} ${t(data, key)}` : '';

type Say = (data: AuditData) => string;

/**
 * What each action the server records means, in a sentence from its data. Names the log does not
 * know yet still read ("Finish system archived") through `fallbackSummary`.
 */
const SAY: Readonly<Record<string, Say>> = {
  'staff.signedIn': (d) =>
    d['secondFactorBy'] === 'recoveryCode'
      ? 'Signed in with a recovery code'
      : `Signed in${d['secondFactor'] === true ? ' with the second factor' : ''}`,
  'staff.signedOut': () => 'Signed out',
  'staff.secondFactorEnrolled': () => 'Turned on the second factor (authenticator app)',
  'staff.secondFactorRemoved': () => 'Turned off the second factor',
  'staff.recoveryCodesRenewed': () => 'Made new recovery codes',
  'firm.secondFactorRequired': (d) =>
    d['required'] === false ? 'Made the second factor optional' : 'Required the second factor for the owner and office',
  'firm.created': () => 'Opened the firm',
  'firm.settings_changed': (d) => `Changed the firm's details${fieldsOf(d)}`,
  'firm.estimating_settings_changed': () => 'Changed rates, margins and tax for estimates',
  'firm.billing_settings_changed': () => 'Changed billing settings',
  'firm.logo_changed': () => 'Changed the logo',
  'firm.logo_removed': () => 'Removed the logo',
  'firm.exported': () => "Downloaded all the firm's data",
  'demo.seeded': () => 'Demo records added',
  'product.created': (d) => `Added product ${t(d, 'name')}`,
  'product.updated': (d) => `Changed a product${fieldsOf(d)}`,
  'product.archived': () => 'Archived a product',
  'product.unarchived': () => 'Brought a product back',
  'finish_system.created': (d) => `Added finish system ${t(d, 'name')}${d['copiedFrom'] ? ' (a copy)' : ''}`,
  'finish_system.updated': (d) => `Changed a finish system${fieldsOf(d)}`,
  'finish_system.archived': () => 'Archived a finish system',
  'finish_system.unarchived': () => 'Brought a finish system back',
  'estimate.created': () => 'Started an estimate',
  'estimate.saved': () => 'Saved an estimate (prices recomputed)',
  'proposal.created': (d) => `Made proposal version ${t(d, 'version')}`,
  'proposal.updated': (d) => `Changed proposal version ${t(d, 'version')}`,
  'proposal.sent': (d) => `Sent proposal version ${t(d, 'version')}${of(d, 'to', 'to')}`,
  'proposal.accepted': (d) => `Accepted proposal version ${t(d, 'version')} for ${t(d, 'total')}, signed "${t(d, 'signedName')}"`,
  'proposal.declined': (d) => `Declined proposal version ${t(d, 'version')}`,
  'proposal.changes_requested': (d) => `Asked for changes to proposal version ${t(d, 'version')}`,
  'change_order.created': (d) => `Drafted change order ${t(d, 'number')} for ${t(d, 'amount')}`,
  'change_order.updated': (d) => `Changed change order ${t(d, 'number')}${fieldsOf(d)}`,
  'change_order.sent': (d) => `Sent change order ${t(d, 'number')}${of(d, 'to', 'to')}`,
  'change_order.approved': (d) => `Approved change order ${t(d, 'number')} for ${t(d, 'amount')}`,
  'change_order.declined': (d) => `Declined change order ${t(d, 'number')}`,
  'invoice.drafted': (d) =>
    `Drafted a ${t(d, 'kind') || 'new'} invoice for ${t(d, 'total')}${d['origin'] === 'queue' ? ' (by the schedule)' : ''}`,
  'invoice.updated': (d) =>
    d['refigured'] ? `Refigured a draft invoice to ${t(d, 'total')}${paren(t(d, 'refigured'))}` : `Changed a draft invoice${fieldsOf(d)}`,
  'invoice.deleted': (d) => (d['withdrawn'] ? `Withdrew a draft invoice${paren(t(d, 'withdrawn'))}` : 'Deleted a draft invoice'),
  'invoice.issued': (d) => `Issued invoice ${t(d, 'number')} for ${t(d, 'total')}, due ${t(d, 'dueOn')}`,
  'invoice.sent': () => 'E-mailed an invoice to the client',
  'invoice.reminded': (d) => `Reminded the client of an invoice${paren(t(d, 'step'))}`,
  'invoice.voided': (d) => `Voided an invoice${paren(t(d, 'reason'))}; credit note ${t(d, 'creditNote')}`,
  'credit_note.issued': (d) => `Issued credit note ${t(d, 'number')} for ${t(d, 'amount')}`,
  'invoice.payment_recorded': (d) => `Recorded a payment of ${t(d, 'amount')} (${t(d, 'method')})${of(d, 'receipt', ', receipt')}`,
  'invoice.refund_requested': (d) => `Asked for a refund of ${t(d, 'amount')} (${t(d, 'method')})${paren(t(d, 'reason'))}`,
  'invoice.refund_recorded': (d) => `Refunded ${t(d, 'amount')}${of(d, 'receipt', ', receipt')}`,
  'invoice.refund_failed': (d) => `A refund of ${t(d, 'amount')} failed${paren(t(d, 'message'))}`,
  'invoice.refund_needs_attention': (d) => `A card refund of ${t(d, 'amount')} needs checking${paren(t(d, 'why'))}`,
  'invoice.payment_needs_attention': (d) =>
    `A card payment of ${t(d, 'amount')} ${t(d, 'currency')} needs checking (the checkout asked ${t(d, 'asked')} ${t(d, 'askedCurrency')})`,
  'invoice.attention_cleared': () => 'Marked a card payment or refund to check as dealt with',
  'billing.started': (d) => `Started billing${of(d, 'method', 'by')}`,
  'billing.schedule_updated': () => 'Changed the billing schedule',
  'billing.value_lines_updated': () => 'Changed the schedule of values',
  'billing.deposit_left_for_office': (d) => `Left the deposit for the office${paren(t(d, 'reason'))}`,
  'job.status_changed': (d) =>
    d['to'] === 'complete'
      ? 'Marked a job finished'
      : d['to'] === 'in_progress'
        ? 'Reopened a job'
        : `Cancelled a job${paren(t(d, 'reason'))}`,
  'job.created': (d) => `Job opened at acceptance, contract sum ${t(d, 'contractSum')} ${t(d, 'currency')}`.trimEnd(),
  'progress.marked': (d) => `Marked progress${paren(t(d, 'kind'))}${of(d, 'on', 'on')}`,
  'client.created': () => 'Added a client',
  'client.merged': (d) => `Merged ${t(d, 'mergedName')} into this client`,
  'client.language_changed': (d) => `Client's language set to ${t(d, 'to') || "the firm's"}`,
  'inquiry.reassigned': () => 'Reassigned an inquiry',
  'inquiry.stage_changed': (d) => `Moved an inquiry${of(d, 'to', 'to')}`,
  'inquiry_stages.likelihoods_changed': () => 'Changed the likelihood of each inquiry stage',
  'member.role_changed': () => "Changed a team member's role",
  'member.deactivated': () => 'Deactivated a team member',
  'member.reactivated': () => 'Reactivated a team member',
  'member.language_changed': (d) => `Language set to ${t(d, 'to') || "the firm's"}`,
  'invitation.sent': (d) => `Invited ${t(d, 'email')} as ${t(d, 'role')}`,
  'invitation.revoked': () => 'Withdrew an invitation',
  'invitation.accepted': (d) => `Joined the team as ${t(d, 'role')}`,
  'samples.board_created': (d) => `Made sample board ${t(d, 'label')}`,
  'samples.board_updated': (d) => `Changed a sample board${fieldsOf(d)}`,
  'samples.board_shown': (d) => `Showed sample board ${t(d, 'label')} to the client`,
  'samples.round_started': (d) => `Started round ${t(d, 'round')} of a sample board`,
  'samples.board_approved': (d) => `Approved sample board ${t(d, 'label')}`,
  'samples.changes_requested': (d) => `Asked for changes to sample board ${t(d, 'label')}`,
  'takeoff.room_created': (d) => `Added room ${t(d, 'name')}`,
  'takeoff.room_deleted': (d) => `Deleted room ${t(d, 'name')}`,
  'takeoff.surface_created': (d) => (d['copyOf'] ? 'Copied a surface' : 'Added a surface'),
  'takeoff.surface_deleted': (d) => `Deleted surface ${t(d, 'name')}`,
  'takeoff.surface_updated': (d) => (d['shapeAfter'] ? `Measured a surface again${fieldsOf(d)}` : `Changed a surface${fieldsOf(d)}`),
  'takeoff.room_updated': (d) => `Changed a room${fieldsOf(d)}`,
};

/** "finish_system.archived" → "Finish system archived"; "staff.secondFactorEnrolled" → "Staff second factor enrolled". */
export function fallbackSummary(action: string): string {
  const words = action
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .replace(/[._]+/g, ' ')
    .trim()
    .toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** The sentence for one entry; photo actions of any album read alike. */
export function auditSummary(action: string, data: AuditData): string {
  const say = SAY[action];
  if (say) return say(data).replace(/\s+/g, ' ').trim();
  if (action.endsWith('.photo_added')) return `Added a photo${paren(t(data, 'originalName'))}`;
  if (action.endsWith('.photo_deleted')) return `Deleted a photo${paren(t(data, 'originalName'))}`;
  return fallbackSummary(action);
}

/** The actions SAY explains (the spec checks every name the server records is among them). */
export const EXPLAINED_ACTIONS: readonly string[] = Object.keys(SAY);

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const idIn = (data: AuditData, key: string): string | null => {
  const v = data[key];
  return typeof v === 'string' && UUID.test(v) ? v : null;
};

/** Where the record is seen: its own page, or the page of what it belongs to (a credit note → its invoice). */
export function auditLink(entity: string, entityId: string | null, data: AuditData): AuditRecordLink | null {
  const own = (area: AuditRecordLink['area']) => (entityId ? { area, id: entityId } : null);
  const parent = (area: AuditRecordLink['area'], key: string) => {
    const id = idIn(data, key);
    return id ? { area, id } : null;
  };
  switch (entity) {
    case 'invoice':
      return own('invoice');
    case 'credit_note':
      return parent('invoice', 'invoiceId');
    case 'job':
      return own('job');
    case 'change_order':
    case 'job_photo':
      return parent('job', 'jobId');
    case 'client':
      return own('client');
    case 'estimate':
      return own('estimate');
    case 'proposal_version':
      return parent('estimate', 'estimateId') ?? parent('job', 'jobId');
    case 'inquiry':
      return own('inquiry');
    case 'sample_board':
      return own('sampleBoard');
    case 'sample_board_photo':
      return parent('sampleBoard', 'boardId');
    case 'finish_system':
      return own('finishSystem');
    case 'product':
      return { area: 'products', id: null };
    case 'membership':
    case 'invitation':
      return { area: 'team', id: null };
    case 'firm':
      return { area: 'settings', id: null };
    default:
      return null;
  }
}
