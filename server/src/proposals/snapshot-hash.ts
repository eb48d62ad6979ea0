import { createHash } from 'node:crypto';

/**
 * JSON with object keys sorted at every level and no whitespace, so the same content always gives
 * the same text — whatever order jsonb hands the keys back in.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') {
    if (typeof value === 'number' && !Number.isFinite(value)) throw new Error('canonicalJson: non-finite number');
    return JSON.stringify(value);
  }
  if (Array.isArray(value)) return `[${value.map((v) => canonicalJson(v === undefined ? null : v)).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

/** SHA-256 (hex) of the canonical JSON: the reference printed on the PDF and recorded at acceptance. */
export const snapshotHash = (snapshot: unknown): string => createHash('sha256').update(canonicalJson(snapshot), 'utf8').digest('hex');
