import { EMAIL_MAX_LENGTH, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, PERSON_NAME_MAX_LENGTH } from '@layerbook/contracts/types';
import { ErrorWords } from './error-text';

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
