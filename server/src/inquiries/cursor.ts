import { badRequest } from '../http/problem';

/** What a keyset's sort value is, as PostgreSQL prints it (`::text`) and casts it back. */
export type CursorSort = 'timestamptz' | 'numeric' | 'date';

/** Opaque keyset cursor: the last row's sort value and id, base64url JSON. */
export function encodeCursor(sortValue: string | null, id: string): string {
  return Buffer.from(JSON.stringify([sortValue, id])).toString('base64url');
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
// `created_at::text` under any session time zone: "2026-12-02 05:05:41.123456+00" (or +05:30).
const TIMESTAMP = /^(\d{4}-\d{2}-\d{2}) ([01]\d|2[0-3]):[0-5]\d:[0-5]\d(\.\d{1,6})?[+-](0\d|1[0-5])(:[0-5]\d)?$/;
const DATE = /^\d{4}-\d{2}-\d{2}$/;
const NUMERIC = /^-?\d{1,18}(\.\d{1,6})?$/;

/** A calendar day PostgreSQL will cast: a real date, from year 1 (it has no year 0). */
const isRealDay = (day: string) => {
  const at = new Date(`${day}T00:00:00Z`);
  return Number(day.slice(0, 4)) >= 1 && !Number.isNaN(at.getTime()) && at.toISOString().startsWith(day);
};

function isSortValue(value: string, sort: CursorSort): boolean {
  if (sort === 'numeric') return NUMERIC.test(value);
  if (sort === 'date') return DATE.test(value) && isRealDay(value);
  const day = TIMESTAMP.exec(value)?.[1];
  return day !== undefined && isRealDay(day);
}

/**
 * Reads a cursor back for a list sorted by `sort`. Anything that is not a cursor this list wrote
 * (tampered, cut short, or from another sort) is a 400 naming `after`, never a failed cast in SQL.
 */
export function decodeCursor(cursor: string, sort: CursorSort): { sortValue: string; id: string } {
  try {
    const [sortValue, id] = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8')) as [unknown, unknown];
    if (typeof sortValue === 'string' && isSortValue(sortValue, sort) && typeof id === 'string' && UUID.test(id)) return { sortValue, id };
  } catch {
    /* fall through */
  }
  throw badRequest([{ field: 'after', message: 'This page link is not valid; start from the first page.' }]);
}
