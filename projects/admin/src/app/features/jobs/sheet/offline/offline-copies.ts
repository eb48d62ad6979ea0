import { Injectable } from '@angular/core';

/** Whose API answers the service worker holds for offline reading (`<user id>:<firm id>`). */
export const COPIES_OWNER_KEY = 'lb.offline-owner.v1';

/**
 * Angular's service worker keeps each data group's answers in a cache named
 * `ngsw:<scope>:<version>:data:<group>:cache` (its book-keeping lives in `ngsw:<scope>:db:…`).
 */
export const DATA_CACHE = /^ngsw:.*:\d+:data:.+:cache$/;

/** Asks past the service worker (`ngsw-bypass`) and the HTTP cache; never sees a kept copy. */
const LIVE: RequestInit = { cache: 'no-store', credentials: 'same-origin', headers: { 'ngsw-bypass': '1' } };

/**
 * The copies of job sheets, progress, photos and the session the service worker keeps so a sheet
 * once opened can be read without a connection (projects/admin/ngsw-config.json). They belong to the
 * person signed in when they were fetched: when someone else signs in on the phone, or the server
 * says nobody is signed in any more, they are emptied.
 */
@Injectable({ providedIn: 'root' })
export class OfflineCopies {
  /**
   * Called with the signed-in person each time it changes (null = none known). Another person:
   * emptied. None: emptied only once the server itself says so — an unreachable server also leaves
   * the app without a person, and that is exactly when the copies are needed.
   */
  async keepFor(owner: string | null, signedOut: () => Promise<boolean> = serverSaysSignedOut): Promise<void> {
    const before = remembered();
    if (before === owner) return;
    if (owner === null && !(await signedOut())) return;
    // Forget first, then remember: a clean-up cut short is done again on the next start.
    await this.forget();
    remember(owner);
  }

  /**
   * Deletes every entry of the data caches. The caches themselves stay: the running worker holds
   * them open, and a deleted cache it still holds would keep answering from its old entries.
   */
  async forget(): Promise<void> {
    if (typeof caches === 'undefined') return;
    try {
      const names = (await caches.keys()).filter((name) => DATA_CACHE.test(name));
      for (const name of names) {
        const cache = await caches.open(name);
        for (const request of await cache.keys()) await cache.delete(request);
      }
    } catch {
      // Cache storage blocked (private mode): nothing was kept either.
    }
  }

  /**
   * The first visit's answers came before the worker was in charge, so it kept none of them: once it
   * controls the page, ask again for the session and the sheets (and the open sheet) so they are kept.
   */
  async warm(path: string): Promise<void> {
    if (typeof fetch === 'undefined') return;
    await Promise.all(urlsToKeep(path).map((url) => fetch(url, { credentials: 'same-origin' }).catch(() => undefined)));
  }
}

/** What the sheet pages read, for the page at `path` (the URLs of ngsw-config.json's data groups). */
export function urlsToKeep(path: string): string[] {
  const urls = ['/api/auth/session', '/api/jobs/sheets'];
  const sheet = /^\/sheets\/([0-9a-f-]{36})(?:[/?#]|$)/i.exec(path);
  if (sheet) {
    const job = `/api/jobs/${sheet[1]}`;
    urls.push(`${job}/sheet`, `${job}/progress`, `${job}/photos`);
  }
  return urls;
}

/** True only when the server answers that nobody is signed in (a network failure or an error is not that). */
export async function serverSaysSignedOut(): Promise<boolean> {
  try {
    const res = await fetch('/api/auth/session', LIVE);
    if (res.status === 401) return true;
    if (!res.ok) return false;
    const body = (await res.json()) as { user?: unknown };
    return body.user === null;
  } catch {
    return false;
  }
}

function remembered(): string | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage.getItem(COPIES_OWNER_KEY);
  } catch {
    return null;
  }
}

function remember(owner: string | null): void {
  try {
    if (typeof localStorage === 'undefined') return;
    if (owner === null) localStorage.removeItem(COPIES_OWNER_KEY);
    else localStorage.setItem(COPIES_OWNER_KEY, owner);
  } catch {
    // Storage blocked: the copies are then emptied on every change of person, which is safe.
  }
}
