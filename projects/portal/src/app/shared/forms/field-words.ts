import { ErrorWords } from './error-text';

/** Matches the API's e-mail schema messages (packages/contracts). */
export const EMAIL_WORDS: ErrorWords = {
  required: 'Enter an e-mail address.',
  email: 'Enter a valid e-mail address, like name@example.com.',
  maxlength: 'An e-mail address has at most 254 characters.',
};
