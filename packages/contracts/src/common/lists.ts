/**
 * Every list route answers in this one shape. `nextCursor` is present on keyset-paginated lists:
 * pass it back as `?after=` for the next page; null when this page is the last.
 */
export interface ItemList<T> {
  readonly items: readonly T[];
  readonly nextCursor?: string | null;
}
