import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { type IsoDate, toDayNumber } from '../calendar/local-date';
import { minorUnitDigits } from '../money/currency';
import type { MoneyInput } from '../money/money';
import { toCurrencyAmount } from './currency-amount';

export type StatementEntryKind = 'invoice' | 'creditNote' | 'payment' | 'refund';

/**
 * An issued invoice, a credit note, a payment or a refund (money given back) on a job; amounts are given
 * positive (a credit note's amount is what it credits, a refund's what went back).
 */
export interface StatementEntry {
  kind: StatementEntryKind;
  on: IsoDate;
  ref: string;
  amount: MoneyInput;
}

export interface StatementLine {
  kind: StatementEntryKind;
  on: IsoDate;
  ref: string;
  amount: Decimal;
  /** what the client is charged by this line (invoices) */
  charge: Decimal;
  /** what comes off (credit notes and payments); a refund is a negative credit: it takes back part of a payment */
  credit: Decimal;
  /** running balance owed after this line */
  balance: Decimal;
}

export interface JobStatement {
  lines: StatementLine[];
  invoiced: Decimal;
  credited: Decimal;
  /** payments less refunds */
  paid: Decimal;
  /** invoiced − credited − paid */
  balanceDue: Decimal;
  /** contract sum − (invoiced − credited): what is still to be invoiced */
  unbilled: Decimal;
}

export interface JobStatementInput {
  contractSum: MoneyInput;
  currency: string;
  entries: readonly StatementEntry[];
}

/** On one day a charge comes before what pays or credits it, so the running balance never dips below zero for a moment. */
const KIND_ORDER: Readonly<Record<StatementEntryKind, number>> = { invoice: 0, creditNote: 1, payment: 2, refund: 3 };

/**
 * A job's statement: its invoices, credit notes and payments by date (invoices first on a day, then
 * as given), each with the running balance, and the totals (DOMAIN.md §2.11: the balance is what was
 * invoiced less payments and credits).
 */
export function jobStatement(input: JobStatementInput): JobStatement {
  const digits = minorUnitDigits(input.currency, 'currency');
  const contractSum = toCurrencyAmount(input.contractSum, digits, 'contractSum', 'contract sum');
  const parsed = input.entries.map((e, i) => {
    if (!Object.hasOwn(KIND_ORDER, e.kind)) {
      throw new DomainInputError(`entries[${i}].kind`, 'A statement line is an invoice, a credit note, a payment or a refund.');
    }
    return { i, day: toDayNumber(e.on, `entries[${i}].on`), entry: e, amount: toCurrencyAmount(e.amount, digits, `entries[${i}].amount`) };
  });
  parsed.sort((a, b) => a.day - b.day || KIND_ORDER[a.entry.kind] - KIND_ORDER[b.entry.kind] || a.i - b.i);

  const zero = new Decimal(0);
  const totals = { invoice: zero, creditNote: zero, payment: zero, refund: zero };
  let balance = zero;
  const lines = parsed.map(({ entry, amount }): StatementLine => {
    totals[entry.kind] = totals[entry.kind].plus(amount);
    if (entry.kind === 'invoice') {
      balance = balance.plus(amount);
      return { ...entry, amount, charge: amount, credit: zero, balance };
    }
    // A refund gives back part of a payment: the paid column goes down and the balance owed goes up.
    const credit = entry.kind === 'refund' ? amount.negated() : amount;
    balance = balance.minus(credit);
    return { ...entry, amount, charge: zero, credit, balance };
  });
  const paid = totals.payment.minus(totals.refund);
  const netInvoiced = totals.invoice.minus(totals.creditNote);
  return {
    lines,
    invoiced: totals.invoice,
    credited: totals.creditNote,
    paid,
    balanceDue: netInvoiced.minus(paid),
    unbilled: contractSum.minus(netInvoiced),
  };
}
