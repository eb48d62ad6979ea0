import { createCipheriv, createDecipheriv, createHmac, hkdfSync, randomBytes } from 'node:crypto';
import type { Config } from '../../config';

/**
 * Second-factor secrets are kept sealed with AES-256-GCM (a fresh 96-bit IV each time, the 128-bit
 * tag checked on opening, the person's id as associated data so a sealed secret cannot be moved to
 * another person). The key is `SECOND_FACTOR_KEY` when the deployment sets one, else derived with
 * HKDF-SHA256 from the session secret — so changing that secret means everyone enrols again.
 * Recovery codes are hashed with HMAC-SHA256 under a second key derived the same way.
 */
const VERSION = 'v1';

interface Keys {
  readonly seal: Buffer;
  readonly codes: Buffer;
}

const cache = new WeakMap<Config, Keys>();

function keysFor(config: Config): Keys {
  const known = cache.get(config);
  if (known) return known;
  const root = config.SECOND_FACTOR_KEY ?? config.SESSION_SECRET;
  const derive = (info: string) => Buffer.from(hkdfSync('sha256', root, 'layerbook', info, 32));
  const keys = { seal: derive('second-factor secret v1'), codes: derive('second-factor recovery codes v1') };
  cache.set(config, keys);
  return keys;
}

export function sealSecret(config: Config, userId: string, secret: string): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv('aes-256-gcm', keysFor(config).seal, iv);
  cipher.setAAD(Buffer.from(userId));
  const body = Buffer.concat([cipher.update(secret, 'utf8'), cipher.final()]);
  return [VERSION, iv.toString('base64url'), cipher.getAuthTag().toString('base64url'), body.toString('base64url')].join('.');
}

/** The secret, or an error when the sealed text was altered, moved to another person or sealed under another key. */
export function openSecret(config: Config, userId: string, sealed: string): string {
  const [version, iv, tag, body] = sealed.split('.');
  if (version !== VERSION || !iv || !tag || body === undefined) throw new Error('sealed second-factor secret is not readable');
  const decipher = createDecipheriv('aes-256-gcm', keysFor(config).seal, Buffer.from(iv, 'base64url'));
  decipher.setAAD(Buffer.from(userId));
  decipher.setAuthTag(Buffer.from(tag, 'base64url'));
  return Buffer.concat([decipher.update(Buffer.from(body, 'base64url')), decipher.final()]).toString('utf8');
}

/** The keyed hash a recovery code is kept as (the code normalised first: recovery-codes.ts). */
export function recoveryCodeHash(config: Config, normalisedCode: string): string {
  return createHmac('sha256', keysFor(config).codes).update(normalisedCode).digest('hex');
}
