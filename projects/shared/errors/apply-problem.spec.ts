import { FormControl, FormGroup } from '@angular/forms';
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
