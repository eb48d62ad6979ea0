import { describe, expect, it } from 'vitest';
import { EMAIL_WORDS, NAME_WORDS, NEW_PASSWORD_WORDS, tooLong } from './field-words';

describe('field words', () => {
  it('say the contract limits, as the API messages do', () => {
    expect(EMAIL_WORDS['maxlength']).toBe('An e-mail address has at most 254 characters.');
    expect(NEW_PASSWORD_WORDS['minlength']).toBe('Use at least 8 characters.');
    expect(NEW_PASSWORD_WORDS['maxlength']).toBe('Use at most 128 characters.');
    expect(NAME_WORDS['maxlength']).toBe('Use at most 120 characters.');
    expect(tooLong(300)).toEqual({ maxlength: 'Use at most 300 characters.' });
  });
});
