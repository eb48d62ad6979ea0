/**
 * The phone's queue of layer marks, as plain data: what is waiting to be sent, in the order the
 * crew made the marks, and what the server refused. No Angular, no storage, no clock: the service
 * (offline-marks.ts) keeps it in a signal and on the phone (mark-store.ts).
 */

export type LayerMarkKind = 'layerDone' | 'layerReopened';

/** A mark made on the phone that the server has not counted yet. */
export interface QueuedMark {
  /** made once, when the mark is made: the server counts a mark sent twice with the same key once */
  readonly clientKey: string;
  /** who made it (`<user id>:<firm id>`): only that person, signed in to that firm, sends it */
  readonly owner: string;
  readonly jobId: string;
  readonly workItemId: string;
  readonly kind: LayerMarkKind;
  /** the day the work happened on site (YYYY-MM-DD) */
  readonly on: string;
  /** when it was made on the phone (ISO timestamp), for display only */
  readonly madeAt: string;
  /** `waiting` until sent; `refused` when the server said no (kept to show why, until dismissed) */
  readonly state: 'waiting' | 'refused';
  /** the server's words when refused */
  readonly problem?: string;
}

export type MarkInput = Pick<QueuedMark, 'owner' | 'jobId' | 'workItemId' | 'kind' | 'on'>;

/**
 * Adds a mark at the end of the queue. The same mark again for a layer whose last waiting mark is
 * already of that kind (a double tap) adds nothing and answers the mark already waiting.
 */
export function addMark(
  queue: readonly QueuedMark[],
  input: MarkInput,
  made: { clientKey: string; madeAt: string },
): { queue: readonly QueuedMark[]; mark: QueuedMark } {
  const last = lastWaiting(queue, input.owner, input.jobId, input.workItemId);
  if (last && last.kind === input.kind) return { queue, mark: last };
  const mark: QueuedMark = { ...input, clientKey: made.clientKey, madeAt: made.madeAt, state: 'waiting' };
  return { queue: [...queue, mark], mark };
}

/** The last mark still waiting for one layer on one surface, if any. */
export function lastWaiting(queue: readonly QueuedMark[], owner: string, jobId: string, workItemId: string): QueuedMark | undefined {
  for (let i = queue.length - 1; i >= 0; i--) {
    const mark = queue[i];
    if (mark.state === 'waiting' && mark.owner === owner && mark.jobId === jobId && mark.workItemId === workItemId) return mark;
  }
  return undefined;
}

/** The person's marks for one job (waiting and refused), oldest first. */
export function marksFor(queue: readonly QueuedMark[], owner: string | null, jobId: string): readonly QueuedMark[] {
  if (!owner) return [];
  return queue.filter((mark) => mark.owner === owner && mark.jobId === jobId);
}

/** The next mark to send for this person: the oldest waiting one (marks go in the order they were made). */
export function nextToSend(queue: readonly QueuedMark[], owner: string): QueuedMark | undefined {
  return queue.find((mark) => mark.state === 'waiting' && mark.owner === owner);
}

export function withoutMark(queue: readonly QueuedMark[], clientKey: string): readonly QueuedMark[] {
  return queue.filter((mark) => mark.clientKey !== clientKey);
}

export function refuse(queue: readonly QueuedMark[], clientKey: string, problem: string): readonly QueuedMark[] {
  return queue.map((mark) => (mark.clientKey === clientKey ? { ...mark, state: 'refused' as const, problem } : mark));
}

/**
 * What to do with a mark after one attempt to send it, by the answer's HTTP status (0 = no answer:
 * offline, DNS, a dropped connection).
 * - `sent`: counted (201), or counted before (the server answers a repeated clientKey the same).
 * - `later`: nothing was decided — no connection, the server busy or failing (408, 429, 5xx), or the
 *   session ended (401: the person signs in again and the mark goes then). Stop and keep the mark.
 * - `token`: 403 — most often a CSRF token from an old session answer; fetch a fresh one, try once more.
 * - `refused`: the server looked at the mark and said no (400 a day out of range, 404 a job or layer
 *   no longer there, 409 a cancelled job, 403 after a fresh token). Sending it again would answer the
 *   same, so it leaves the queue's waiting line and is shown with the server's words.
 */
export function outcomeOf(status: number): 'sent' | 'later' | 'token' | 'refused' {
  if (status >= 200 && status < 300) return 'sent';
  if (status === 0 || status === 401 || status === 408 || status === 429 || status >= 500) return 'later';
  if (status === 403) return 'token';
  return 'refused';
}

/** The server's own words from a problem+json answer (a field's message first), else null. */
export function problemText(body: unknown): string | null {
  if (typeof body !== 'object' || body === null) return null;
  const errors: unknown = (body as { errors?: unknown }).errors;
  if (Array.isArray(errors)) {
    const first: unknown = errors[0];
    if (typeof first === 'object' && first !== null && typeof (first as { message?: unknown }).message === 'string') {
      return (first as { message: string }).message;
    }
  }
  const detail: unknown = (body as { detail?: unknown }).detail;
  if (typeof detail === 'string' && detail) return detail;
  const title: unknown = (body as { title?: unknown }).title;
  return typeof title === 'string' && title ? title : null;
}

/** Reads a stored queue back, dropping anything that is not a well-formed mark (an old or damaged copy). */
export function parseQueue(text: string | null): readonly QueuedMark[] {
  if (!text) return [];
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    return [];
  }
  if (!Array.isArray(data)) return [];
  return data.filter(isQueuedMark);
}

const DAY = /^\d{4}-\d{2}-\d{2}$/;

function isQueuedMark(value: unknown): value is QueuedMark {
  if (typeof value !== 'object' || value === null) return false;
  const m = value as Record<string, unknown>;
  const texts = ['clientKey', 'owner', 'jobId', 'workItemId', 'madeAt'].every((key) => typeof m[key] === 'string' && m[key] !== '');
  return (
    texts &&
    (m['kind'] === 'layerDone' || m['kind'] === 'layerReopened') &&
    typeof m['on'] === 'string' &&
    DAY.test(m['on']) &&
    (m['state'] === 'waiting' || m['state'] === 'refused') &&
    (m['problem'] === undefined || typeof m['problem'] === 'string')
  );
}
