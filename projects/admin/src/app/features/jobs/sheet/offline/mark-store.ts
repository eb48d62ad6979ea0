import { Injectable } from '@angular/core';
import { type QueuedMark, parseQueue } from './mark-queue';

/** Where the phone keeps its marks: one small JSON list, a few hundred bytes per mark. */
export const MARKS_KEY = 'lb.offline-marks.v1';

/**
 * The queue on the phone. localStorage rather than IndexedDB: the list is tiny, reads and writes are
 * synchronous (a mark is on disk before `mark()` resolves, even if the tab is closed next), and it
 * survives reloads, restarts and the service worker's updates. Another tab's change arrives as a
 * `storage` event (watch()).
 */
@Injectable({ providedIn: 'root' })
export class MarkStore {
  read(): readonly QueuedMark[] {
    const storage = this.storage();
    if (!storage) return [];
    try {
      return parseQueue(storage.getItem(MARKS_KEY));
    } catch {
      return [];
    }
  }

  /** False when the phone refused to keep it (storage full or blocked): the caller says so. */
  write(queue: readonly QueuedMark[]): boolean {
    const storage = this.storage();
    if (!storage) return false;
    try {
      if (queue.length === 0) storage.removeItem(MARKS_KEY);
      else storage.setItem(MARKS_KEY, JSON.stringify(queue));
      return true;
    } catch {
      return false;
    }
  }

  /** Calls back with the new queue when another tab changes it; returns the way to stop. */
  watch(changed: (queue: readonly QueuedMark[]) => void): () => void {
    if (typeof window === 'undefined') return () => undefined;
    const listener = (event: StorageEvent) => {
      if (event.key === MARKS_KEY || event.key === null) changed(parseQueue(event.newValue));
    };
    window.addEventListener('storage', listener);
    return () => window.removeEventListener('storage', listener);
  }

  private storage(): Storage | null {
    try {
      return typeof localStorage === 'undefined' ? null : localStorage;
    } catch {
      // Some browsers throw on access when storage is disabled.
      return null;
    }
  }
}
