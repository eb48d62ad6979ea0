import { DEFAULT_BILLING_SETTINGS, type JobBillingView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../testing/harness';
import { billingJob } from './billing-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

/** A 10,000 progress job without retainage, two value lines of 5,000, billing started. */
async function twoLineJob(name: string) {
  const f = await billingJob(t, name);
  const settings = { ...DEFAULT_BILLING_SETTINGS, retainage: { workPercent: 0, storedPercent: 0, stopAtPercentComplete: null } };
  expect((await f.send('put', '/api/firm/billing', settings)).status).toBe(200);
  await withTenant(t.ctx.pool, f.firmId, (tx) =>
    tx.client.query(
      `update jobs set contract_sum = 10000, original_contract_sum = 10000, contract_tax = 0 where tenant_id = $1 and id = $2`,
      [tx.tenantId, f.jobId],
    ),
  );
  expect((await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, { method: 'progress', lines: [] })).status).toBe(200);
  const values = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
    lines: [
      { label: 'Walls', scheduledValue: '5000.00' },
      { label: 'Ceilings', scheduledValue: '5000.00' },
    ],
  });
  expect(values.status).toBe(200);
  expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(200);
  const [walls, ceilings] = (values.body as JobBillingView).valueLines;
  return { f, walls: walls.id, ceilings: ceilings.id };
}

describe('editing the schedule of values', () => {
  // DOMAIN.md §2.10: G (work to date + stored) ≤ C. A line lowered below what it holds made every
  // later application fail to tie out (409 on drafting), with nothing said on the edit itself.
  it('refuses a line lowered below its billed work plus stored materials, or below its recorded percent plus stored', async () => {
    const { f, walls, ceilings } = await twoLineJob('Lowered Line Plaster');
    const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-11-30' });
    expect(draft.status).toBe(201);
    const figured = await f.send('patch', `/api/invoices/${draft.body.id}`, {
      progressLines: [{ valueLineId: walls, workToDate: { amount: '3000.00' }, storedMaterials: '1500.00' }],
    });
    expect(figured.status).toBe(200);
    await f.issue(draft.body.id);
    const put = (wallsValue: string, ceilingsValue: string) =>
      f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
        lines: [
          { id: walls, label: 'Walls', scheduledValue: wallsValue },
          { id: ceilings, label: 'Ceilings', scheduledValue: ceilingsValue },
        ],
      });

    // 3,000 billed and 1,500 stored do not fit in 3,500.
    const lowered = await put('3500.00', '6500.00');
    expect(lowered.status).toBe(400);
    expect(lowered.body.errors).toEqual([
      {
        field: 'lines.0.scheduledValue',
        message:
          "With 3000.00 of work done and 1500.00 of materials stored, work done and stored would pass the line's value 3500.00: keep the value higher, or lower the stored materials first.",
      },
    ]);

    // The ceilings at 80 % with 500 stored, not billed yet: at 2,400 the percent comes to 1,920, and 2,420 with what is stored.
    const next = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-11-30' });
    expect(next.status).toBe(201);
    const marked = await f.send('patch', `/api/invoices/${next.body.id}`, {
      progressLines: [{ valueLineId: ceilings, workToDate: { percent: 80 }, storedMaterials: '500.00' }],
    });
    expect(marked.status).toBe(200);
    const belowPercent = await put('7600.00', '2400.00');
    expect(belowPercent.status).toBe(400);
    expect(belowPercent.body.errors).toEqual([
      {
        field: 'lines.1.scheduledValue',
        message:
          "With 1920.00 of work done and 500.00 of materials stored, work done and stored would pass the line's value 2400.00: keep the value higher, or lower the stored materials first.",
      },
    ]);

    // Exactly what each line holds is taken, and the next application still ties out.
    expect((await put('4500.00', '5500.00')).status).toBe(200);
    expect((await put('7500.00', '2500.00')).status).toBe(200);
    const refigured = await f.send('patch', `/api/invoices/${next.body.id}`, { periodEnd: '2026-11-30' });
    expect(refigured.status).toBe(200);
  });
});
