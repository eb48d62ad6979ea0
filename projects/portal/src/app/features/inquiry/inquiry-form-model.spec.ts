import { describe, expect, it } from 'vitest';
import {
  REFUSED_FIELD,
  fromPosted,
  inquiryForm,
  linkDependentFields,
  markRefused,
  refusedAsSent,
  renewedStamp,
  toBody,
} from './inquiry-form-model';

function filledForm() {
  const form = inquiryForm('stamp-1');
  form.patchValue({
    name: ' Della Hawthorne ',
    email: 'della@example.test',
    siteAddress: '3 Mill Lane',
    yearBuilt: '1925',
    rooms: 'Dining room walls',
    heardFrom: 'past_client',
    consent: true,
  });
  return form;
}

describe('inquiryForm validators (as the API checks them)', () => {
  it('accepts a complete form', () => {
    expect(filledForm().valid).toBe(true);
  });

  it.each([
    ['a year', '1925', false, null],
    ['no year, not ticked', '', false, { required: true }],
    ['no year, ticked "Not sure"', '', true, null],
    ['a word for a year', 'old', false, { year: true }],
    ['a year before the range', '1500', false, { yearRange: true }],
    ['a year after the range', '2101', false, { yearRange: true }],
  ])('year built: %s', (_case, year, isUnknown, errors) => {
    const form = filledForm();
    linkDependentFields(form);
    form.controls.yearBuiltUnknown.setValue(isUnknown);
    form.controls.yearBuilt.setValue(year);
    expect(form.controls.yearBuilt.errors).toEqual(errors);
  });

  it.each([
    ['a designer referral without a name', 'designer_referral', '', { required: true }],
    ['a contractor referral with a name', 'contractor_referral', 'Ottoline Marsh', null],
    ['a past client without a name', 'past_client', '', null],
  ])('referrer: %s', (_case, heardFrom, referrer, errors) => {
    const form = filledForm();
    linkDependentFields(form);
    form.controls.referrerName.setValue(referrer);
    form.controls.heardFrom.setValue(heardFrom);
    expect(form.controls.referrerName.errors).toEqual(errors);
  });

  it('refuses text over the contract limits', () => {
    const form = filledForm();
    form.controls.rooms.setValue('x'.repeat(2001));
    form.controls.phone.setValue('1'.repeat(41));
    expect(form.controls.rooms.hasError('maxlength')).toBe(true);
    expect(form.controls.phone.hasError('maxlength')).toBe(true);
  });
});

describe('fromPosted', () => {
  const blank = inquiryForm('stamp-1').getRawValue();

  it('reads a plain post: text as given, ticked boxes as "on", unknown names dropped', () => {
    const value = fromPosted({ name: 'Ada', consent: 'on', extra: 'x', yearBuilt: '1960' }, blank);
    expect(value).toMatchObject({ name: 'Ada', consent: true, yearBuiltUnknown: false, yearBuilt: '1960', startedAt: 'stamp-1' });
    expect(value).not.toHaveProperty('extra');
  });

  it('keeps the boxes as they were when asked to', () => {
    const value = fromPosted({ consent: 'on' }, { ...blank, consent: false, yearBuiltUnknown: true }, 'keep');
    expect(value).toMatchObject({ consent: false, yearBuiltUnknown: true });
  });
});

describe('toBody', () => {
  it('trims the words and sends the year as a number', () => {
    const body = toBody(filledForm().getRawValue());
    expect(body).toMatchObject({ name: 'Della Hawthorne', yearBuilt: 1925, heardFrom: 'past_client', consent: true, startedAt: 'stamp-1' });
  });

  it('sends the renewed stamp only when the form was renewed', () => {
    expect(toBody(filledForm().getRawValue())).not.toHaveProperty('renewedFrom');
    const form = filledForm();
    form.patchValue(renewedStamp(form.getRawValue(), 'stamp-2'));
    expect(toBody(form.getRawValue())).toMatchObject({ startedAt: 'stamp-2', renewedFrom: 'stamp-1' });
  });

  it('sends a blank year as blank', () => {
    const form = filledForm();
    form.controls.yearBuilt.setValue('  ');
    expect(toBody(form.getRawValue()).yearBuilt).toBe('');
  });
});

describe('renewedStamp', () => {
  it.each([
    ['a first renewal: the refused stamp vouches', { startedAt: 'stamp-1', renewedFrom: '' }, { startedAt: 'new', renewedFrom: 'stamp-1' }],
    [
      'a renewal of a renewal: the latest refused one',
      { startedAt: 'stamp-2', renewedFrom: 'stamp-1' },
      { startedAt: 'new', renewedFrom: 'stamp-2' },
    ],
    [
      'no stamp was sent: the earlier one still vouches',
      { startedAt: '', renewedFrom: 'stamp-1' },
      { startedAt: 'new', renewedFrom: 'stamp-1' },
    ],
  ])('%s', (_case, stamps, expected) => {
    expect(renewedStamp(stamps, 'new')).toEqual(expected);
  });
});

describe('refusedAsSent', () => {
  it('shows the server message while the field and the one it depends on hold what was sent', () => {
    const form = filledForm();
    const sent = form.getRawValue();
    const rule = refusedAsSent(sent, 'yearBuilt', 'Enter the year the building was built, or tick "Not sure".');
    expect(rule(form.controls.yearBuilt)).toEqual({ server: 'Enter the year the building was built, or tick "Not sure".' });
    form.controls.yearBuiltUnknown.setValue(true);
    expect(rule(form.controls.yearBuilt)).toBeNull();
  });
});

describe('a field the server refused on a form posted before the script loaded', () => {
  it('is said in the form’s own words when its own rule finds the problem, never in the server’s English', () => {
    const form = filledForm();
    form.controls.name.setValue('');
    form.controls.consent.setValue(false);
    const sent = form.getRawValue();
    markRefused(form, sent, 'name');
    markRefused(form, sent, 'consent');
    expect(form.controls.name.errors).toEqual({ required: true });
    expect(form.controls.consent.errors).toEqual({ required: true });
    expect(form.controls.name.touched).toBe(true);
  });

  it('says "check this field" for a rule the form does not see, until the field is changed', () => {
    const form = filledForm();
    const sent = form.getRawValue();
    markRefused(form, sent, 'email');
    expect(form.controls.email.errors).toEqual({ server: REFUSED_FIELD });
    form.controls.email.setValue('della@example.org');
    expect(form.controls.email.errors).toBeNull();
  });
});
