import { z } from 'zod';

export const email = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .max(254, { error: 'An e-mail address has at most 254 characters.' })
  .pipe(z.email({ error: 'Enter a valid e-mail address, like name@example.com.' }));

/** OWASP: at least 8 characters, long passphrases allowed, no composition rules. */
export const newPassword = z
  .string({ error: 'Choose a password.' })
  .min(8, { error: 'Use at least 8 characters.' })
  .max(128, { error: 'Use at most 128 characters.' });

export const personName = z
  .string({ error: 'Enter a name.' })
  .trim()
  .min(1, { error: 'Enter a name.' })
  .max(120, { error: 'Use at most 120 characters.' });

export const token = z
  .string({ error: 'The link is missing its code.' })
  .regex(/^[A-Za-z0-9_-]{32,128}$/, { error: 'This link is not valid.' });
