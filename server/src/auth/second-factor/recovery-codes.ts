import { randomInt } from 'node:crypto';
import { RECOVERY_CODE_COUNT } from '@layerbook/contracts';

/**
 * Recovery codes: ten characters from an alphabet without look-alikes (no 0/o, 1/l/i), shown as
 * `xxxxx-xxxxx`; about 50 bits each, and guessing is throttled like passwords.
 */
const ALPHABET = 'abcdefghjkmnpqrstuvwxyz23456789';
const LENGTH = 10;

export function newRecoveryCodes(count = RECOVERY_CODE_COUNT): string[] {
  const codes = new Set<string>();
  while (codes.size < count) {
    let code = '';
    for (let i = 0; i < LENGTH; i++) code += ALPHABET[randomInt(ALPHABET.length)];
    codes.add(`${code.slice(0, 5)}-${code.slice(5)}`);
  }
  return [...codes];
}

/** What was typed, as stored: lower case, without dashes or spaces; null when it cannot be a recovery code. */
export function normaliseRecoveryCode(typed: string): string | null {
  const plain = typed.toLowerCase().replace(/[\s-]/g, '');
  return plain.length === LENGTH && [...plain].every((c) => ALPHABET.includes(c)) ? plain : null;
}
