import { AbstractControl, FormControl, FormGroup, ValidationErrors, ValidatorFn, Validators } from '@angular/forms';
import {
  BILLING_LIMITS as L,
  DEPOSIT_CAP_PRESETS,
  type BillingSettings,
  type DepositCapKind,
  type DepositAtAcceptanceSetting,
  type DepositCapSetting,
  type DepositCreditRuleSetting,
  type PaymentTermsSetting,
  prefixClash,
} from '@layerbook/contracts/types';
import { amountText, toAmount } from '../../shared/forms/money-input';
import { requiredText } from '../../shared/forms/text-validators';

/** A whole number (the API takes whole days and a whole count of reminders); blank is left to `required`. */
function whole(control: AbstractControl): ValidationErrors | null {
  const value: unknown = control.value;
  if (value === null || value === undefined || value === '') return null;
  return Number.isInteger(Number(value)) ? null : { whole: true };
}

/** Required while a sibling says the field is in use (a net term needs its days, a share its percent). */
function requiredWhen(sibling: string, isInUse: (value: unknown) => boolean): ValidatorFn {
  return (control) => {
    const other = control.parent?.get(sibling);
    if (!other || !isInUse(other.value)) return null;
    const value: unknown = control.value;
    return value === null || value === undefined || value === '' ? { required: true } : null;
  };
}

/** At least one while the siblings say the field is in use (reminders on, and after the due date, need a count). */
function atLeastOneWhen(...siblings: string[]): ValidatorFn {
  return (control) =>
    siblings.every((name) => control.parent?.get(name)?.value === true) && control.value === 0 ? { noneAfter: true } : null;
}

/** Re-checks `dependent` when `on` changes (unless the form is being disabled). */
function recheck(on: AbstractControl, dependents: readonly AbstractControl[]): void {
  on.valueChanges.subscribe(() => {
    if (on.disabled) return;
    for (const d of dependents) d.updateValueAndValidity({ emitEvent: false });
  });
}

const percent = (validators: ValidatorFn[] = [Validators.required]) =>
  new FormControl<number | null>(null, [...validators, Validators.min(L.percent.min), Validators.max(L.percent.max)]);
/** The API's prefix characters (packages/contracts billing settings schema). */
export const PREFIX_PATTERN = /^[A-Za-z0-9 ./_-]*$/;
const prefix = () =>
  new FormControl('', {
    nonNullable: true,
    validators: [Validators.maxLength(L.prefixMaxLength), Validators.pattern(PREFIX_PATTERN), apart],
  });

/** The prefixes must print different numbers from each other and the receipts' (the API's prefixClash). */
function apart(control: AbstractControl): ValidationErrors | null {
  const form = control.parent;
  if (!form) return null;
  const found = prefixClash(String(form.get('invoicePrefix')?.value ?? ''), String(form.get('creditNotePrefix')?.value ?? ''));
  return found && form.get(found.field) === control ? { [`prefix-${found.clash}`]: true } : null;
}
const days = (range: { min: number; max: number }, validators: ValidatorFn[]) =>
  new FormControl<number | null>(null, [...validators, Validators.min(range.min), Validators.max(range.max), whole]);

const usesAmount = (kind: unknown) => kind === 'amount' || kind === 'lesserOf';
const usesPercent = (kind: unknown) => kind === 'share' || kind === 'lesserOf';

