/**
 * The owner's cash, without zod (GET /api/cash/*). Money: decimal strings in `currency`; dates:
 * the firm's local dates (YYYY-MM-DD), months YYYY-MM. Every figure is computed by
 * `@layerbook/domain` (receivables), the same functions the CSV exports use.
 * Roles: owner and office read all of it except margins (owner only); crew gets 403.
 */
import type { InquiryStage } from '../inquiries/inquiry-types';
import type { PaymentMethod } from '../payments/payment-types';

/** Days past due as of the chosen date; "current" = not yet past due. Retainage is never in a bucket. */
export const CASH_AGING_BUCKETS = ['current', '1-30', '31-60', '61-90', '90+'] as const;
export type CashAgingBucket = (typeof CASH_AGING_BUCKETS)[number];
export const CASH_AGING_BUCKET_LABELS: Readonly<Record<CashAgingBucket, string>> = {
  current: 'Not yet due',
  '1-30': '1–30 days late',
  '31-60': '31–60 days late',
  '61-90': '61–90 days late',
  '90+': 'Over 90 days late',
};

export type CashBucketAmounts = Readonly<Record<CashAgingBucket, string>>;

/** One open invoice in the aging (drill-down). */
export interface CashReceivableInvoice {
  readonly invoiceId: string;
  /** "INV-0007" */
  readonly number: string;
  readonly clientId: string;
  readonly clientName: string;
  readonly jobId: string;
  readonly jobTitle: string;
  readonly dueOn: string;
  /** negative or 0 when not yet due */
  readonly daysPastDue: number;
  readonly bucket: CashAgingBucket;
  /** due now: total − retainage held − paid − credited */
  readonly amountDue: string;
  /** retainage still held on this invoice (not in any bucket) */
  readonly retainage: string;
}

/** One client's open receivables. */
export interface CashReceivableClient {
  readonly clientId: string;
  readonly clientName: string;
  readonly buckets: CashBucketAmounts;
  /** Σ buckets (retainage excluded) */
  readonly total: string;
  readonly retainage: string;
  readonly invoiceCount: number;
}

/** GET /api/cash/receivables?asOf=YYYY-MM-DD (default: today in the firm's zone). */
export interface CashReceivables {
  readonly asOf: string;
  readonly currency: string;
  readonly buckets: CashBucketAmounts;
  /** Σ buckets, retainage excluded */
  readonly total: string;
  /** retainage held, apart from the buckets */
  readonly retainage: string;
  /** how many open invoices (or invoices with retainage still held) make up the figures */
  readonly invoiceCount: number;
  /** how many clients owe anything (retainage included) */
  readonly clientCount: number;
  /** largest total first: the 25 owing most unless all were asked for (`clients=all`) */
  readonly clients: readonly CashReceivableClient[];
}

/** GET /api/cash/receivables/invoices?asOf&age&client: the invoices behind a figure (the drill-down). */
export interface CashReceivableInvoices {
  readonly asOf: string;
  readonly currency: string;
  readonly age: CashAgingBucket | null;
  readonly clientId: string | null;
  /** most days past due first, then by number */
  readonly invoices: readonly CashReceivableInvoice[];
}

/** One calendar month in the firm's zone: payments by their received date, refunds by their refund date. */
export interface CashReceivedMonth {
  /** "2026-07" */
  readonly month: string;
  readonly received: string;
  readonly paymentCount: number;
  /** refunds that went through (succeeded) in the month */
  readonly refunded: string;
  readonly refundCount: number;
  /** received − refunded */
  readonly net: string;
}

/** GET /api/cash/received: the 12 months ending with this month, oldest first. */
export interface CashReceived {
  readonly currency: string;
  readonly months: readonly CashReceivedMonth[];
  readonly totals: { readonly received: string; readonly refunded: string; readonly net: string };
}

