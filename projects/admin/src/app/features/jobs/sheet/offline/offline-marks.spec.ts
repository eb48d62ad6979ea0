import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import type { JobProgressView, ProgressMark } from '@layerbook/contracts/types';
import { Session, type StaffUser } from '../../../../core/auth/session';
import { MARKS_KEY } from './mark-store';
import { OfflineCopies } from './offline-copies';
import { MarkRefused, OfflineMarks } from './offline-marks';

const JOB = '0b5c6a1e-1111-4222-8333-944455556666';
const ITEM = '7d1f0c2a-2222-4333-8444-a55566667777';
const ITEM_2 = '7d1f0c2a-2222-4333-8444-a55566668888';
const url = `/api/jobs/${JOB}/progress`;
const rosa = { id: 'u-rosa', firmId: 'f-1', role: 'crew', name: 'Rosa' } as StaffUser;
const view = (doneOn: string | null): JobProgressView => ({
  workItems: [
    {
      id: ITEM,
      position: 1,
      roomName: 'Hall',
      surfaceId: 's',
      surfaceName: 'Walls',
      layerId: 'l',
      layerName: 'Lime base coat',
      layerOrder: 1,
      doneOn,
      changeOrder: null,
    },
  ],
  walkthroughOn: null,
  valueLines: [],
});

