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
