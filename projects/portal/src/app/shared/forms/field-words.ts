import { EMAIL_MAX_LENGTH } from '@layerbook/contracts/types';
import { ErrorWords } from './error-text';

/** Matches the API's e-mail schema messages (packages/contracts). */
export const EMAIL_WORDS: ErrorWords = {
  required: 'Enter an e-mail address.',
  email: 'Enter a valid e-mail address, like name@example.com.',
  maxlength: `An e-mail address has at most ${EMAIL_MAX_LENGTH} characters.`,
};

/** "Use at most 120 characters." for a field whose limit is `max`. */
export function tooLong(max: number): ErrorWords {
  return { maxlength: `Use at most ${max} characters.` };
}
