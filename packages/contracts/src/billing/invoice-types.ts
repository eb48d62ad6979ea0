/**
 * Invoices and credit notes, without zod. A draft has no number; issuing takes the next number of
 * the firm's series and freezes the document; voiding an issued invoice makes a numbered credit
 * note. Money: decimal strings in `currency`.
 */

import type { PaymentReceivedToday } from '../cash/cash-types';
import type { DepositCapPresetId, PaymentTermsSetting } from './billing-settings-types';
import type { AttentionNote, ClientCreditView, PaymentDetail } from '../payments/payment-types';

export const INVOICE_KINDS = ['deposit', 'milestone', 'progress', 'retainage', 'final'] as const;
export type InvoiceKind = (typeof INVOICE_KINDS)[number];
export const INVOICE_KIND_LABELS: Readonly<Record<InvoiceKind, string>> = {
  deposit: 'Deposit',
  milestone: 'Stage payment',
  progress: 'Progress invoice',
  retainage: 'Retainage release',
  final: 'Final invoice',
};

export const INVOICE_STATUSES = ['draft', 'issued', 'part_paid', 'paid', 'refunded', 'void'] as const;
export type InvoiceStatus = (typeof INVOICE_STATUSES)[number];
export const INVOICE_STATUS_LABELS: Readonly<Record<InvoiceStatus, string>> = {
  draft: 'Draft — not sent',
  issued: 'Open',
  part_paid: 'Part paid',
  paid: 'Paid',
  /** every payment on it was given back */
  refunded: 'Refunded',
  void: 'Void',
};

/**
 * A param of words the system wrote: plain text or a number as it is, or a date or an amount the
 * reader's locale formats.
 */
export type InvoiceWordsParam = string | number | { readonly date: string } | { readonly money: string; readonly currency: string };

/**
 * Words the system itself wrote into an invoice, by key (server words, area `invoiceWords`) and
 * params, kept beside the English text so each reader reads them in their own language. Text a
 * person typed has none: it prints as typed.
 */
export interface InvoiceWords {
  readonly key: string;
  readonly params?: Readonly<Record<string, InvoiceWordsParam>>;
}

/** One line of a deposit, stage, retainage or final invoice. */
export interface InvoiceLine {
  /** in English (the office's words), or as a person typed it */
  readonly label: string;
  readonly amount: string;
  readonly note?: string;
  /** the label by key, when the system wrote it (kept at drafting and issue; none on invoices issued before words were kept) */
  readonly words?: InvoiceWords;
}

/** A progress invoice's schedule of values, as billed (our own columns, in words). */
export interface ProgressTableLine {
  readonly valueLineId: string;
  readonly label: string;
  /** the label by key, when the system wrote it ("All the work") */
  readonly words?: InvoiceWords;
  readonly scheduledValue: string;
  readonly previousWork: string;
  readonly thisPeriodWork: string;
  readonly storedMaterials: string;
  readonly completedToDate: string;
  /** "80" = 80 % */
  readonly percentComplete: string;
  readonly balanceToFinish: string;
  readonly retainage: string;
}

export interface ProgressTable {
  readonly periodEnd: string;
  readonly lines: readonly ProgressTableLine[];
  readonly retainageRates: { readonly workPercent: number; readonly storedPercent: number; readonly stopAtPercentComplete: number | null };
  readonly summary: {
    readonly originalContractSum: string;
    readonly changeOrders: string;
    readonly contractSumToDate: string;
    readonly completedToDate: string;
    /** retainage held on the job to date (this application included) */
    readonly retainage: string;
    /** what this application kept back: `retainage` less the previous application's (absent on applications figured before it was kept) */
    readonly retainageThisPeriod?: string;
    readonly earnedLessRetainage: string;
    readonly previouslyBilled: string;
    readonly dueThisPeriod: string;
    /** retainage released by earlier releases (only when some was): it no longer waits in the balance to finish */
    readonly retainageReleased?: string;
    readonly balanceToFinishWithRetainage: string;
  };
}

/** What an issued invoice prints, frozen at issue. */
export interface InvoiceDocument {
  readonly firm: {
    readonly name: string;
    readonly addressLines: readonly string[];
    readonly phone: string;
    readonly taxId: string;
    readonly logoFileId: string | null;
  };
  readonly client: { readonly name: string; readonly email: string; readonly addressLines: readonly string[] };
  readonly site: { readonly label: string; readonly addressLines: readonly string[] };
  readonly jobTitle: string;
  /** "Net 14 (due 14 days after the invoice date)" */
  readonly termsText: string;
  /** the firm's deposit rule, by name ("No deposit limit" included) */
  readonly depositCapName: string;
  /** the terms themselves, so each reader reads `termsText` in their language (none on invoices issued before) */
  readonly terms?: PaymentTermsSetting;
  /** the ready-made deposit rule `depositCapName` names, if it is one (a rule the firm named itself has none) */
  readonly depositRule?: DepositCapPresetId;
  readonly footer: string;
  readonly locale: string;
}

export interface InvoiceSummary {
  readonly id: string;
  /** "INV-0007"; null for a draft */
  readonly number: string | null;
  readonly kind: InvoiceKind;
  readonly status: InvoiceStatus;
  /** open or part paid, and past its due date in the firm's time zone */
  readonly isOverdue: boolean;
  readonly jobId: string;
  readonly jobTitle: string;
  readonly clientId: string;
  readonly clientName: string;
  readonly issuedOn: string | null;
  readonly dueOn: string | null;
  readonly currency: string;
  readonly total: string;
  /** total − paid − credited (0 for a void invoice) */
  readonly amountDue: string;
  /** "queue" when the trigger drafted it, for the office to review */
  readonly origin: 'office' | 'queue';
  readonly createdAt: string;
}

