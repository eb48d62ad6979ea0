import { isUniqueViolation } from '../http/pg-errors';
import { randomBytes } from 'node:crypto';

/** A readable, URL-safe handle for a firm's public pages (its inquiry form), unique across firms. */
export function slugify(name: string): string {
  const base = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 40);
  return base || 'firm';
}

/**
 * Candidate slugs to try in order. Firms are RLS-protected, so another firm's slug cannot be
 * looked up; the unique index decides, and the caller retries with the next candidate.
 */
export function slugCandidates(name: string, tries = 5): string[] {
  const base = slugify(name);
  return [base, ...Array.from({ length: tries - 1 }, () => `${base}-${randomBytes(3).toString('hex')}`)];
}

export const isSlugTaken = (error: unknown) => isUniqueViolation(error, 'firms_slug_key');
