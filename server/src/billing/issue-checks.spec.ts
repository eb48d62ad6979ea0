import { DEFAULT_BILLING_SETTINGS, type InvoiceDetail, type JobBillingView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../testing/harness';
import { billingJob } from './billing-fixtures';
import { billingQueueSettled } from './progress-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

/** A 10,000 progress job with the given retainage on work and stored materials, billing started, its value lines as given. */
async function progressJob(name: string, retainagePercent: number, lines: ReadonlyArray<readonly [string, string]>) {
  const f = await billingJob(t, name);
  const retainage = { workPercent: retainagePercent, storedPercent: retainagePercent, stopAtPercentComplete: null };
  expect((await f.send('put', '/api/firm/billing', { ...DEFAULT_BILLING_SETTINGS, retainage })).status).toBe(200);
  await withTenant(t.ctx.pool, f.firmId, (tx) =>
    tx.client.query(
      `update jobs set contract_sum = 10000, original_contract_sum = 10000, contract_tax = 0 where tenant_id = $1 and id = $2`,
      [tx.tenantId, f.jobId],
    ),
  );
  expect((await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, { method: 'progress', lines: [] })).status).toBe(200);
  const values = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
    lines: lines.map(([label, scheduledValue]) => ({ label, scheduledValue })),
  });
  expect(values.status).toBe(200);
  expect((await f.send('post', `/api/jobs/${f.jobId}/billing/start`)).status).toBe(200);
  return { f, lineIds: (values.body as JobBillingView).valueLines.map((l) => l.id) };
}

describe('issuing what the office confirmed', () => {
  it('refuses (409) an application whose total, figured again at issue, is not the total the office confirmed', async () => {
    const { f, lineIds } = await progressJob('Confirmed Total Plaster', 0, [
      ['Walls', '5000.00'],
      ['Ceilings', '5000.00'],
    ]);
    const [walls, ceilings] = lineIds;
    const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd: '2026-11-30' });
    const done = await f.send('patch', `/api/invoices/${draft.body.id}`, {
      progressLines: [{ valueLineId: walls, workToDate: { percent: 100 }, storedMaterials: '0' }],
    });
    expect(done.body).toMatchObject({ total: '5000.00' });
    // The issue dialog shows 5,000; meanwhile the walls are re-valued at 2,500.
    const moved = await f.send('put', `/api/jobs/${f.jobId}/billing/value-lines`, {
      lines: [
        { id: walls, label: 'Walls', scheduledValue: '2500.00' },
        { id: ceilings, label: 'Ceilings', scheduledValue: '7500.00' },
      ],
    });
    expect(moved.status).toBe(200);
    const refused = await f.send('post', `/api/invoices/${draft.body.id}/issue`, { send: false, expectedTotal: '5000.00' });
    expect(refused.status).toBe(409);
    const message =
      "This invoice now comes to 2500.00, not the 5000.00 you confirmed: the job's figures changed since it was drafted. Check the new total, then issue it.";
    expect(refused.body.errors).toEqual([{ field: 'expectedTotal', message }]);
    expect((await f.agent.get(`/api/invoices/${draft.body.id}`)).body).toMatchObject({ status: 'draft', number: null });
    // The dialog figures the draft again (its period kept) and the office confirms the new total.
    const refigured = await f.send('patch', `/api/invoices/${draft.body.id}`, { periodEnd: '2026-11-30' });
    expect(refigured.body).toMatchObject({ total: '2500.00' });
    const issued = await f.send('post', `/api/invoices/${draft.body.id}/issue`, { send: false, expectedTotal: '2500.00' });
    expect(issued.status).toBe(200);
    expect(issued.body as InvoiceDetail).toMatchObject({ number: 'INV-0001', total: '2500.00' });
  });

  it('refigures an open retainage release when a later application is issued, and refuses (409) one still stale at issue', async () => {
    const { f, lineIds } = await progressJob('Later Release Plaster', 10, [['All the work', '10000.00']]);
    const application = async (percent: number, periodEnd: string) => {
      const draft = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'progress', periodEnd });
      await f.send('patch', `/api/invoices/${draft.body.id}`, {
        progressLines: [{ valueLineId: lineIds[0], workToDate: { percent }, storedMaterials: '0' }],
      });
      return f.issue(draft.body.id);
    };
    await application(50, '2026-11-15');
    const release = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'retainage' });
    expect(release.body).toMatchObject({ subtotal: '500.00' });
    // Application #2 holds 800 in all: the release drafted at 500 would leave 300 unbilled, said nowhere.
    await application(80, '2026-11-30');
    await billingQueueSettled(t, [f.firmId]);
    const refreshed = (await f.agent.get(`/api/invoices/${release.body.id}`)).body as InvoiceDetail;
    expect(refreshed).toMatchObject({ status: 'draft', subtotal: '800.00', total: '800.00' });
    expect(refreshed.lines.map((l) => [l.label, l.amount])).toEqual([['Retainage released', '800.00']]);
    expect(refreshed.auditTrail.map((a) => a.text)).toContain('Refigured from $500.00 to $800.00: the job’s other invoices changed');

    // Issued before the queue refigured it, a stale release is refused.
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update invoices set subtotal = 500, total = 500 where tenant_id = $1 and id = $2`, [tx.tenantId, release.body.id]),
    );
    const stale = await f.send('post', `/api/invoices/${release.body.id}/issue`, { send: false });
    expect(stale.status).toBe(409);
    expect(stale.body.detail).toBe(
      'More retainage is held now (800.00) than this release bills: an application was issued after it was drafted. Delete it and draft the release again.',
    );
    expect((await f.send('delete', `/api/invoices/${release.body.id}`)).status).toBe(204);
    const again = await f.send('post', `/api/jobs/${f.jobId}/invoices`, { kind: 'retainage' });
    expect(again.body).toMatchObject({ subtotal: '800.00', total: '800.00' });
    const issued = await f.send('post', `/api/invoices/${again.body.id}/issue`, { send: false, expectedTotal: '800.00' });
    expect(issued.status).toBe(200);
    expect((await f.billing()).totals.retainageHeld).toBe('0.00');
  });
});
