import { type MarkInput, addMark, marksFor, nextToSend, outcomeOf, parseQueue, problemText, refuse, withoutMark } from './mark-queue';

const A = 'user-a:firm-1';
const B = 'user-b:firm-1';
const done = (workItemId: string, owner = A, jobId = 'job-1'): MarkInput => ({
  owner,
  jobId,
  workItemId,
  kind: 'layerDone',
  on: '2026-12-02',
});
const made = (clientKey: string) => ({ clientKey, madeAt: '2026-12-02T15:00:00.000Z' });

describe('the queue of marks on the phone', () => {
  it('keeps marks in the order they were made and sends the oldest first', () => {
    let q = addMark([], done('w1'), made('k1')).queue;
    q = addMark(q, done('w2'), made('k2')).queue;
    q = addMark(q, { ...done('w1'), kind: 'layerReopened' }, made('k3')).queue;
    expect(q.map((m) => m.clientKey)).toEqual(['k1', 'k2', 'k3']);
    expect(nextToSend(q, A)?.clientKey).toBe('k1');
    expect(nextToSend(withoutMark(q, 'k1'), A)?.clientKey).toBe('k2');
  });

  it('a double tap adds nothing: the mark already waiting for that layer is answered', () => {
    const first = addMark([], done('w1'), made('k1'));
    const again = addMark(first.queue, done('w1'), made('k2'));
    expect(again.queue).toBe(first.queue);
    expect(again.mark.clientKey).toBe('k1');
  });

  it('done, reopened, done again on the same layer are three marks (the server applies them in order)', () => {
    let q = addMark([], done('w1'), made('k1')).queue;
    q = addMark(q, { ...done('w1'), kind: 'layerReopened' }, made('k2')).queue;
    q = addMark(q, done('w1'), made('k3')).queue;
    expect(q.map((m) => `${m.kind}:${m.clientKey}`)).toEqual(['layerDone:k1', 'layerReopened:k2', 'layerDone:k3']);
  });

  it('only the person (and firm) who made a mark sees and sends it', () => {
    let q = addMark([], done('w1', A), made('k1')).queue;
    q = addMark(q, done('w2', B), made('k2')).queue;
    q = addMark(q, done('w3', A, 'job-2'), made('k3')).queue;
    expect(marksFor(q, A, 'job-1').map((m) => m.clientKey)).toEqual(['k1']);
    expect(marksFor(q, B, 'job-1').map((m) => m.clientKey)).toEqual(['k2']);
    expect(marksFor(q, null, 'job-1')).toEqual([]);
    expect(nextToSend(q, B)?.clientKey).toBe('k2');
    expect(nextToSend(q, 'user-a:firm-2')).toBeUndefined();
  });

  it('a refused mark stays to be read but is not sent again', () => {
    let q = addMark([], done('w1'), made('k1')).queue;
    q = addMark(q, done('w2'), made('k2')).queue;
    q = refuse(q, 'k1', 'The day cannot be later than December 3, 2026.');
    expect(nextToSend(q, A)?.clientKey).toBe('k2');
    expect(marksFor(q, A, 'job-1')[0]).toMatchObject({ state: 'refused', problem: 'The day cannot be later than December 3, 2026.' });
    // a new mark on a layer whose last mark was refused is a new mark
    expect(addMark(q, done('w1'), made('k3')).mark.clientKey).toBe('k3');
  });
});

describe('what an answer means for a mark', () => {
  // RFC 9110 §15 — status code classes; the progress route answers 201 and a repeated clientKey answers the same
  it.each([
    [201, 'sent'],
    [200, 'sent'],
    [0, 'later'],
    [401, 'later'],
    [408, 'later'],
    [429, 'later'],
    [500, 'later'],
    [502, 'later'],
    [503, 'later'],
    [403, 'token'],
    [400, 'refused'],
    [404, 'refused'],
    [409, 'refused'],
  ] as const)('%i → %s', (status, outcome) => {
    expect(outcomeOf(status)).toBe(outcome);
  });

  it('reads the server words from problem+json (RFC 9457): a field message, else detail, else title', () => {
    expect(
      problemText({ title: 'Bad request', errors: [{ field: 'on', message: 'The day cannot be later than December 3, 2026.' }] }),
    ).toBe('The day cannot be later than December 3, 2026.');
    expect(problemText({ title: 'Conflict', detail: 'This job is cancelled: its progress can no longer change.' })).toBe(
      'This job is cancelled: its progress can no longer change.',
    );
    expect(problemText({ title: 'Not found' })).toBe('Not found');
    expect(problemText('<html>')).toBeNull();
    expect(problemText(null)).toBeNull();
  });
});

describe('the stored copy', () => {
  it('reads back what was written and drops damaged entries', () => {
    const q = addMark([], done('w1'), made('k1')).queue;
    expect(parseQueue(JSON.stringify(q))).toEqual(q);
    const damaged = JSON.stringify([...q, { clientKey: 'x' }, { ...q[0], on: '2.12.2026' }, { ...q[0], kind: 'storedMaterials' }, null]);
    expect(parseQueue(damaged)).toEqual(q);
    expect(parseQueue('{not json')).toEqual([]);
    expect(parseQueue('{"a":1}')).toEqual([]);
    expect(parseQueue(null)).toEqual([]);
  });
});