/** The firm's billing settings as a typed form; group names follow the API's field paths (`depositCap.amount`). */
export function billingSettingsForm() {
  const depositCap = new FormGroup({
    kind: new FormControl<DepositCapKind>('none', { nonNullable: true }),
    amount: new FormControl('', { nonNullable: true, validators: [requiredWhen('kind', usesAmount), amountText] }),
    percent: percent([requiredWhen('kind', usesPercent)]),
  });
  recheck(depositCap.controls.kind, [depositCap.controls.amount, depositCap.controls.percent]);
  const terms = new FormGroup({
    kind: new FormControl<PaymentTermsSetting['kind']>('net', { nonNullable: true }),
    days: days(L.termsDays, [requiredWhen('kind', (k) => k === 'net')]),
  });
  recheck(terms.controls.kind, [terms.controls.days]);
  const retainage = new FormGroup({
    workPercent: percent(),
    storedPercent: percent(),
    stops: new FormControl(false, { nonNullable: true }),
    stopAtPercentComplete: percent([requiredWhen('stops', (s) => s === true)]),
  });
  recheck(retainage.controls.stops, [retainage.controls.stopAtPercentComplete]);
  const reminders = new FormGroup({
    isOn: new FormControl(true, { nonNullable: true }),
    hasDaysBefore: new FormControl(false, { nonNullable: true }),
    daysBefore: days(L.reminderDays, [requiredWhen('hasDaysBefore', (on) => on === true)]),
    onDueDate: new FormControl(false, { nonNullable: true }),
    hasEveryDaysAfter: new FormControl(false, { nonNullable: true }),
    everyDaysAfter: days(L.reminderDays, [requiredWhen('hasEveryDaysAfter', (on) => on === true)]),
    maxAfter: days(L.maxAfter, [Validators.required, atLeastOneWhen('isOn', 'hasEveryDaysAfter')]),
  });
  recheck(reminders.controls.hasDaysBefore, [reminders.controls.daysBefore]);
  recheck(reminders.controls.hasEveryDaysAfter, [reminders.controls.everyDaysAfter, reminders.controls.maxAfter]);
  recheck(reminders.controls.isOn, [reminders.controls.maxAfter]);
  const form = new FormGroup({
    depositCap,
    depositCapName: new FormControl('', {
      nonNullable: true,
      validators: [requiredText, Validators.maxLength(L.depositCapNameMaxLength)],
    }),
    terms,
    retainage,
    depositCredit: new FormControl<DepositCreditRuleSetting>('prorata', { nonNullable: true }),
    depositAtAcceptance: new FormControl<DepositAtAcceptanceSetting>('draft', { nonNullable: true }),
    reminders,
    invoicePrefix: prefix(),
    creditNotePrefix: prefix(),
    invoiceFooter: new FormControl('', { nonNullable: true, validators: Validators.maxLength(L.footerMaxLength) }),
  });
  const { invoicePrefix, creditNotePrefix } = form.controls;
  recheck(invoicePrefix, [creditNotePrefix]);
  recheck(creditNotePrefix, [invoicePrefix]);
  return form;
}

export type BillingSettingsFormGroup = ReturnType<typeof billingSettingsForm>;

export function fillBillingForm(form: BillingSettingsFormGroup, s: BillingSettings): void {
  const cap = s.depositCap;
  form.reset({
    depositCap: {
      kind: cap.kind,
      amount: cap.kind === 'amount' || cap.kind === 'lesserOf' ? cap.amount : '',
      percent: cap.kind === 'share' || cap.kind === 'lesserOf' ? cap.percent : null,
    },
    depositCapName: s.depositCapName,
    terms: { kind: s.terms.kind, days: s.terms.kind === 'net' ? s.terms.days : null },
    retainage: {
      workPercent: s.retainage.workPercent,
      storedPercent: s.retainage.storedPercent,
      stops: s.retainage.stopAtPercentComplete !== null,
      stopAtPercentComplete: s.retainage.stopAtPercentComplete,
    },
    depositCredit: s.depositCredit,
    depositAtAcceptance: s.depositAtAcceptance,
    reminders: {
      isOn: s.reminders.isOn,
      hasDaysBefore: s.reminders.daysBefore !== null,
      daysBefore: s.reminders.daysBefore,
      onDueDate: s.reminders.onDueDate,
      hasEveryDaysAfter: s.reminders.everyDaysAfter !== null,
      everyDaysAfter: s.reminders.everyDaysAfter,
      maxAfter: s.reminders.maxAfter,
    },
    invoicePrefix: s.invoicePrefix,
    creditNotePrefix: s.creditNotePrefix,
    invoiceFooter: s.invoiceFooter,
  });
}

