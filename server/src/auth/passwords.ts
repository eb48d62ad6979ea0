import argon2 from 'argon2';
import commonPasswords from 'fxa-common-password-list';
import { badRequest } from '../http/problem';

// OWASP Password Storage Cheat Sheet: Argon2id, m=19456 KiB, t=2, p=1.
const ARGON2_OPTIONS = { type: argon2.argon2id, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export const hashPassword = (password: string) => argon2.hash(password, ARGON2_OPTIONS);

export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
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
