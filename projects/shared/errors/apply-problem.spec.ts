import { FormArray, FormControl, FormGroup } from '@angular/forms';
import { describe, expect, it } from 'vitest';
import { applyProblem } from './apply-problem';

const signUpForm = () =>
  new FormGroup({
    email: new FormControl(''),
    address: new FormGroup({ postalCode: new FormControl('') }),
  });

describe('applyProblem', () => {
  it('puts each field error beside its field and says nothing on top', () => {
    const form = signUpForm();
    const left = applyProblem(form, {
      type: 'about:blank',
      title: 'Check the highlighted fields.',
      status: 400,
      errors: [
        { field: 'email', message: 'Enter an e-mail address.' },
        { field: 'address.postalCode', message: 'Enter a postal code.' },
      ],
    });
    expect(left).toBeNull();
    expect(form.get('email')?.errors).toEqual({ server: 'Enter an e-mail address.' });
    expect(form.get('email')?.touched).toBe(true);
    expect(form.get('address.postalCode')?.errors).toEqual({ server: 'Enter a postal code.' });
  });

  it('finds a field in a list however the path is written (lines.1.amount or lines[1].amount)', () => {
    const form = new FormGroup({
      lines: new FormArray([new FormGroup({ amount: new FormControl('') }), new FormGroup({ amount: new FormControl('') })]),
    });
    const left = applyProblem(form, {
      type: 'about:blank',
      title: 'Check the highlighted fields.',
      status: 400,
      errors: [
        { field: 'lines[1].amount', message: 'This line is already invoiced and cannot change.' },
        { field: 'lines.0.amount', message: 'Enter an amount.' },
      ],
    });
    expect(left).toBeNull();
    expect(form.get('lines.1.amount')?.errors).toEqual({ server: 'This line is already invoiced and cannot change.' });
    expect(form.get('lines.0.amount')?.errors).toEqual({ server: 'Enter an amount.' });
  });

  it('says on top what no field can carry', () => {
    const form = signUpForm();
    const left = applyProblem(form, {
      type: 'about:blank',
      title: 'Check the highlighted fields.',
      status: 400,
      errors: [
        { field: 'email', message: 'Enter an e-mail address.' },
        { field: 'password', message: 'Too short.' },
        { field: '', message: 'Send fewer fields.' },
      ],
    });
    expect(left).toBe('Too short. Send fewer fields.');
  });

  it.each([
    ['the detail', { detail: 'This e-mail already has an account.' }, 'This e-mail already has an account.'],
    ['the title', {}, 'Conflict'],
  ])('says %s when there are no field errors', (_what, extra, words) => {
    expect(applyProblem(signUpForm(), { type: 'about:blank', title: 'Conflict', status: 409, ...extra })).toBe(words);
  });
});
