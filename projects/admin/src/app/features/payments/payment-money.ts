import { minorUnitDigits, roundToCurrency } from '@layerbook/contracts/engine';
import type { ClientCreditView, PaymentDetail } from '@layerbook/contracts/types';

/** What became of one payment, as amounts in its currency ("120.00"); worked out exactly, never as floats. */
export interface PaymentParts {
  /** what went on the invoice */
  readonly onInvoice: string;
  /** what was paid beyond it, kept as the client's credit */
  readonly keptAsCredit: string;
  readonly refunded: string;
  readonly refundable: string;
  readonly canRefund: boolean;
  /** refunds being sent back to the card and not yet confirmed */
  readonly pending: string;
}

const fixed = (amount: { toFixed(digits: number): string }, currency: string): string => amount.toFixed(minorUnitDigits(currency));

export function paymentParts(payment: PaymentDetail): PaymentParts {
  const { currency } = payment;
  const amount = roundToCurrency(payment.amount, currency);
  const applied = roundToCurrency(payment.amountApplied, currency);
  const refundable = roundToCurrency(payment.refundable, currency);
  const refunded = roundToCurrency(payment.amountRefunded, currency);
  const pending = amount.minus(refunded).minus(refundable);
  return {
    onInvoice: fixed(applied, currency),
    keptAsCredit: fixed(amount.minus(applied), currency),
    refunded: fixed(refunded, currency),
    refundable: fixed(refundable, currency),
    canRefund: refundable.greaterThan(0),
    pending: fixed(pending.greaterThan(0) ? pending : 0, currency),
  };
}

/**
 * How a refund of `amount` splits: refunds come first out of the payment's credit part (what was
 * paid beyond the invoice), then off what went on the invoice, which then has that much due again.
 * Null for an amount that is not a plain number.
 */
export function refundSplit(payment: PaymentDetail, amount: string): { readonly fromCredit: string; readonly fromInvoice: string } | null {
  const { currency } = payment;
  if (!/^\d+(\.\d+)?$/.test(amount)) return null;
  const asked = roundToCurrency(amount, currency);
  const credit = roundToCurrency(payment.amount, currency).minus(roundToCurrency(payment.amountApplied, currency));
  // Given back already (or on its way): taken out of the credit part first.
  const taken = roundToCurrency(payment.amount, currency).minus(roundToCurrency(payment.refundable, currency));
  const creditLeft = credit.minus(taken).greaterThan(0) ? credit.minus(taken) : roundToCurrency(0, currency);
  const fromCredit = asked.lessThan(creditLeft) ? asked : creditLeft;
  return { fromCredit: fixed(fromCredit, currency), fromInvoice: fixed(asked.minus(fromCredit), currency) };
}

/**
 * The client's credit from this invoice's payments still kept, per currency (a payment in another
 * currency is kept whole in its own); credits already used on another invoice are left out, and a
 * currency whose credit was all given back is not listed.
 */
export function creditKept(credits: readonly ClientCreditView[]): ReadonlyArray<{ readonly currency: string; readonly amount: string }> {
  const totals = new Map<string, ReturnType<typeof roundToCurrency>>();
  for (const credit of credits) {
    if (credit.usedOnInvoiceId !== null) continue;
    const before = totals.get(credit.currency) ?? roundToCurrency(0, credit.currency);
    totals.set(credit.currency, before.plus(roundToCurrency(credit.amount, credit.currency)));
  }
  return [...totals]
    .filter(([, amount]) => amount.greaterThan(0))
    .map(([currency, amount]) => ({ currency, amount: fixed(amount, currency) }));
}
