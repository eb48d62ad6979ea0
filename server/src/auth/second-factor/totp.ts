import { TOTP_DIGITS } from '@layerbook/contracts';
import { authenticator } from 'otplib';

/**
 * TOTP as RFC 6238 (HMAC-SHA-1, 30-second steps, 6 digits — what authenticator apps expect from an
 * otpauth:// URI without parameters), through otplib. A code is accepted one step either side of
 * now (RFC 6238 §5.2 allows for clock drift), and never for a step at or before the last one used.
 */
export const STEP_SECONDS = 30;
export const WINDOW_STEPS = 1;
export const ISSUER = 'Layerbook';

const at = (now: Date) => authenticator.clone({ step: STEP_SECONDS, window: WINDOW_STEPS, digits: TOTP_DIGITS, epoch: now.getTime() });

/** A new secret: 160 bits (RFC 4226 §4 recommends this length), base32 as apps read it. */
export function newTotpSecret(): string {
  return authenticator.generateSecret(20);
}

/** The otpauth:// URI an app reads from the QR code: the person's e-mail under the issuer's name. */
export function otpauthUri(email: string, secret: string): string {
  return authenticator.keyuri(email, ISSUER, secret);
}

/** The secret in groups of four characters, for typing it in by hand. */
export function secretGroups(secret: string): string[] {
  return secret.match(/.{1,4}/g) ?? [];
}

export function timeStep(now: Date): number {
  return Math.floor(now.getTime() / 1000 / STEP_SECONDS);
}

/** The code at `now` (tests, and the spec that signs in with a code). */
export function codeAt(secret: string, now: Date): string {
  return at(now).generate(secret);
}

/**
 * The time step `code` belongs to when it is right within the window and newer than
 * `lastUsedStep`; null otherwise (wrong, too old, or already used).
 */
export function acceptedStep(secret: string, code: string, now: Date, lastUsedStep: number | null): number | null {
  const delta = at(now).checkDelta(code, secret);
  if (delta === null) return null;
  const step = timeStep(now) + delta;
  return lastUsedStep !== null && step <= lastUsedStep ? null : step;
}