describe('OfflineMarks', () => {
  let onLine: boolean;
  let user: ReturnType<typeof signal<StaffUser | null>>;
  let http: HttpTestingController;
  let kept: Array<string | null>;

  function setUp(): OfflineMarks {
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        {
          provide: Session,
          useValue: { user, load: () => Promise.resolve(user()), accept: (s: { user: StaffUser | null }) => user.set(s.user) },
        },
        { provide: OfflineCopies, useValue: { keepFor: (owner: string | null) => kept.push(owner), warm: () => undefined } },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    return TestBed.inject(OfflineMarks);
  }

  const settle = () => new Promise((resolve) => setTimeout(resolve, 0));
  const goOnline = () => {
    onLine = true;
    window.dispatchEvent(new Event('online'));
  };

  beforeEach(() => {
    localStorage.clear();
    onLine = true;
    user = signal<StaffUser | null>(rosa);
    kept = [];
    vi.spyOn(navigator, 'onLine', 'get').mockImplementation(() => onLine);
  });
  afterEach(() => {
    http.verify();
    TestBed.resetTestingModule();
    vi.restoreAllMocks();
  });

  it('offline: keeps the mark on the phone and sends it, with the same key, once back online', async () => {
    onLine = false;
    const marks = setUp();
    marks.start();
    await marks.mark(JOB, ITEM, 'layerDone', '2026-12-02');

    expect(marks.online()).toBe(false);
    expect(marks.pending(JOB)()).toMatchObject([{ workItemId: ITEM, kind: 'layerDone', on: '2026-12-02', state: 'waiting' }]);
    expect(JSON.parse(localStorage.getItem(MARKS_KEY)!)).toHaveLength(1);
    http.expectNone(url);

    goOnline();
    const req = http.expectOne({ method: 'POST', url });
    const sent = req.request.body as ProgressMark;
    expect(sent).toEqual({ kind: 'layerDone', workItemId: ITEM, on: '2026-12-02', clientKey: marks.pending(JOB)()[0].clientKey });
    // past the service worker, so a failed write never empties its offline copy of the progress
    expect(req.request.headers.get('ngsw-bypass')).toBe('1');
    req.flush(view('2026-12-02'), { status: 201, statusText: 'Created' });
    await settle();

    expect(marks.online()).toBe(true);
    expect(marks.pending(JOB)()).toEqual([]);
    expect(localStorage.getItem(MARKS_KEY)).toBeNull();
    expect(marks.progress(JOB)()?.workItems[0]?.doneOn).toBe('2026-12-02');
  });

  it('no answer (connection dropped mid-request): the mark stays and the resend carries the same clientKey', async () => {
    const marks = setUp();
    const made = marks.mark(JOB, ITEM, 'layerDone', '2026-12-02');
    await settle();
    const first = http.expectOne(url);
    const key = (first.request.body as ProgressMark).clientKey;
    first.error(new ProgressEvent('error'), { status: 0, statusText: 'Unknown Error' });
    await made; // kept on the phone: resolves
    expect(marks.pending(JOB)()).toHaveLength(1);

    const again = marks.flush();
    const second = http.expectOne(url);
    // same key: the server counted the first copy (if it arrived) and answers the second the same
    expect((second.request.body as ProgressMark).clientKey).toBe(key);
    second.flush(view('2026-12-02'), { status: 201, statusText: 'Created' });
    await again;
    expect(marks.pending(JOB)()).toEqual([]);
  });

  it('online and refused (a day out of range): mark() rejects with the server words and keeps nothing', async () => {
    const marks = setUp();
    const made = marks.mark(JOB, ITEM, 'layerDone', '2026-12-30');
    await settle();
    http
      .expectOne(url)
      .flush(
        { title: 'Bad request', status: 400, errors: [{ field: 'on', message: 'The day cannot be later than December 3, 2026.' }] },
        { status: 400, statusText: 'Bad Request' },
      );
    await expect(made).rejects.toEqual(new MarkRefused('The day cannot be later than December 3, 2026.'));
    expect(marks.pending(JOB)()).toEqual([]);
  });

  it('a mark kept offline and refused later stays, with the reason, and does not hold up the next one', async () => {
    onLine = false;
    const marks = setUp();
    marks.start();
    await marks.mark(JOB, ITEM, 'layerDone', '2026-12-02');
    await marks.mark(JOB, ITEM_2, 'layerDone', '2026-12-02');

    goOnline();
    http
      .expectOne((r) => (r.body as { workItemId: string }).workItemId === ITEM)
      .flush({ title: 'Conflict', status: 409, detail: 'This job is cancelled.' }, { status: 409, statusText: 'Conflict' });
    await settle();
    http
      .expectOne((r) => (r.body as { workItemId: string }).workItemId === ITEM_2)
      .flush(view(null), { status: 201, statusText: 'Created' });
    await settle();

    const left = marks.pending(JOB)();
    expect(left).toMatchObject([{ workItemId: ITEM, state: 'refused', problem: 'This job is cancelled.' }]);
    marks.dismiss(left[0].clientKey);
    expect(marks.pending(JOB)()).toEqual([]);
  });

  it('403 (a CSRF token from an older session answer): fetches a fresh session, then tries once more', async () => {
    const marks = setUp();
    const made = marks.mark(JOB, ITEM, 'layerReopened', '2026-12-02');
    await settle();
    http.expectOne(url).flush({ title: 'Forbidden', status: 403 }, { status: 403, statusText: 'Forbidden' });
    await settle();
    http.expectOne('/api/auth/session').flush({ user: rosa, csrfToken: 'fresh' });
    await settle();
    http.expectOne(url).flush(view(null), { status: 201, statusText: 'Created' });
    await made;
    expect(marks.pending(JOB)()).toEqual([]);
  });

  it('server busy (503): the mark waits, nothing is lost', async () => {
    const marks = setUp();
    const made = marks.mark(JOB, ITEM, 'layerDone', '2026-12-02');
    await settle();
    http.expectOne(url).flush({ title: 'Unavailable', status: 503 }, { status: 503, statusText: 'Service Unavailable' });
    await made;
    expect(marks.pending(JOB)()).toMatchObject([{ state: 'waiting' }]);
    expect(marks.waitingCount()).toBe(1);
  });

  it('marks survive a reload, and only the person who made them sees and sends them', async () => {
    onLine = false;
    let marks = setUp();
    await marks.mark(JOB, ITEM, 'layerDone', '2026-12-02');
    TestBed.resetTestingModule();

    // another crew member signs in on the same phone
    user = signal<StaffUser | null>({ ...rosa, id: 'u-ana' });
    onLine = true;
    marks = setUp();
    marks.start();
    await settle(); // the session is known: the effect that follows the person is made
    TestBed.tick();
    await settle();
    expect(marks.pending(JOB)()).toEqual([]);
    expect(kept).toEqual(['u-ana:f-1']);
    http.expectNone(url);

    // Rosa again: her mark is still there and goes out
    user.set(rosa);
    TestBed.tick();
    await settle();
    expect(kept).toEqual(['u-ana:f-1', 'u-rosa:f-1']);
    http.expectOne(url).flush(view('2026-12-02'), { status: 201, statusText: 'Created' });
    await settle();
    expect(marks.pending(JOB)()).toEqual([]);
  });

  it('a double tap while the first mark waits adds nothing', async () => {
    onLine = false;
    const marks = setUp();
    await marks.mark(JOB, ITEM, 'layerDone', '2026-12-02');
    await marks.mark(JOB, ITEM, 'layerDone', '2026-12-02');
    expect(marks.pending(JOB)()).toHaveLength(1);
  });

  it('nobody signed in: refuses to mark', async () => {
    user = signal<StaffUser | null>(null);
    const marks = setUp();
    await expect(marks.mark(JOB, ITEM, 'layerDone', '2026-12-02')).rejects.toThrow('Sign in to mark progress.');
  });
});
