import type { FieldProblem } from '@layerbook/contracts';
import type { z } from 'zod';
import { badRequest } from './problem';
import { unstorableText } from './text-guard';

/** Parses input with a shared zod schema; failure is a 400 naming every bad field. */
export function parse<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const unstorable = unstorableText(input);
  if (unstorable.length > 0) throw badRequest(unstorable);
  const result = schema.safeParse(input ?? {});
  if (result.success) return result.data;
  throw badRequest(fieldProblems(result.error));
}

export function fieldProblems(error: z.ZodError): FieldProblem[] {
  const problems: FieldProblem[] = [];
  for (const issue of error.issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) {
        problems.push({ field: [...issue.path, key].join('.'), message: 'This field is not accepted.' });
      }
      continue;
    }
    problems.push({ field: issue.path.join('.') || '(body)', message: issue.message });
  }
  return problems;
}

/**
 * A PATCH body: parsed like any other, and refused alike on every route when it names nothing to
 * change (an empty object), rather than reaching an UPDATE with no columns.
 */
export function parseChanges<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const changes: unknown = parse(schema, input);
  if (typeof changes === 'object' && changes !== null && Object.values(changes).every((v) => v === undefined)) {
    throw badRequest([{ field: '(body)', message: 'Nothing to change: send at least one field.' }]);
  }
  return changes as z.infer<S>;
}
