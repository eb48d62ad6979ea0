import fc from 'fast-check';
import { z } from 'zod';
import { HttpError } from './problem';
import { parse } from './validate';
import { unstorableText } from './text-guard';

describe('text PostgreSQL cannot store is refused by name before parsing', () => {
  it.each([
    ['a NUL character', { name: 'Ada\u0000' }, 'name'],
    ['a lone high surrogate', { notes: ['ok', 'x\uD800y'] }, 'notes.1'],
    ['a lone low surrogate', { a: { b: '\uDC00' } }, 'a.b'],
  ])('%s', (_what, input, field) => {
    expect(unstorableText(input).map((p) => p.field)).toEqual([field]);
  });

  it('keeps pairs, emoji and ordinary control characters like tabs', () => {
    expect(unstorableText({ a: 'Café 🎨', b: 'tab\there', c: ['\n'] })).toEqual([]);
  });

  it('answers 400 through parse(), naming the field', () => {
    const schema = z.strictObject({ name: z.string() });
    try {
      parse(schema, { name: 'a\u0000b' });
      throw new Error('parse accepted a NUL');
    } catch (err) {
      expect(err).toBeInstanceOf(HttpError);
      expect((err as HttpError).status).toBe(400);
      expect((err as HttpError).toProblem('r').errors).toEqual([{ field: 'name', message: expect.stringContaining('control characters') }]);
    }
  });

  it('any string either passes through or is refused, never throws otherwise', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary' }), (s) => {
        const found = unstorableText({ s });
        const storable = !s.includes('\u0000') && s === Buffer.from(s, 'utf8').toString('utf8');
        expect(found.length === 0).toBe(storable);
      }),
    );
  });
});
