import { badRequest } from '../http/problem';

/** Opaque keyset cursor: the last row's sort value and id, base64url JSON. */
export function encodeCursor(sortValue: string | null, id: string): string {
  return Buffer.from(JSON.stringify([sortValue, id])).toString('base64url');
}

export function decodeCursor(cursor: string): { sortValue: string | null; id: string } {
  try {
    const [sortValue, id] = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8')) as [unknown, unknown];
    if ((sortValue === null || typeof sortValue === 'string') && typeof id === 'string' && /^[0-9a-f-]{36}$/i.test(id))
      return { sortValue, id };
  } catch {
    /* fall through */
  }
  throw badRequest([{ field: 'after', message: 'This page link is not valid; start from the first page.' }]);
}
