import { INVOICE_LIST_FILTERS } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { transferPayment } from '../payments/payment-fixtures';
import {
  canBeVoided,
  filterOrder,
  invoiceNumber,
  invoiceStatus,
  kindWord,
  mustRefundBeforeVoid,
  paymentRecordedWords,
  retainageWords,
  takesPayments,
} from './invoice-words';

describe('invoice words', () => {
  it.each([
    [{ status: 'draft', isOverdue: false }, 'Draft — not sent', 'edit_note'],
    [{ status: 'issued', isOverdue: false }, 'Open', 'schedule'],
    [{ status: 'issued', isOverdue: true }, 'Overdue', 'alarm'],
    [{ status: 'part_paid', isOverdue: false }, 'Part paid', 'hourglass_bottom'],
    [{ status: 'part_paid', isOverdue: true }, 'Overdue — part paid', 'alarm'],
    [{ status: 'paid', isOverdue: false }, 'Paid', 'task_alt'],
    // a paid or void invoice is never overdue, whatever the flag says
    [{ status: 'paid', isOverdue: true }, 'Paid', 'task_alt'],
    [{ status: 'void', isOverdue: true }, 'Void', 'block'],
    // every payment given back: said in words with its own icon, never overdue
    [{ status: 'refunded', isOverdue: true }, 'Refunded', 'undo'],
  ] as const)('%o reads "%s" with the %s icon', (invoice, word, icon) => {
    const look = invoiceStatus(invoice);
    expect(look.word).toBe(word);
    expect(look.icon).toBe(icon);
    expect(look.isOverdue).toBe(icon === 'alarm');
  });

  // the server's rule (voidInvoice): not a draft, not void, and nothing paid kept on it
  it.each([
    ['draft', '0.00', false, false],
    ['issued', '0.00', true, false],
    // issued with nothing due: it reads paid, nothing was paid, and the server voids it
    ['paid', '0.00', true, false],
    ['paid', '4200.00', false, true],
    ['part_paid', '200.00', false, true],
    // every payment given back
    ['refunded', '0.00', true, false],
    ['void', '0.00', false, false],
  ] as const)('a %s invoice with %s paid: void offered %s, refund first %s', (status, amountPaid, voidable, refundFirst) => {
    const invoice = { status, amountPaid, currency: 'USD' };
    expect(canBeVoided(invoice)).toBe(voidable);
    expect(mustRefundBeforeVoid(invoice)).toBe(refundFirst);
  });

  it('names kinds in our words', () => {
    expect(kindWord('milestone')).toBe('Stage payment');
    expect(kindWord('retainage')).toBe('Retainage release');
  });

  it('shows "Draft" until a number is taken', () => {
    expect(invoiceNumber({ number: null })).toBe('Draft');
    expect(invoiceNumber({ number: 'INV-0007' })).toBe('INV-0007');
  });

  it('puts "To review" first only while there are drafts', () => {
    expect(filterOrder(true)).toEqual(['drafts', ...INVOICE_LIST_FILTERS.filter((f) => f !== 'drafts')]);
    expect(filterOrder(true).slice(0, 3)).toEqual(['drafts', 'all', 'open']);
    expect(filterOrder(false)).toEqual(INVOICE_LIST_FILTERS);
    expect(filterOrder(false).slice(0, 2)).toEqual(['all', 'drafts']);
  });

  it('takes payments only on open invoices (a refunded one is owed again)', () => {
    expect(['draft', 'issued', 'part_paid', 'paid', 'refunded', 'void'].map((s) => takesPayments(s as never))).toEqual([
      false,
      true,
      true,
      false,
      true,
      false,
    ]);
  });

  it('says the retainage rates in words', () => {
    expect(retainageWords({ workPercent: 10, storedPercent: 5, stopAtPercentComplete: null })).toBe(
      '10 % of work, 5 % of stored materials',
    );
    expect(retainageWords({ workPercent: 10, storedPercent: 10, stopAtPercentComplete: 50 })).toBe(
      '10 % of work, 10 % of stored materials, until 50 % complete',
    );
  });

  it('names the new payment’s receipt once it is recorded', () => {
    const second = { ...transferPayment, id: 'pay-9', receiptNumber: 'RCT-0010' };
    expect(paymentRecordedWords([transferPayment], { status: 'paid', payments: [transferPayment, second] })).toBe(
      'Payment recorded as receipt RCT-0010: the invoice is paid.',
    );
    expect(paymentRecordedWords([], { status: 'part_paid', payments: [second] })).toBe('Payment recorded as receipt RCT-0010.');
    expect(paymentRecordedWords([], { status: 'part_paid', payments: [{ ...second, receiptNumber: null }] })).toBe('Payment recorded.');
  });
});
