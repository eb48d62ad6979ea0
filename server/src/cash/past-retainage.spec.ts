import type { CashReceivables } from '@layerbook/contracts';
import { startTestServer, type TestServer } from '../testing/harness';
import { cashFirm } from './cash-fixtures';

// Receivables as of a past day are rebuilt as of that day: an invoice voided later was live then (its
// credit note is dated after it), and so was the retainage it held or released.
let t: TestServer;
let a: Awaited<ReturnType<typeof cashFirm>>;
let b: Awaited<ReturnType<typeof cashFirm>>;

beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-20T15:00:00Z'));
  a = await cashFirm(t, 'Past Retainage Plaster');
  b = await cashFirm(t, 'Past Release Plaster');
}, 180_000);
afterAll(() => t.stop());

const get = <T>(agent: typeof a.agent, url: string) => agent.get(url).then((r) => r.body as T);

it('a progress application voided after the as-of day still held its retainage on that day', async () => {
  // issued 1 November holding 100.00 retainage, 900.00 due 15 November; voided on 5 December
  const p1 = await a.invoice(1, '2026-11-01', '2026-11-15', '900.00', { kind: 'progress', retainageHeld: '100.00' });
  const before = await get<CashReceivables>(a.agent, '/api/cash/receivables?asOf=2026-11-20');
  expect([before.total, before.retainage]).toEqual(['900.00', '100.00']);
  await a.creditNote(p1, 1, '2026-12-05');
  const after = await get<CashReceivables>(a.agent, '/api/cash/receivables?asOf=2026-11-20');
  // 20 November has not changed: 900.00 owed (the credit note came later) and 100.00 retainage held
  expect([after.total, after.retainage]).toEqual(['900.00', '100.00']);
});

it('a retainage release voided after the as-of day was owed on that day, and the retainage it released not held', async () => {
  // application paid, holding 100.00; the release of all 100.00 issued 10 November, voided 5 December
  const p1 = await b.invoice(1, '2026-11-01', '2026-11-15', '900.00', {
    kind: 'progress',
    retainageHeld: '100.00',
    status: 'paid',
    amountPaid: '900.00',
  });
  await b.payment(p1, 1, '2026-11-05', '900.00');
  const release = await b.invoice(2, '2026-11-10', '2026-11-24', '100.00', { kind: 'retainage' });
  const before = await get<CashReceivables>(b.agent, '/api/cash/receivables?asOf=2026-11-20');
  expect([before.total, before.retainage]).toEqual(['100.00', '0.00']);
  await b.creditNote(release, 1, '2026-12-05');
  const after = await get<CashReceivables>(b.agent, '/api/cash/receivables?asOf=2026-11-20');
  // 20 November has not changed: the release was owed, nothing was still held
  expect([after.total, after.retainage]).toEqual(['100.00', '0.00']);
});
