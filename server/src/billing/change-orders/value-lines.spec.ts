import type { JobBillingView } from '@layerbook/contracts';
import Decimal from 'decimal.js';
import { startTestServer, TestServer } from '../../testing/harness';
import { acceptedJob, addChangeOrder, sendChangeOrder } from './change-order-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

const lump = (title: string, price: string) => ({ title, description: '', pricing: { kind: 'lumpSum' as const, price } });
const approve = { decision: 'approve', signedName: 'Edwina Marl', consent: true };
const sum = (xs: string[]) => xs.reduce((a, b) => a.plus(b), new Decimal(0)).toFixed(2);

describe('a deduction on a job billed by progress', () => {
  it('comes off the value lines no work has touched, which still add up to the contract sum; progress drafts still work', async () => {
    const f = await acceptedJob(t, 'Deduct Progress Plaster');
    const billing = (): Promise<JobBillingView> => f.agent.get(`/api/jobs/${f.jobId}/billing`).then((r) => r.body as JobBillingView);
    expect(
      (await f.agent.put(`/api/jobs/${f.jobId}/billing/schedule`).set('x-csrf-token', f.csrf()).send({ method: 'progress', lines: [] }))
        .status,
    ).toBe(200);
    expect((await f.agent.post(`/api/jobs/${f.jobId}/billing/start`).set('x-csrf-token', f.csrf()).send({})).status).toBe(200);
    const before = await billing();
    const down = await sendChangeOrder(f, (await addChangeOrder(f, lump('Leave out the border', '-100.00'))).id);
    const res = await f.client.agent
      .post(`/api/portal/change-orders/${down.id}/decision`)
      .set('x-csrf-token', f.client.csrf())
      .send(approve);
    expect(res.status).toBe(200);

    const after = await billing();
    expect(after.contractSum).toBe(new Decimal(before.contractSum).minus('108.25').toFixed(2));
    expect(sum(after.valueLines.map((l) => l.scheduledValue))).toBe(after.contractSum);
    // no new negative line: the same lines, none below zero (a negative one stopped every progress draft)
    expect(after.valueLines).toHaveLength(before.valueLines.length);
    expect(after.valueLines.every((l) => !new Decimal(l.scheduledValue).isNegative())).toBe(true);

    const draft = await f.agent
      .post(`/api/jobs/${f.jobId}/invoices`)
      .set('x-csrf-token', f.csrf())
      .send({ kind: 'progress', periodEnd: '2026-12-01' });
    expect(draft.status).toBe(201);
  });

  it('is not sent, or not approved, when it is larger than the work not yet started, and nothing moves', async () => {
    const f = await acceptedJob(t, 'Deduct Too Much Plaster');
    await f.agent.put(`/api/jobs/${f.jobId}/billing/schedule`).set('x-csrf-token', f.csrf()).send({ method: 'progress', lines: [] });
    await f.agent.post(`/api/jobs/${f.jobId}/billing/start`).set('x-csrf-token', f.csrf()).send({});
    // Sent while no work was recorded, so it fitted then.
    const down = await sendChangeOrder(f, (await addChangeOrder(f, lump('Leave out the border', '-100.00'))).id);
    const before = (await f.agent.get(`/api/jobs/${f.jobId}/billing`)).body as JobBillingView;
    for (const line of before.valueLines) {
      await f.agent
        .post(`/api/jobs/${f.jobId}/progress`)
        .set('x-csrf-token', f.csrf())
        .send({ kind: 'valuePercent', valueLineId: line.id, percentComplete: 10, on: '2026-12-01' });
    }
    // Now every line has work on it: a second deduction is not sent to be refused at approval.
    const second = await addChangeOrder(f, lump('Leave out the frieze', '-50.00'));
    const notSent = await f.agent.post(`/api/change-orders/${second.id}/send`).set('x-csrf-token', f.csrf()).send({});
    expect(notSent.status).toBe(409);
    expect(notSent.body.detail).toMatch(/takes off more than the work not yet started on the schedule of values/);
    const res = await f.client.agent
      .post(`/api/portal/change-orders/${down.id}/decision`)
      .set('x-csrf-token', f.client.csrf())
      .send(approve);
    expect(res.status).toBe(409);
    expect(res.body.detail).toMatch(/larger than the work not yet started/);
    // Named as the amount's: the portal says the job can no longer take it, not that it was answered.
    expect(res.body.errors.map((e: { field: string }) => e.field)).toEqual(['amount']);
    const after = (await f.agent.get(`/api/jobs/${f.jobId}/billing`)).body as JobBillingView;
    expect(after.contractSum).toBe(before.contractSum);
    expect(after.valueLines.map((l) => l.scheduledValue)).toEqual(before.valueLines.map((l) => l.scheduledValue));
  });
});
