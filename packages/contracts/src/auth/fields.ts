import { z } from 'zod';
import { EMAIL_MAX_LENGTH, LINK_TOKEN_PATTERN, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, PERSON_NAME_MAX_LENGTH } from './auth-types';

export const email = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .max(EMAIL_MAX_LENGTH, { error: `An e-mail address has at most ${EMAIL_MAX_LENGTH} characters.` })
  .pipe(z.email({ error: 'Enter a valid e-mail address, like name@example.com.' }));

/** OWASP: at least 8 characters, long passphrases allowed, no composition rules. */
export const newPassword = z
  .string({ error: 'Choose a password.' })
  .min(PASSWORD_MIN_LENGTH, { error: `Use at least ${PASSWORD_MIN_LENGTH} characters.` })
  .max(PASSWORD_MAX_LENGTH, { error: `Use at most ${PASSWORD_MAX_LENGTH} characters.` });

export const personName = z
  .string({ error: 'Enter a name.' })
  .trim()
  .min(1, { error: 'Enter a name.' })
  .max(PERSON_NAME_MAX_LENGTH, { error: `Use at most ${PERSON_NAME_MAX_LENGTH} characters.` });

export const token = z.string({ error: 'The link is missing its code.' }).regex(LINK_TOKEN_PATTERN, { error: 'This link is not valid.' });
