import { COPIES_OWNER_KEY, DATA_CACHE, OfflineCopies, urlsToKeep } from './offline-copies';

const JOB = '0b5c6a1e-1111-4222-8333-944455556666';

describe('offline copies', () => {
  beforeEach(() => localStorage.clear());

  it('knows the service worker data caches by name (names as Angular 21 service worker makes them)', () => {
    expect(DATA_CACHE.test('ngsw:/:1:data:job-sheets:cache')).toBe(true);
    expect(DATA_CACHE.test('ngsw:/:1:data:session:cache')).toBe(true);
    // the worker's book-keeping and the app's own files are left alone
    expect(DATA_CACHE.test('ngsw:/:db:1:data:job-sheets:lru')).toBe(false);
    expect(DATA_CACHE.test('ngsw:/:3a0186b04c2c:assets:shell:cache')).toBe(false);
    expect(DATA_CACHE.test('ngsw:/:db:control')).toBe(false);
  });

  it('keeps the sheet pages’ reads (the data groups of ngsw-config.json) for the page being shown', () => {
    expect(urlsToKeep('/sheets')).toEqual(['/api/auth/session', '/api/jobs/sheets']);
    expect(urlsToKeep(`/sheets/${JOB}`)).toEqual([
      '/api/auth/session',
      '/api/jobs/sheets',
      `/api/jobs/${JOB}/sheet`,
      `/api/jobs/${JOB}/progress`,
      `/api/jobs/${JOB}/photos`,
    ]);
    expect(urlsToKeep('/jobs/abc')).toEqual(['/api/auth/session', '/api/jobs/sheets']);
  });

  it('empties them for another person, and for nobody only when the server says nobody is signed in', async () => {
    const copies = new OfflineCopies();
    let emptied = 0;
    copies.forget = () => Promise.resolve(void emptied++);

    await copies.keepFor('rosa:f1', () => Promise.resolve(false));
    expect([emptied, localStorage.getItem(COPIES_OWNER_KEY)]).toEqual([1, 'rosa:f1']);
    await copies.keepFor('rosa:f1');
    expect(emptied).toBe(1);

    // offline: the app lost the session because the server cannot be reached — the copies stay
    await copies.keepFor(null, () => Promise.resolve(false));
    expect([emptied, localStorage.getItem(COPIES_OWNER_KEY)]).toEqual([1, 'rosa:f1']);

    // signed out (the server says so): emptied
    await copies.keepFor(null, () => Promise.resolve(true));
    expect([emptied, localStorage.getItem(COPIES_OWNER_KEY)]).toEqual([2, null]);

    await copies.keepFor('ana:f1');
    expect([emptied, localStorage.getItem(COPIES_OWNER_KEY)]).toEqual([3, 'ana:f1']);
  });
});
