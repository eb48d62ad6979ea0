import { AbstractControl, FormControl, FormGroup, ValidationErrors, ValidatorFn, Validators } from '@angular/forms';
import {
  EMAIL_MAX_LENGTH,
  INQUIRY_LIMITS as L,
  PHONE_MAX_LENGTH,
  YEAR_BUILT_MAX,
  YEAR_BUILT_MIN,
  isReferralSource,
  type BudgetRange,
  type PublicSource,
} from '@layerbook/contracts/types';
import type { FieldErrorWords } from '../../../../../shared/forms/field-error-pipe';
import { EMAIL_ERRORS, tooLongError } from '../../shared/forms/field-words';
import { requiredText } from '../../shared/forms/text-validators';
import type { InquiryBody } from './inquiry-api';

/**
 * The inquiry form, field for field as the API's `publicInquiryRequest` names them. The same
 * names are the `name` attributes of the plain HTML form, which posts without scripts.
 * Validators mirror the API's zod schema; its own messages win when it answers.
 */
export function inquiryForm(formStamp: string) {
  const text = (value = '', ...validators: ((c: AbstractControl) => ValidationErrors | null)[]) =>
    new FormControl(value, { nonNullable: true, validators });
  const box = (...validators: ((c: AbstractControl) => ValidationErrors | null)[]) =>
    new FormControl(false, { nonNullable: true, validators });
  return new FormGroup({
    name: text('', requiredText, Validators.maxLength(L.contactName)),
    email: text('', requiredText, Validators.email, Validators.maxLength(EMAIL_MAX_LENGTH)),
    phone: text('', Validators.maxLength(PHONE_MAX_LENGTH)),
    siteAddress: text('', requiredText, Validators.maxLength(L.siteAddress)),
    yearBuilt: text('', yearBuiltUnlessUnknown),
    yearBuiltUnknown: box(),
    rooms: text('', requiredText, Validators.maxLength(L.rooms)),
    finishIdea: text('', Validators.maxLength(L.finishIdea)),
    timeline: text('', Validators.maxLength(L.timeline)),
    budgetRange: text(''),
    heardFrom: text('', Validators.required),
    referrerName: text('', referrerForReferrals, Validators.maxLength(L.referrerName)),
    consent: box(Validators.requiredTrue),
    website: text(''),
    startedAt: text(formStamp),
    // The expired stamp a renewal replaced: it vouches that the visitor opened the form long ago.
    renewedFrom: text(''),
  });
}

export type InquiryForm = ReturnType<typeof inquiryForm>;
export type InquiryFormValue = ReturnType<InquiryForm['getRawValue']>;
type FieldName = keyof InquiryFormValue;

const CHECKBOXES = ['yearBuiltUnknown', 'consent'] as const satisfies readonly FieldName[];

/** Words keys beside each field, matching the API's messages (packages/contracts, publicInquiryRequest). */
export const INQUIRY_WORDS = {
  name: { required: 'inquiry.errors.nameRequired', ...tooLongError(L.contactName) },
  email: EMAIL_ERRORS,
  phone: tooLongError(PHONE_MAX_LENGTH),
  siteAddress: { required: 'inquiry.errors.siteAddressRequired', ...tooLongError(L.siteAddress) },
  yearBuilt: {
    required: 'inquiry.errors.yearRequired',
    year: 'inquiry.errors.year',
    yearRange: { key: 'inquiry.errors.yearRange', params: { min: YEAR_BUILT_MIN, max: YEAR_BUILT_MAX } },
  },
  rooms: { required: 'inquiry.errors.roomsRequired', ...tooLongError(L.rooms) },
  finishIdea: tooLongError(L.finishIdea),
  timeline: tooLongError(L.timeline),
  heardFrom: { required: 'inquiry.errors.heardFromRequired' },
  referrerName: { required: 'inquiry.errors.referrerRequired', ...tooLongError(L.referrerName) },
  consent: { required: 'inquiry.errors.consentRequired' },
} as const satisfies Partial<Record<FieldName, FieldErrorWords>>;

function yearBuiltUnlessUnknown(control: AbstractControl): ValidationErrors | null {
  const year = String(control.value ?? '').trim();
  if (year === '') {
    return control.parent?.get('yearBuiltUnknown')?.value === true ? null : { required: true };
  }
  if (!/^\d{1,4}$/.test(year)) {
    return { year: true };
  }
  const value = Number(year);
  return value >= YEAR_BUILT_MIN && value <= YEAR_BUILT_MAX ? null : { yearRange: true };
}