function capOf(v: ReturnType<BillingSettingsFormGroup['getRawValue']>['depositCap']): DepositCapSetting {
  const amount = toAmount(v.amount) ?? '';
  const share = v.percent ?? 0;
  switch (v.kind) {
    case 'amount':
      return { kind: 'amount', amount };
    case 'share':
      return { kind: 'share', percent: share };
    case 'lesserOf':
      return { kind: 'lesserOf', amount, percent: share };
    default:
      return { kind: 'none' };
  }
}

/** The form as the API's settings: a switched-off choice sends null, never a stale number. */
export function readBillingForm(form: BillingSettingsFormGroup): BillingSettings {
  const v = form.getRawValue();
  const r = v.reminders;
  return {
    depositCap: capOf(v.depositCap),
    depositCapName: v.depositCapName.trim(),
    terms: v.terms.kind === 'net' ? { kind: 'net', days: v.terms.days ?? 0 } : { kind: 'onReceipt' },
    retainage: {
      workPercent: v.retainage.workPercent ?? 0,
      storedPercent: v.retainage.storedPercent ?? 0,
      stopAtPercentComplete: v.retainage.stops ? v.retainage.stopAtPercentComplete : null,
    },
    depositCredit: v.depositCredit,
    depositAtAcceptance: v.depositAtAcceptance,
    reminders: {
      isOn: r.isOn,
      daysBefore: r.hasDaysBefore ? r.daysBefore : null,
      onDueDate: r.onDueDate,
      everyDaysAfter: r.hasEveryDaysAfter ? r.everyDaysAfter : null,
      maxAfter: r.maxAfter ?? 0,
    },
    invoicePrefix: v.invoicePrefix.trim(),
    creditNotePrefix: v.creditNotePrefix.trim(),
    invoiceFooter: v.invoiceFooter.trim(),
  };
}

/** "1000", "1000.0" and "1000.00" are one amount (compared as text: money is never a float here). */
function plainAmount(amount: string): string {
  const [units, fraction = ''] = amount.trim().split('.');
  const digits = fraction.replace(/0+$/, '');
  return digits ? `${units}.${digits}` : units;
}

function sameCap(a: DepositCapSetting, b: DepositCapSetting): boolean {
  const amountOf = (c: DepositCapSetting) => (c.kind === 'amount' || c.kind === 'lesserOf' ? plainAmount(c.amount) : null);
  const percentOf = (c: DepositCapSetting) => (c.kind === 'share' || c.kind === 'lesserOf' ? c.percent : null);
  return a.kind === b.kind && amountOf(a) === amountOf(b) && percentOf(a) === percentOf(b);
}

/** Which ready-made rule the settings are (by rule and name), or 'own' for a rule the firm typed. */
export function presetOf(cap: DepositCapSetting, name: string): number | 'own' {
  const i = DEPOSIT_CAP_PRESETS.findIndex((p) => p.name === name && sameCap(p.rule, cap));
  return i === -1 ? 'own' : i;
}

/** Puts a ready-made rule and its name into the form. */
export function applyPreset(form: BillingSettingsFormGroup, index: number): void {
  const preset = DEPOSIT_CAP_PRESETS[index];
  if (!preset) return;
  const rule = preset.rule;
  form.controls.depositCap.setValue({
    kind: rule.kind,
    amount: rule.kind === 'amount' || rule.kind === 'lesserOf' ? rule.amount : '',
    percent: rule.kind === 'share' || rule.kind === 'lesserOf' ? rule.percent : null,
  });
  form.controls.depositCapName.setValue(preset.name);
  form.markAsDirty();
}
