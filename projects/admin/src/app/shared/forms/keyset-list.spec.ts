import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef, Injector, runInInjectionContext, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { keysetList, type KeysetList } from './keyset-list';

interface Row {
  readonly id: string;
}

describe('keysetList', () => {
  let http: HttpTestingController;
  const q = signal('');
  let list: KeysetList<Row>;

  /** Lets the resource send its request (resources start on the next change detection). */
  const settle = () => TestBed.inject(ApplicationRef).tick();

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    http = TestBed.inject(HttpTestingController);
    q.set('');
    list = runInInjectionContext(TestBed.inject(Injector), () =>
      keysetList<Row>('/api/rows', () => ({ limit: 2, ...(q() ? { q: q() } : {}) })),
    );
    settle();
  });

  afterEach(() => http.verify());

  it('reads the first page, then appends the next one after the cursor', async () => {
    http.expectOne('/api/rows?limit=2').flush({ items: [{ id: 'a' }, { id: 'b' }], nextCursor: 'c1' });
    await TestBed.inject(ApplicationRef).whenStable();
    expect(list.items().map((r) => r.id)).toEqual(['a', 'b']);
    expect(list.hasMore()).toBe(true);

    const more = list.loadMore();
    expect(list.isLoadingMore()).toBe(true);
    http.expectOne('/api/rows?limit=2&after=c1').flush({ items: [{ id: 'c' }], nextCursor: null });
    await more;
    expect(list.items().map((r) => r.id)).toEqual(['a', 'b', 'c']);
    expect(list.hasMore()).toBe(false);
    expect(list.isLoadingMore()).toBe(false);
  });

  it('starts over when the filters change', async () => {
    http.expectOne('/api/rows?limit=2').flush({ items: [{ id: 'a' }], nextCursor: 'c1' });
    await TestBed.inject(ApplicationRef).whenStable();
    q.set('ash');
    settle();
    http.expectOne('/api/rows?limit=2&q=ash').flush({ items: [{ id: 'x' }], nextCursor: null });
    await TestBed.inject(ApplicationRef).whenStable();
    expect(list.items().map((r) => r.id)).toEqual(['x']);
    expect(list.hasMore()).toBe(false);
  });

  it('says in words why a page could not be read', async () => {
    http.expectOne('/api/rows?limit=2').flush({ items: [{ id: 'a' }], nextCursor: 'c1' });
    await TestBed.inject(ApplicationRef).whenStable();
    const more = list.loadMore();
    http
      .expectOne('/api/rows?limit=2&after=c1')
      .flush(
        { type: 'about:blank', title: 'Bad input', status: 400, errors: [{ field: 'after', message: 'Start again.' }] },
        { status: 400, statusText: 'Bad Request' },
      );
    await more;
    expect(list.message()).toBe('Bad input');
    expect(list.items().map((r) => r.id)).toEqual(['a']);
  });
});
