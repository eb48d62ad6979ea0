import { hash, verify } from '@node-rs/argon2';
import commonPasswords from 'fxa-common-password-list';
import { badRequest } from '../http/problem';

// OWASP Password Storage Cheat Sheet: Argon2id, m=19456 KiB, t=2, p=1.
// `algorithm: 2` is the library's Algorithm.Argon2id (a const enum, which isolated modules cannot import).
const ARGON2_OPTIONS = { algorithm: 2, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export const hashPassword = (password: string) => hash(password, ARGON2_OPTIONS);

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

/** A hash to verify against when the e-mail is unknown, so timing does not reveal which accounts exist. */
let decoyHash: Promise<string> | undefined;
export const decoyPasswordHash = () => (decoyHash ??= hashPassword('layerbook-decoy-password'));

export function assertNotCommonPassword(password: string, field = 'password'): void {
  if (commonPasswords.test(password)) {
    throw badRequest([{ field, message: 'This password is on a list of common passwords; choose another.' }]);
  }
}

/** Words shorter than this are too common inside passwords to refuse ("ann", "co", "art"). */
const CONTEXT_WORD_MIN = 4;

/**
 * The words a guesser tries first for this person (OWASP ASVS 5.0 §6.2: refuse context-specific
 * words): the e-mail's local part whole and in pieces, and each word of their name and firm name.
 */
export function contextWords(context: {
  readonly email: string;
  readonly name?: string;
  readonly firmNames?: readonly string[];
}): string[] {
  const local = context.email.split('@')[0] ?? '';
  const words = [local, ...[local, context.name ?? '', ...(context.firmNames ?? [])].flatMap((s) => s.split(/[^\p{L}\p{N}]+/u))];
  return [...new Set(words.map((w) => w.toLowerCase()).filter((w) => [...w].length >= CONTEXT_WORD_MIN))];
}

/** Refuses a password that is or contains the person's e-mail, name or firm name, ignoring case. */
export function assertNoContextWords(password: string, context: Parameters<typeof contextWords>[0], field = 'password'): void {
  const lowered = password.toLowerCase();
  if (contextWords(context).some((word) => lowered.includes(word))) {
    throw badRequest([{ field, message: 'Choose a password that does not contain your name, your e-mail or your firm’s name.' }]);
  }
}

/** Every check a new password must pass before it is hashed. */
export function assertAcceptablePassword(password: string, context: Parameters<typeof contextWords>[0], field = 'password'): void {
  assertNotCommonPassword(password, field);
  assertNoContextWords(password, context, field);
}
