import { expectInputError } from '../errors/expect-input-error';
import { paymentLabelWords, termsWords } from './invoice-words';
import { paymentLabel, type PaymentTrigger } from './payment-schedule';

// Which words an invoice keeps by key is our own rule (common practice, no source): only the labels paymentLabel wrote.
describe('a payment line label by key', () => {
  const roles = ['deposit', 'milestone', 'final'] as const;
  const layer: PaymentTrigger = { kind: 'layerComplete', layerId: 'l1' };

  it.each(roles)('recognises every label paymentLabel writes for a %s', (role) => {
    expect(paymentLabelWords(paymentLabel(role, { kind: 'acceptance' }), role, { kind: 'acceptance' })).toEqual({
      key: `line.${role}.acceptance`,
    });
    expect(paymentLabelWords(paymentLabel(role, { kind: 'walkthrough' }), role, { kind: 'walkthrough' })).toEqual({
      key: `line.${role}.walkthrough`,
    });
    const date: PaymentTrigger = { kind: 'date', date: '2026-12-10' };
    expect(paymentLabelWords(paymentLabel(role, date), role, date)).toEqual({
      key: `line.${role}.date`,
      params: { date: { date: '2026-12-10' } },
    });
    expect(paymentLabelWords(paymentLabel(role, layer, 'Base coat'), role, layer)).toEqual({
      key: `line.${role}.layerComplete`,
      params: { layer: 'Base coat' },
    });
    expect(paymentLabelWords(paymentLabel(role, layer), role, layer)).toEqual({ key: `line.${role}.layerCompleteUnnamed` });
  });

  it('keeps the firm’s layer name as typed, words and all', () => {
    const label = paymentLabel('milestone', layer, 'Lime plaster, second coat (when dry)');
    expect(paymentLabelWords(label, 'milestone', layer)?.params).toEqual({ layer: 'Lime plaster, second coat (when dry)' });
  });

  it.each<[string, 'deposit' | 'milestone' | 'final', PaymentTrigger]>([
    ['Deposit', 'deposit', { kind: 'acceptance' }],
    ['Deposit on acceptance (50 %)', 'deposit', { kind: 'acceptance' }],
    // the role's words do not match the line's role: the office changed one or the other
    ['Deposit on acceptance', 'final', { kind: 'acceptance' }],
    ['Deposit due 2026-12-11', 'deposit', { kind: 'date', date: '2026-12-10' }],
    ['Progress payment when  is finished on every surface', 'milestone', { kind: 'layerComplete', layerId: 'l1' }],
    ['Progress payment when the walls are finished', 'milestone', { kind: 'layerComplete', layerId: 'l1' }],
    ['Final payment after the walkthrough', 'final', { kind: 'walkthrough' }],
  ])('leaves a typed label %j as typed', (label, role, trigger) => expect(paymentLabelWords(label, role, trigger)).toBeNull());
});

describe('payment terms by key', () => {
  it('names the terms termsText writes', () => {
    expect(termsWords({ kind: 'onReceipt' })).toEqual({ key: 'terms.onReceipt' });
    expect(termsWords({ kind: 'net', days: 1 })).toEqual({ key: 'terms.netOneDay', params: { days: 1 } });
    expect(termsWords({ kind: 'net', days: 14 })).toEqual({ key: 'terms.net', params: { days: 14 } });
  });

  it('refuses terms termsText refuses, naming the field', () => {
    expectInputError(() => termsWords({ kind: 'net', days: 0 }), 'terms.days');
  });
});
