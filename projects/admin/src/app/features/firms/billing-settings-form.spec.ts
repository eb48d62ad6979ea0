import { DEFAULT_BILLING_SETTINGS, DEPOSIT_CAP_PRESETS, type BillingSettings } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { applyPreset, billingSettingsForm, fillBillingForm, presetOf, readBillingForm } from './billing-settings-form';

const california: BillingSettings = {
  depositCap: { kind: 'lesserOf', amount: '1000.00', percent: 10 },
  depositCapName: DEPOSIT_CAP_PRESETS[1].name,
  terms: { kind: 'onReceipt' },
  retainage: { workPercent: 10, storedPercent: 5, stopAtPercentComplete: 50 },
  depositCredit: 'next',
  depositAtAcceptance: 'issueAndSend',
  reminders: { isOn: true, daysBefore: null, onDueDate: true, everyDaysAfter: 7, maxAfter: 3 },
  invoicePrefix: 'INV-',
  creditNotePrefix: 'CN-',
  invoiceFooter: 'Thank you.',
};

describe('billing settings form ↔ BillingSettings', () => {
  it.each([
    ['the starting values', DEFAULT_BILLING_SETTINGS],
    ['a firm under the California rule, on receipt, stepping retainage', california],
  ])('reads back %s unchanged', (_, settings) => {
    const form = billingSettingsForm();
    fillBillingForm(form, settings);
    expect(form.valid).toBe(true);
    expect(readBillingForm(form)).toEqual(settings);
  });

  it('sends null for a switched-off choice, never the number left in its field', () => {
    const form = billingSettingsForm();
    fillBillingForm(form, DEFAULT_BILLING_SETTINGS);
    form.controls.reminders.controls.hasDaysBefore.setValue(false);
    form.controls.retainage.controls.stops.setValue(false);
    form.controls.retainage.controls.stopAtPercentComplete.setValue(40);
    const read = readBillingForm(form);
    expect(read.reminders.daysBefore).toBeNull();
    expect(read.retainage.stopAtPercentComplete).toBeNull();
  });

  it('asks for the fields a choice uses, with the API limits (percent 0–100, net 1–365 whole days)', () => {
    const form = billingSettingsForm();
    fillBillingForm(form, DEFAULT_BILLING_SETTINGS);
    const cap = form.controls.depositCap.controls;
    cap.kind.setValue('lesserOf');
    expect(cap.amount.hasError('required')).toBe(true);
    expect(cap.percent.hasError('required')).toBe(true);
    cap.percent.setValue(101);
    expect(cap.percent.hasError('max')).toBe(true);
    const days = form.controls.terms.controls.days;
    days.setValue(366);
    expect(days.hasError('max')).toBe(true);
    days.setValue(0);
    expect(days.hasError('min')).toBe(true);
    days.setValue(14.5);
    expect(days.hasError('whole')).toBe(true);
    form.controls.terms.controls.kind.setValue('onReceipt');
    days.setValue(null);
    expect(days.valid).toBe(true);
    form.controls.invoicePrefix.setValue('A-VERY-LONG-PREFIX');
    expect(form.controls.invoicePrefix.hasError('maxlength')).toBe(true);
    form.controls.invoicePrefix.setValue('INV#');
    expect(form.controls.invoicePrefix.hasError('pattern')).toBe(true);
    form.controls.invoicePrefix.setValue('2027/INV_');
    expect(form.controls.invoicePrefix.valid).toBe(true);
    // The API takes a percent with decimals (7.5 %), so the form does too.
    form.controls.retainage.controls.workPercent.setValue(7.5);
    expect(form.controls.retainage.controls.workPercent.valid).toBe(true);
  });

  it('keeps the credit notes’ prefix apart from the invoices’, and both from the receipts’ (the API’s prefixClash)', () => {
    const form = billingSettingsForm();
    fillBillingForm(form, DEFAULT_BILLING_SETTINGS);
    const { invoicePrefix, creditNotePrefix } = form.controls;
    creditNotePrefix.setValue(' inv- ');
    expect(creditNotePrefix.hasError('prefix-same')).toBe(true);
    expect(invoicePrefix.valid).toBe(true);
    // Changing the other field clears it.
    invoicePrefix.setValue('A-');
    expect(creditNotePrefix.valid).toBe(true);
    invoicePrefix.setValue('RCT-');
    expect(invoicePrefix.hasError('prefix-receipts')).toBe(true);
  });

  it('asks for at least one reminder after the due date while those are ticked', () => {
    const form = billingSettingsForm();
    fillBillingForm(form, DEFAULT_BILLING_SETTINGS);
    const { hasEveryDaysAfter, maxAfter } = form.controls.reminders.controls;
    maxAfter.setValue(0);
    expect(maxAfter.hasError('noneAfter')).toBe(true);
    hasEveryDaysAfter.setValue(false);
    expect(maxAfter.valid).toBe(true);
    // Reminders switched off hide the count: it cannot then stop a save.
    hasEveryDaysAfter.setValue(true);
    expect(maxAfter.hasError('noneAfter')).toBe(true);
    form.controls.reminders.controls.isOn.setValue(false);
    expect(maxAfter.valid).toBe(true);
  });

  it('sends a share rule as a whole percent and an amount without separators', () => {
    const form = billingSettingsForm();
    fillBillingForm(form, DEFAULT_BILLING_SETTINGS);
    form.controls.depositCap.setValue({ kind: 'amount', amount: '2,500', percent: 30 });
    expect(readBillingForm(form).depositCap).toEqual({ kind: 'amount', amount: '2500' });
    form.controls.depositCap.setValue({ kind: 'share', amount: '2,500', percent: 30 });
    expect(readBillingForm(form).depositCap).toEqual({ kind: 'share', percent: 30 });
  });
});

describe('deposit rule presets', () => {
  it('knows a ready-made rule by rule and name, and an amount however it is written', () => {
    expect(presetOf({ kind: 'none' }, 'No deposit limit')).toBe(0);
    expect(presetOf({ kind: 'lesserOf', percent: 10, amount: '1000' }, DEPOSIT_CAP_PRESETS[1].name)).toBe(1);
    expect(presetOf({ kind: 'lesserOf', amount: '1000.00', percent: 10 }, 'Our own words')).toBe('own');
    expect(presetOf({ kind: 'lesserOf', amount: '1500.00', percent: 10 }, DEPOSIT_CAP_PRESETS[1].name)).toBe('own');
  });

  it('fills the rule and its printed name from a preset', () => {
    const form = billingSettingsForm();
    fillBillingForm(form, DEFAULT_BILLING_SETTINGS);
    applyPreset(form, 1);
    // California Bus. & Prof. Code §7159: the lesser of $1,000 or 10 % (the preset in contracts).
    expect(readBillingForm(form).depositCap).toEqual({ kind: 'lesserOf', amount: '1000.00', percent: 10 });
    expect(readBillingForm(form).depositCapName).toBe(DEPOSIT_CAP_PRESETS[1].name);
  });
});
