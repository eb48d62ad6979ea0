import {
  INVOICE_KIND_LABELS,
  INVOICE_STATUS_LABELS,
  MONEY_AMOUNT_PATTERN,
  SCHEDULE_LINE_STATUS_LABELS,
  type BillingTrigger,
  type InvoiceSummary,
  type RetainageSetting,
  type ScheduleLineStatus,
} from '@layerbook/contracts/types';
import { DomainInputError, formatMoney, fromMinorUnits, minorUnitDigits, toMinorUnits } from '@layerbook/domain';
import { formatCalendarDate } from '../../../shared/ui/calendar-date-pipe';
import { toAmount } from '../../../shared/forms/money-input';

export type ScheduleLineRole = 'deposit' | 'milestone' | 'final';

/** What each schedule line is, in the office's words. */
export const LINE_ROLE_LABELS: Readonly<Record<ScheduleLineRole, string>> = {
  deposit: 'Deposit',
  milestone: 'Stage payment',
  final: 'Final payment',
};

const LINE_STATUS_ICONS: Readonly<Record<ScheduleLineStatus, string>> = {
  draft: 'edit_note',
  scheduled: 'schedule',
  ready: 'notification_important',
  invoiced: 'receipt_long',
};

/** A line's status as a word with an icon beside it, so it never reads by colour alone. */
export function lineStatus(status: ScheduleLineStatus): { readonly word: string; readonly icon: string } {
  return { word: SCHEDULE_LINE_STATUS_LABELS[status], icon: LINE_STATUS_ICONS[status] };
}

/** What makes a line due, said plainly: "When Lime base coat is finished on every surface". */
export function triggerWords(trigger: BillingTrigger, layerName: string | null, locale: string): string {
  switch (trigger.kind) {
    case 'acceptance':
      return 'When billing starts';
    case 'date':
      return `On ${formatCalendarDate(trigger.date, locale)}`;
    case 'layerComplete':
      return `When ${layerName?.trim() || 'the chosen layer'} is finished on every surface`;
    case 'walkthrough':
      return 'At the final walkthrough';
  }
}

/** Amounts as typed (thousands separators allowed) in minor units, or null when any is not an amount yet. */
function typedMinorUnits(typed: readonly string[], currency: string): number[] | null {
  const out: number[] = [];
  for (const text of typed) {
    const amount = toAmount(text) ?? '0';
    if (!MONEY_AMOUNT_PATTERN.test(amount)) return null;
    try {
      out.push(toMinorUnits(amount, currency));
    } catch (error) {
      if (error instanceof DomainInputError) return null;
      throw error;
    }
  }
  return out;
}

function money(minor: number, currency: string, locale: string): string {
  return formatMoney(fromMinorUnits(minor, currency).toFixed(minorUnitDigits(currency)), currency, locale);
}

/**
 * Whether the typed amounts add up to the contract sum, and if not, by how much in words. Null
 * while an amount is not yet an amount (its own field says so). Sums are exact minor units.
 */
export function sumDifferenceWords(
  typed: readonly string[],
  contractSum: string,
  currency: string,
  locale: string,
): { readonly isExact: boolean; readonly text: string } | null {
  const amounts = typedMinorUnits(typed, currency);
  if (amounts === null) return null;
  const total = amounts.reduce((a, b) => a + b, 0);
  const target = toMinorUnits(contractSum, currency);
  const gap = total - target;
  const sum = money(target, currency, locale);
  if (gap === 0) return { isExact: true, text: `The lines add up to the contract sum of ${sum}.` };
  const side = gap < 0 ? 'short of' : 'over';
  return {
    isExact: false,
    text: `The lines add up to ${money(total, currency, locale)}: ${money(Math.abs(gap), currency, locale)} ${side} the contract sum of ${sum}.`,
  };
}

/**
 * The deposit lines against the cap of the firm's rule, naming the rule: null while an amount is
 * not an amount. `cap` is the rule in money for this contract (null: the rule sets no limit).
 */
export function depositCapWords(
  typedDeposits: readonly string[],
  cap: string | null,
  ruleName: string,
  currency: string,
  locale: string,
): { readonly isWithin: boolean; readonly text: string } | null {
  const amounts = typedMinorUnits(typedDeposits, currency);
  if (amounts === null) return null;
  const deposit = amounts.reduce((a, b) => a + b, 0);
  if (cap === null) return { isWithin: true, text: `The deposit of ${money(deposit, currency, locale)} has no cap under “${ruleName}”.` };
  const limit = toMinorUnits(cap, currency);
  const capText = money(limit, currency, locale);
  if (deposit <= limit) {
    return {
      isWithin: true,
      text: `The deposit of ${money(deposit, currency, locale)} is within ${capText}, the cap under “${ruleName}”.`,
    };
  }
  return {
    isWithin: false,
    text: `The deposit of ${money(deposit, currency, locale)} is ${money(deposit - limit, currency, locale)} over ${capText}, the cap under “${ruleName}”.`,
  };
}

/** The net change of the approved change orders: contract sum to date less the original, exact. */
export function changeOrdersNet(contractSum: string, originalContractSum: string, currency: string): string {
  const net = toMinorUnits(contractSum, currency) - toMinorUnits(originalContractSum, currency);
  return fromMinorUnits(net, currency).toFixed(minorUnitDigits(currency));
}

/** An invoice of the job in a row: its number (or that it is a draft), kind and status in words. */
export function invoiceWords(invoice: Pick<InvoiceSummary, 'number' | 'kind' | 'status' | 'isOverdue'>): {
  readonly number: string;
  readonly kind: string;
  readonly status: string;
} {
  return {
    number: invoice.number ?? 'Draft',
    kind: INVOICE_KIND_LABELS[invoice.kind],
    status: invoice.isOverdue ? `${INVOICE_STATUS_LABELS[invoice.status]} · overdue` : INVOICE_STATUS_LABELS[invoice.status],
  };
}

/** Retainage in words: "10 % of work and 5 % of stored materials, held until the job is 50 % complete". */
export function retainageWords(r: RetainageSetting): string {
  if (r.workPercent === 0 && r.storedPercent === 0) return 'None held';
  const held = `${r.workPercent} % of work and ${r.storedPercent} % of materials stored on site`;
  return r.stopAtPercentComplete === null
    ? `${held}, held to the end of the job`
    : `${held}, no more held once the job is ${r.stopAtPercentComplete} % complete`;
}

/** What the server said about a control no field shows (the method, the list of lines), if anything. */
export function serverSaid(control: { readonly errors: Record<string, unknown> | null }): string | null {
  const said = control.errors?.['server'];
  return typeof said === 'string' ? said : null;
}
