import { expectInputError } from '../errors/expect-input-error';
import { documentNumber } from './document-number';

// Zero-padded sequential document numbers with a series prefix (common practice, no source).
describe('document numbers', () => {
  it.each<[string, number, number | undefined, string]>([
    ['INV', 7, undefined, 'INV-0007'],
    ['INV', 1, undefined, 'INV-0001'],
    ['INV', 9999, undefined, 'INV-9999'],
    // never cut: a longer number keeps every digit so no two documents share a number
    ['INV', 12345, undefined, 'INV-12345'],
    ['CN', 3, undefined, 'CN-0003'],
    ['INV', 42, 6, 'INV-000042'],
    ['INV', 42, 1, 'INV-42'],
    ['  INV ', 7, undefined, 'INV-0007'],
    ['INV-', 7, undefined, 'INV-0007'],
    ['2027/', 7, undefined, '2027/0007'],
    ['', 7, undefined, '0007'],
  ])('%j, %d, width %j → %s', (prefix, n, width, text) => expect(documentNumber(prefix, n, width)).toBe(text));

  it('refuses a number below 1 or not whole, and a silly width', () => {
    for (const n of [0, -1, 1.5, Number.NaN, Number.MAX_SAFE_INTEGER + 1]) expectInputError(() => documentNumber('INV', n), 'n');
    for (const width of [0, 13, 2.5]) expectInputError(() => documentNumber('INV', 1, width), 'width');
  });
});
