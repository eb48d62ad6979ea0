import { isPlatformBrowser } from '@angular/common';
import { DestroyRef, Injectable, Injector, PLATFORM_ID, type Signal, computed, effect, inject, signal } from '@angular/core';
import type { JobProgressView } from '@layerbook/contracts/types';
import { Session } from '../../../../core/auth/session';
import { newClientKey } from '../../../../shared/client-key';
import {
  type LayerMarkKind,
  type QueuedMark,
  addMark,
  marksFor,
  nextToSend,
  outcomeOf,
  problemText,
  refuse,
  withoutMark,
} from './mark-queue';
import { listenAll } from './listen';
import { isProgressView, MarkSender } from './mark-sender';
import { MarkStore } from './mark-store';
import { OfflineCopies } from './offline-copies';

export type { LayerMarkKind, QueuedMark } from './mark-queue';

/** Waits before trying again after the server failed or did not answer (the `online` event retries at once). */
const RETRY_MS = [15_000, 60_000, 300_000] as const;

/** The mark was refused by the server while the person watched (not kept: the sheet shows why). */
export class MarkRefused extends Error {
  constructor(readonly problem: string | null) {
    super(problem ?? 'The mark was refused.');
  }
}

/**
 * Layer marks from the phone that survive a lost connection. A mark is written to the phone first,
 * with a `clientKey` made once, then sent to POST /api/jobs/:id/progress in the order the marks were
 * made; the server counts a key once, so sending again after a timeout never marks twice. Waiting
 * marks go when the phone comes back online, at start, when the page becomes visible again and a
 * while after a failed try. Only the person who made a mark sends it (per firm).
 */
@Injectable({ providedIn: 'root' })
export class OfflineMarks {
  private readonly sender = inject(MarkSender);
  private readonly session = inject(Session);
  private readonly store = inject(MarkStore);
  private readonly copies = inject(OfflineCopies);
  private readonly injector = inject(Injector);
  private readonly browser = isPlatformBrowser(inject(PLATFORM_ID));

  private readonly queue = signal<readonly QueuedMark[]>(this.browser ? this.store.read() : []);
  private readonly connected = signal(this.browser && typeof navigator !== 'undefined' ? navigator.onLine : true);
  private readonly answers = signal<ReadonlyMap<string, JobProgressView>>(new Map());
  private readonly owner = computed(() => {
    const user = this.session.user();
    return user ? `${user.id}:${user.firmId}` : null;
  });
  private readonly byJob = new Map<string, Signal<readonly QueuedMark[]>>();
  private readonly answerByJob = new Map<string, Signal<JobProgressView | null>>();
  private flushing: Promise<void> | null = null;
  private retryTimer: ReturnType<typeof setTimeout> | null = null;
  private retries = 0;
  private started = false;

  /** The browser's idea of the connection (`navigator.onLine` and its events); true on the server. */
  readonly online = this.connected.asReadonly();
  /** How many of the signed-in person's marks wait on this phone, all jobs. */
  readonly waitingCount = computed(() => {
    const owner = this.owner();
    return this.queue().filter((mark) => mark.owner === owner && mark.state === 'waiting').length;
  });

  /**
   * The signed-in person's marks for a job that the server has not counted, oldest first: `waiting`
   * ones ("Saved on this phone — will send when online") and `refused` ones (with the server's words
   * in `problem`, until dismissed).
   */
  pending(jobId: string): Signal<readonly QueuedMark[]> {
    let view = this.byJob.get(jobId);
    if (!view) {
      view = computed(() => marksFor(this.queue(), this.owner(), jobId), { equal: sameMarks });
      this.byJob.set(jobId, view);
    }
    return view;
  }

  /** The job's progress as the server answered the last mark it counted from this phone (null before any). */
  progress(jobId: string): Signal<JobProgressView | null> {
    let view = this.answerByJob.get(jobId);
    if (!view) {
      view = computed(() => this.answers().get(jobId) ?? null);
      this.answerByJob.set(jobId, view);
    }
    return view;
  }

