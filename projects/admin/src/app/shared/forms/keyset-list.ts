import { HttpClient, httpResource } from '@angular/common/http';
import { Signal, computed, inject, linkedSignal, signal } from '@angular/core';
import type { KeysetPage } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';
import { toProblem } from '../../core/errors/problem';

/** Query parameters of a list request; `after` is added for the pages that follow. */
export type ListParams = Readonly<Record<string, string | number>>;

export interface KeysetList<T> {
  /** Every row loaded so far: the first page, then each page added by `loadMore`. */
  readonly items: Signal<readonly T[]>;
  readonly hasMore: Signal<boolean>;
  readonly isLoading: Signal<boolean>;
  readonly isLoadingMore: Signal<boolean>;
  /** Why the list or its next page could not be loaded, in words. */
  readonly message: Signal<string | null>;
  loadMore(): Promise<void>;
}

/**
 * A filtered list read page by page (the API's keyset lists: GET … → { items, nextCursor }).
 * The first page follows `params` (a new search starts over); `loadMore` appends the next page.
 * Call in an injection context.
 */
export function keysetList<T>(url: string, params: () => ListParams): KeysetList<T> {
  const http = inject(HttpClient);
  const first = httpResource<KeysetPage<T>>(() => ({ url, params: { ...params() } }));
  // value() throws while the resource is in error, so read it only when there is one.
  const firstPage = computed(() => (first.hasValue() ? first.value() : undefined));
  const loaded = linkedSignal<KeysetPage<T> | undefined, { items: readonly T[]; nextCursor: string | null }>({
    source: firstPage,
    computation: (page) => ({ items: page?.items ?? [], nextCursor: page?.nextCursor ?? null }),
  });
  const isLoadingMore = signal(false);
  const moreMessage = linkedSignal<KeysetPage<T> | undefined, string | null>({ source: firstPage, computation: () => null });
  const firstMessage = computed(() => {
    const error = first.error();
    return error ? toProblem(error).title : null;
  });

  return {
    items: computed(() => loaded().items),
    hasMore: computed(() => loaded().nextCursor !== null),
    isLoading: first.isLoading,
    isLoadingMore: isLoadingMore.asReadonly(),
    message: computed(() => firstMessage() ?? moreMessage()),
    async loadMore(): Promise<void> {
      const { nextCursor } = loaded();
      if (nextCursor === null || isLoadingMore()) {
        return;
      }
      isLoadingMore.set(true);
      moreMessage.set(null);
      try {
        const page = await firstValueFrom(http.get<KeysetPage<T>>(url, { params: { ...params(), after: nextCursor } }));
        loaded.update(({ items }) => ({ items: [...items, ...page.items], nextCursor: page.nextCursor }));
      } catch (error) {
        moreMessage.set(toProblem(error).title);
      } finally {
        isLoadingMore.set(false);
      }
    },
  };
}
