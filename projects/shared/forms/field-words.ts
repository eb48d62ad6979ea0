import { EMAIL_MAX_LENGTH, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, PERSON_NAME_MAX_LENGTH } from '@layerbook/contracts/types';
import { ErrorWords } from './error-text';
import type { FieldErrorWords } from './field-error-pipe';

/** Messages that match the API's zod schemas (packages/contracts), so both sides say the same. */
export const EMAIL_WORDS: ErrorWords = {
  required: 'Enter an e-mail address.',
  email: 'Enter a valid e-mail address, like name@example.com.',
  maxlength: `An e-mail address has at most ${EMAIL_MAX_LENGTH} characters.`,
};

export const NEW_PASSWORD_WORDS: ErrorWords = {
  required: 'Choose a password.',
  minlength: `Use at least ${PASSWORD_MIN_LENGTH} characters.`,
  maxlength: `Use at most ${PASSWORD_MAX_LENGTH} characters.`,
};

export const NAME_WORDS: ErrorWords = {
  required: 'Enter a name.',
  maxlength: `Use at most ${PERSON_NAME_MAX_LENGTH} characters.`,
};

/** "Use at most 120 characters." for a field whose limit is `max`. */
export function tooLong(max: number): ErrorWords {
  return { maxlength: `Use at most ${max} characters.` };
}

/** The same words as keys, for `lbFieldError` (shown in the reader's language). */
export const EMAIL_ERRORS: FieldErrorWords = {
  required: 'common.fieldErrors.emailRequired',
  email: 'common.fieldErrors.emailInvalid',
  maxlength: { key: 'common.fieldErrors.emailTooLong', params: { max: EMAIL_MAX_LENGTH } },
};

export const NEW_PASSWORD_ERRORS: FieldErrorWords = {
  required: 'common.fieldErrors.passwordRequired',
  minlength: { key: 'common.fieldErrors.passwordTooShort', params: { min: PASSWORD_MIN_LENGTH } },
  maxlength: { key: 'common.fieldErrors.tooLong', params: { max: PASSWORD_MAX_LENGTH } },
};

export const NAME_ERRORS: FieldErrorWords = {
  required: 'common.fieldErrors.nameRequired',
  maxlength: { key: 'common.fieldErrors.tooLong', params: { max: PERSON_NAME_MAX_LENGTH } },
};

/** "Use at most 120 characters." for a field whose limit is `max`, as a key. */
export function tooLongError(max: number): FieldErrorWords {
  return { maxlength: { key: 'common.fieldErrors.tooLong', params: { max } } };
}