  /**
   * Marks a layer on a surface done, or reopens it, on the day `on` (YYYY-MM-DD, the day on site).
   * Resolves once the server counted it or, without a connection, once it is kept on the phone.
   * Rejects with MarkRefused when the server refuses it now (the mark is then dropped), or with an
   * Error when nobody is signed in or the phone cannot keep it.
   */
  async mark(jobId: string, workItemId: string, kind: LayerMarkKind, on: string): Promise<void> {
    const owner = this.owner() ?? (await this.session.load(), this.owner());
    if (!owner) throw new Error('Sign in to mark progress.');
    const { queue, mark } = addMark(this.queue(), { owner, jobId, workItemId, kind, on }, { clientKey: newClientKey(), madeAt: nowIso() });
    if (queue !== this.queue()) {
      this.queue.set(queue);
      if (this.browser && !this.store.write(queue) && !this.connected()) {
        this.queue.set(withoutMark(queue, mark.clientKey));
        throw new Error('This phone could not keep the mark: free some space and try again.');
      }
    }
    if (!this.connected()) return;
    await this.flush();
    const after = this.queue().find((m) => m.clientKey === mark.clientKey);
    if (after?.state === 'refused') {
      this.dismiss(after.clientKey);
      throw new MarkRefused(after.problem ?? null);
    }
  }

  /** Forgets a refused mark once the person has read why. */
  dismiss(clientKey: string): void {
    this.update(withoutMark(this.queue(), clientKey));
  }

  /** Sends the signed-in person's waiting marks, one at a time, oldest first; one run at a time. */
  flush(): Promise<void> {
    this.flushing ??= this.sendAll().finally(() => (this.flushing = null));
    return this.flushing;
  }

  /** Browser only, once (app start): listens to the connection and the person, and sends what waits. */
  start(): void {
    if (!this.browser || this.started) return;
    this.started = true;
    const online = () => {
      this.connected.set(true);
      this.retries = 0;
      void this.flush();
    };
    const visible = () => {
      if (document.visibilityState === 'visible' && this.connected()) void this.flush();
    };
    // The service worker took charge of the page (first visit): have it keep what the page read before.
    const controlled = () => {
      if (this.owner()) void this.copies.warm(location.pathname);
    };
    const unlisten = listenAll([
      [window, 'online', online],
      [window, 'offline', () => this.connected.set(false)],
      [document, 'visibilitychange', visible],
      ['serviceWorker' in navigator ? navigator.serviceWorker : null, 'controllerchange', controlled],
    ]);
    const unwatch = this.store.watch((queue) => this.queue.set(queue));
    this.injector.get(DestroyRef).onDestroy(() => {
      unlisten();
      unwatch();
      this.clearRetry();
    });
    void this.session.load().then(() => {
      // Once the session is known: whose offline copies these are, and send that person's marks.
      effect(
        () => {
          const owner = this.owner();
          void this.copies.keepFor(owner);
          if (owner) void this.flush();
        },
        { injector: this.injector },
      );
    });
  }

  private async sendAll(): Promise<void> {
    let freshToken = false;
    for (;;) {
      const owner = this.owner();
      const next = owner ? nextToSend(this.queue(), owner) : undefined;
      if (!next || !this.connected()) return;
      const { status, body } = await this.sender.post(next);
      if (status === 0) this.connected.set(navigator.onLine);
      const outcome = outcomeOf(status);
      if (outcome === 'sent') {
        this.retries = 0;
        this.update(withoutMark(this.queue(), next.clientKey));
        if (isProgressView(body)) this.answers.update((map) => new Map(map).set(next.jobId, body));
      } else if (outcome === 'later') {
        this.retryLater();
        return;
      } else if (outcome === 'token' && !freshToken) {
        freshToken = true;
        if (!(await this.refreshSession())) return;
      } else {
        this.update(refuse(this.queue(), next.clientKey, problemText(body) ?? ''));
      }
    }
  }

  /** A fresh session answer, with a fresh CSRF token; false when nobody is signed in or no answer came. */
  private async refreshSession(): Promise<boolean> {
    const session = await this.sender.session();
    if (!session) {
      this.retryLater();
      return false;
    }
    this.session.accept(session);
    return this.owner() !== null;
  }

  private retryLater(): void {
    if (!this.browser) return;
    this.clearRetry();
    const wait = RETRY_MS[Math.min(this.retries, RETRY_MS.length - 1)];
    this.retries++;
    this.retryTimer = setTimeout(() => {
      this.retryTimer = null;
      void this.flush();
    }, wait);
  }

  private clearRetry(): void {
    if (this.retryTimer !== null) clearTimeout(this.retryTimer);
    this.retryTimer = null;
  }

  private update(queue: readonly QueuedMark[]): void {
    this.queue.set(queue);
    if (this.browser) this.store.write(queue);
  }
}

function nowIso(): string {
  return new Date().toISOString();
}

function sameMarks(a: readonly QueuedMark[], b: readonly QueuedMark[]): boolean {
  return a.length === b.length && a.every((mark, i) => mark === b[i]);
}
