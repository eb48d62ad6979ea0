import type { FieldProblem } from '@layerbook/contracts';

/**
 * Text PostgreSQL cannot store or JSON cannot carry: the NUL character (text columns refuse it)
 * and UTF-16 surrogates that are not part of a pair (jsonb refuses them). Found before parsing,
 * so such input is a 400 naming the field instead of a database error.
 */
// eslint-disable-next-line no-control-regex
const UNSTORABLE = /\u0000|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export function unstorableText(input: unknown, path: readonly (string | number)[] = [], found: FieldProblem[] = []): FieldProblem[] {
  if (typeof input === 'string') {
    if (UNSTORABLE.test(input))
      found.push({ field: path.join('.') || '(body)', message: 'Remove the invisible control characters from this text.' });
  } else if (Array.isArray(input)) {
    input.forEach((item, i) => unstorableText(item, [...path, i], found));
  } else if (input !== null && typeof input === 'object') {
    for (const [key, value] of Object.entries(input)) {
      if (UNSTORABLE.test(key))
        found.push({ field: [...path, '(key)'].join('.'), message: 'Remove the invisible control characters from this field name.' });
      else unstorableText(value, [...path, key], found);
    }
  }
  return found;
}