export interface AuditTrailEntry {
  readonly at: string;
  readonly who: string;
  readonly action: string;
  /** "Issued as INV-0007", "Voided: billed twice" */
  readonly text: string;
}

export interface CreditNoteView {
  readonly id: string;
  readonly number: string;
  readonly invoiceId: string;
  readonly issuedOn: string;
  readonly amount: string;
  readonly currency: string;
  readonly reason: string;
}

export interface InvoiceReminderView {
  readonly step: string;
  /** "3 days before the due date", "On the due date", "7 days after the due date" */
  readonly label: string;
  readonly sentOn: string;
}

export interface InvoiceDetail extends InvoiceSummary {
  readonly scheduleLineId: string | null;
  readonly periodEnd: string | null;
  readonly subtotal: string;
  readonly depositCredit: string;
  readonly retainageHeld: string;
  readonly taxIncluded: string;
  readonly amountPaid: string;
  readonly amountCredited: string;
  readonly lines: readonly InvoiceLine[];
  readonly progress: ProgressTable | null;
  /** frozen at issue; for a draft, what it would print today */
  readonly document: InvoiceDocument;
  readonly notes: string;
  /** what drafted it, in words ("Base coat finished on every surface on 2026-12-10") */
  readonly triggerText: string | null;
  /**
   * A stage payment's draft whose layer was reopened after it was drafted (no longer finished on every
   * surface it covers): that layer's name, for the office to check before issuing; null otherwise.
   */
  readonly reopenedLayer: string | null;
  readonly sentAt: string | null;
  readonly voidReason: string | null;
  readonly creditNote: CreditNoteView | null;
  readonly payments: readonly PaymentDetail[];
  /** overpayments on this invoice kept as the client's credit */
  readonly clientCredits: readonly ClientCreditView[];
  readonly reminders: readonly InvoiceReminderView[];
  readonly auditTrail: readonly AuditTrailEntry[];
}

/** POST /api/jobs/:id/invoices — a draft the office asks for (progress or retainage release). */
export type InvoiceDraftCreate =
  | { readonly kind: 'progress'; readonly periodEnd: string }
  | { readonly kind: 'retainage' }
  | { readonly kind: 'line'; readonly scheduleLineId: string };

/** PATCH /api/invoices/:id — drafts only. */
export interface InvoiceDraftUpdate {
  readonly notes?: string;
  /** progress drafts: this period per value line, as an amount or a percent complete to date */
  readonly progressLines?: ReadonlyArray<{
    readonly valueLineId: string;
    readonly workToDate: { readonly percent: number } | { readonly amount: string };
    readonly storedMaterials: string;
  }>;
  readonly periodEnd?: string;
}

/** POST /api/invoices/:id/issue — `issuedOn` defaults to today in the firm's zone; `send` e-mails it. */
export interface InvoiceIssue {
  readonly issuedOn?: string;
  readonly send: boolean;
  /**
   * the total the office confirmed: issuing figures a progress application (and a release's deposit
   * credit) again, and refuses (409 naming `expectedTotal`) when that comes to another total
   */
  readonly expectedTotal?: string;
}

/** POST /api/invoices/:id/void */
export interface InvoiceVoid {
  readonly reason: string;
}

/** POST /api/invoices/:id/payments — an offline payment (cheque, transfer, cash). */
export interface OfflinePaymentCreate {
  readonly method: 'cheque' | 'transfer' | 'cash';
  readonly amount: string;
  readonly receivedOn: string;
  readonly reference: string;
  /** made once per form: the same payment sent again (a retry after a lost answer) is recorded once */
  readonly clientKey?: string;
}

export const INVOICE_LIST_FILTERS = ['all', 'drafts', 'open', 'overdue', 'paid', 'refunded', 'void'] as const;
export type InvoiceListFilter = (typeof INVOICE_LIST_FILTERS)[number];
export const INVOICE_LIST_FILTER_LABELS: Readonly<Record<InvoiceListFilter, string>> = {
  all: 'All',
  drafts: 'To review',
  open: 'Open',
  overdue: 'Overdue',
  paid: 'Paid',
  refunded: 'Refunded',
  void: 'Void',
};

export const INVOICE_LIMITS = { notesMaxLength: 2000, reasonMaxLength: 500, referenceMaxLength: 120, clientKeyMaxLength: 100 } as const;

/** GET /api/billing/today — the money part of Today (owner, office). */
export interface BillingToday {
  /** drafts waiting for a person: queue-drafted first, oldest first */
  readonly readyToBill: readonly InvoiceSummary[];
  readonly overdue: readonly InvoiceSummary[];
  readonly changeOrdersWaiting: ReadonlyArray<{
    readonly id: string;
    readonly jobId: string;
    readonly jobTitle: string;
    readonly number: number;
    readonly title: string;
    readonly amount: string;
    readonly currency: string;
    readonly sentAt: string;
  }>;
  /** payments received yesterday or today in the firm's zone, newest first */
  readonly paymentsReceived: readonly PaymentReceivedToday[];
  /** what the card processor left for a person to check, oldest first, until marked dealt with */
  readonly needsAttention: readonly AttentionNote[];
}
