import { createHash, randomBytes } from 'node:crypto';

/** A one-time link token: 256 random bits for the e-mail, only its SHA-256 kept at rest. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

export const minutesFromNow = (now: Date, minutes: number) => new Date(now.getTime() + minutes * 60_000);