/** The three parts of the forecast, always shown apart. */
export const CASH_FORECAST_PARTS = ['invoices', 'scheduled', 'pipeline'] as const;
export type CashForecastPart = (typeof CASH_FORECAST_PARTS)[number];
export const CASH_FORECAST_PART_LABELS: Readonly<Record<CashForecastPart, string>> = {
  invoices: 'Open invoices',
  scheduled: 'Scheduled billing not yet invoiced',
  pipeline: 'Likely deposits from open inquiries',
};

export type CashForecastAmounts = Readonly<Record<CashForecastPart, string>> & { readonly total: string };

/** One week, Monday to Sunday. */
export interface CashForecastWeek extends CashForecastAmounts {
  /** Monday of the week */
  readonly weekStart: string;
  /** "2026-W49" */
  readonly isoWeek: string;
}

/** Where a stage's odds come from. */
export type CashOddsSource = 'firm' | 'default';

export interface CashStageOdds {
  readonly stage: InquiryStage;
  readonly label: string;
  /** 0–100 */
  readonly percent: number;
  /** "firm": the firm's own likelihood for the stage (Inquiries settings); "default": common practice, no source */
  readonly source: CashOddsSource;
  readonly openCount: number;
}

/** GET /api/cash/forecast: 13 weeks from this week (overdue invoices fall in week 1). */
export interface CashForecast {
  readonly asOf: string;
  readonly currency: string;
  readonly weeks: readonly CashForecastWeek[];
  /** expected after the 13th week, by part */
  readonly beyondHorizon: CashForecastAmounts;
  /** Σ weeks + beyond, by part */
  readonly totals: CashForecastAmounts;
  /** the odds used to weight inquiry deposits, per open stage */
  readonly odds: readonly CashStageOdds[];
  /** plain words: how each part was dated and weighted */
  readonly notes: readonly string[];
}

/** Margin of one job (owner only). "Costs" are the estimate's cost lines (labour, materials, …). */
export interface CashJobMargin {
  /** the accepted estimate's cost; null when the job has no estimate with costs */
  readonly estimatedCost: string | null;
  /** contracted − estimated cost */
  readonly estimatedMargin: string | null;
  /** "23.5" = 23.5 % of contracted; null when unknown or nothing contracted */
  readonly estimatedMarginPercent: string | null;
  /** actual costs are not recorded yet: always null, with the reason */
  readonly actualCost: string | null;
  readonly actualMargin: string | null;
  readonly actualMarginPercent: string | null;
  readonly actualMarginReason: string | null;
}

export interface CashJobRow {
  readonly jobId: string;
  readonly title: string;
  readonly clientId: string;
  readonly clientName: string;
  readonly status: string;
  /** the accepted proposal's price; null when the job has none */
  readonly estimated: string | null;
  /** original contract sum + approved change orders */
  readonly contracted: string;
  readonly changeOrders: string;
  /** issued invoices (draft and void excluded), less credit notes */
  readonly invoiced: string;
  /** payments applied less refunds */
  readonly paid: string;
  /** present for the owner only */
  readonly margin?: CashJobMargin;
}

/** GET /api/cash/jobs. */
export interface CashJobs {
  readonly currency: string;
  /** accepted ÷ decided (accepted + declined) proposals */
  readonly winRate: { readonly accepted: number; readonly decided: number; readonly percent: string | null };
  /** mean contracted sum of the jobs; null with no jobs */
  readonly averageJobSize: string | null;
  /** false for the office: no row carries `margin` */
  readonly marginsShown: boolean;
  /** jobs not cancelled (the average's base); the list holds the newest 200 */
  readonly jobCount: number;
  /** newest first, at most 200 */
  readonly jobs: readonly CashJobRow[];
}

/** A payment received since yesterday (Today's money part). */
export interface PaymentReceivedToday {
  readonly paymentId: string;
  /** "R-0007"; null only for a payment recorded before receipts were numbered */
  readonly receiptNumber: string | null;
  readonly clientId: string;
  readonly clientName: string;
  readonly invoiceId: string;
  readonly invoiceNumber: string | null;
  readonly amount: string;
  readonly currency: string;
  readonly method: PaymentMethod;
  readonly receivedOn: string;
}
