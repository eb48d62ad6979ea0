import { ErrorWords } from './error-text';

/** Messages that match the API's zod schemas (packages/contracts), so both sides say the same. */
export const EMAIL_WORDS: ErrorWords = {
  required: 'Enter an e-mail address.',
  email: 'Enter a valid e-mail address, like name@example.com.',
  maxlength: 'An e-mail address has at most 254 characters.',
};

export const NEW_PASSWORD_WORDS: ErrorWords = {
  required: 'Choose a password.',
  minlength: 'Use at least 8 characters.',
  maxlength: 'Use at most 128 characters.',
};

export const NAME_WORDS: ErrorWords = {
  required: 'Enter a name.',
  maxlength: 'Use at most 120 characters.',
};
