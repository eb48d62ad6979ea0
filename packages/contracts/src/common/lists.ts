/**
 * Every list route answers in this one shape. `nextCursor` is present on keyset-paginated lists:
 * pass it back as `?after=` for the next page; null when this page is the last.
 */
export interface ItemList<T> {
  readonly items: readonly T[];
  readonly nextCursor?: string | null;
}

/** A keyset-paginated list: like ItemList, but it always says whether another page follows. */
export interface KeysetPage<T> extends ItemList<T> {
  readonly nextCursor: string | null;
}

/** Page sizes every keyset list accepts (`?limit=`). */
export const PAGE_SIZE_DEFAULT = 50;
export const PAGE_SIZE_MAX = 100;
/** Longest opaque cursor a list accepts back (`?after=`). */
export const CURSOR_MAX_LENGTH = 200;
/** Longest search text (`?q=`) any list accepts. */
export const SEARCH_MAX_LENGTH = 100;