function referrerForReferrals(control: AbstractControl): ValidationErrors | null {
  const heardFrom: unknown = control.parent?.get('heardFrom')?.value;
  const isNeeded = typeof heardFrom === 'string' && isReferralSource(heardFrom);
  return isNeeded && String(control.value ?? '').trim() === '' ? { required: true } : null;
}

/** Fields whose rule depends on another field's value. */
const DEPENDS_ON: Partial<Record<FieldName, FieldName>> = { yearBuilt: 'yearBuiltUnknown', referrerName: 'heardFrom' };

/**
 * The server's message for a field it refused, for as long as the field (and the field its rule
 * depends on) still holds what was sent.
 */
export function refusedAsSent(sent: InquiryFormValue, field: FieldName, message: string): ValidatorFn {
  const other = DEPENDS_ON[field];
  return (control) => {
    const isAsSent = control.value === sent[field] && (!other || control.parent?.get(other)?.value === sent[other]);
    return isAsSent ? { server: message } : null;
  };
}

/** What a refused field says when the form's own rules find nothing wrong with what was sent. */
export const REFUSED_FIELD = 'common.fieldErrors.checkField';

/**
 * Shows a field the server refused (a form posted before the script loaded) in the form's own
 * words, in the reader's language: the rule the sent value breaks here (they mirror the API's) names
 * the problem; a refusal these rules do not see gets "Check this field", never the server's English.
 */
export function markRefused(form: InquiryForm, sent: InquiryFormValue, field: FieldName): void {
  const control = form.controls[field];
  if (!control.errors) {
    control.addValidators(refusedAsSent(sent, field, REFUSED_FIELD));
  }
  control.updateValueAndValidity();
  control.markAsTouched();
}

/** Re-checks the fields whose rule depends on another field when that field changes. */
export function linkDependentFields(form: InquiryForm): { unsubscribe(): void } {
  const a = form.controls.yearBuiltUnknown.valueChanges.subscribe(() => form.controls.yearBuilt.updateValueAndValidity());
  const b = form.controls.heardFrom.valueChanges.subscribe(() => form.controls.referrerName.updateValueAndValidity());
  return { unsubscribe: () => (a.unsubscribe(), b.unsubscribe()) };
}

/**
 * Form values as a browser posts them: text as given, a ticked box as "on", an unticked box
 * absent. Unknown names are dropped. With `boxes: 'keep'`, the boxes keep their value in `into`
 * (for a reading that leaves them out; see typed-before-hydration.ts).
 */
export function fromPosted(
  posted: Readonly<Record<string, string>>,
  into: InquiryFormValue,
  boxes: 'posted' | 'keep' = 'posted',
): InquiryFormValue {
  const value: Record<string, string | boolean> = { ...into };
  for (const name of Object.keys(into) as FieldName[]) {
    if ((CHECKBOXES as readonly string[]).includes(name)) {
      if (boxes === 'keep') {
        continue;
      }
      value[name] = posted[name] === 'on' || posted[name] === 'true';
    } else if (typeof posted[name] === 'string') {
      value[name] = posted[name];
    }
  }
  return value as InquiryFormValue;
}

/** The JSON body for the API: trimmed text, the year as a number when one was given, no empty renewal. */
export function toBody(value: InquiryFormValue): InquiryBody {
  const year = value.yearBuilt.trim();
  return {
    name: value.name.trim(),
    email: value.email.trim(),
    phone: value.phone.trim(),
    siteAddress: value.siteAddress.trim(),
    yearBuilt: year === '' ? '' : Number(year),
    yearBuiltUnknown: value.yearBuiltUnknown,
    rooms: value.rooms.trim(),
    finishIdea: value.finishIdea.trim(),
    timeline: value.timeline.trim(),
    // The selects offer only the contract's choices; anything else (a hand-made post) is sent
    // as it is, and the API names the field it refuses.
    budgetRange: value.budgetRange as BudgetRange,
    heardFrom: value.heardFrom as PublicSource,
    referrerName: value.referrerName.trim(),
    consent: value.consent,
    website: value.website,
    startedAt: value.startedAt,
    ...(value.renewedFrom ? { renewedFrom: value.renewedFrom } : {}),
  };
}

type Stamps = Pick<InquiryFormValue, 'startedAt' | 'renewedFrom'>;

/**
 * The form with a fresh stamp in place of one the API refused as expired; the refused one goes along
 * as `renewedFrom`, so sending again at once is not taken for a robot's haste.
 */
export function renewedStamp(value: Stamps, freshStamp: string): Stamps {
  return { startedAt: freshStamp, renewedFrom: value.startedAt || value.renewedFrom };
}
