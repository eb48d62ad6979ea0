import { DomainInputError } from '../errors/domain-input-error';

const WIDTH_MAX = 12;

/**
 * A document's printed number from its per-firm counter: `documentNumber('INV', 7)` is "INV-0007".
 * Zero-padded to `width` digits; a longer number is never cut ("INV-12345"), so numbers stay unique.
 * The prefix is joined with "-" unless it is empty or already ends in a separator ("2027/" → "2027/0007").
 */
export function documentNumber(prefix: string, n: number, width = 4): string {
  if (typeof n !== 'number' || !Number.isSafeInteger(n) || n < 1) {
    throw new DomainInputError('n', 'A document number is a whole number of at least 1.');
  }
  if (!Number.isInteger(width) || width < 1 || width > WIDTH_MAX) {
    throw new DomainInputError('width', `The number width is a whole number from 1 to ${WIDTH_MAX}.`);
  }
  if (typeof prefix !== 'string') throw new DomainInputError('prefix', 'The prefix must be text.');
  const head = prefix.trim();
  const digits = String(n).padStart(width, '0');
  if (head === '') return digits;
  return /[A-Za-z0-9]$/.test(head) ? `${head}-${digits}` : `${head}${digits}`;
}
