import { Injectable } from '@angular/core';

/** Whose API answers the service worker holds for offline reading (`<user id>:<firm id>`). */
export const COPIES_OWNER_KEY = 'lb.offline-owner.v1';

/**
 * Angular's service worker keeps each data group's answers in a cache named
 * `ngsw:<scope>:<version>:data:<group>:cache` (its book-keeping lives in `ngsw:<scope>:db:…`).
 */
export const DATA_CACHE = /^ngsw:.*:\d+:data:.+:cache$/;

/**
 * The copies of job sheets, progress, photos and the session the service worker keeps so a sheet
 * once opened can be read without a connection. They belong to the person signed in when they were
 * fetched: when someone else signs in on the phone, or the person signs out, they are emptied.
 */
@Injectable({ providedIn: 'root' })
export class OfflineCopies {
  /** Empties them if they were made for someone other than `owner` (null = nobody signed in). */
  async keepFor(owner: string | null): Promise<void> {
    const before = this.remembered();
    if (before === owner) return;
    // Forget first, then remember: a clean-up cut short is done again on the next start.
    await this.forget();
    this.remember(owner);
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

  private remembered(): string | null {
    try {
      return typeof localStorage === 'undefined' ? null : localStorage.getItem(COPIES_OWNER_KEY);
    } catch {
      return null;
    }
  }

  private remember(owner: string | null): void {
    try {
      if (typeof localStorage === 'undefined') return;
      if (owner === null) localStorage.removeItem(COPIES_OWNER_KEY);
      else localStorage.setItem(COPIES_OWNER_KEY, owner);
    } catch {
      // Storage blocked: the copies are then emptied on every change of person, which is safe.
    }
  }
}
