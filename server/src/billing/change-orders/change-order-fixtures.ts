import type { ChangeOrderCreate, ChangeOrderView, EstimateInputs, EstimateView, ItemList, JobSummary } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { makeAndSend, sentProposal } from '../../proposals/portal-fixtures';
import type { TestServer } from '../../testing/harness';

/**
 * Test set-up for the change-order specs (no spec of its own): a firm (8.25 % tax on the whole
 * job) whose client accepted option A, so there is a job with a deposit, a progress payment and a
 * final payment; the client is signed in to the portal.
 */
export async function acceptedJob(t: TestServer, firmName: string) {
  const p = await sentProposal(t, firmName);
  const accepted = await p.client.agent
    .post(`/api/portal/proposals/${p.version.id}/accept`)
    .set('x-csrf-token', p.client.csrf())
    .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });
  if (accepted.status !== 200) throw new Error(`proposal not accepted: ${accepted.status} ${JSON.stringify(accepted.body)}`);
  const job = ((await p.agent.get('/api/jobs')).body as ItemList<JobSummary>).items[0];
  return { ...p, jobId: job.id };
}

type Accepted = Awaited<ReturnType<typeof acceptedJob>>;

/** A second accepted job for the same client and site: another estimate, proposed and accepted. */
export async function secondJob(t: TestServer, f: Accepted): Promise<string> {
  const first = (await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView;
  const made = (
    await f.agent
      .post('/api/estimates')
      .set('x-csrf-token', f.csrf())
      .send({ siteId: first.siteId, title: 'Hall limewash', startDate: '2026-12-14' })
  ).body as EstimateView;
  const inputs: EstimateInputs = {
    ...first.inputs,
    title: 'Hall limewash',
    startDate: '2026-12-14',
    variants: [first.inputs.variants[1]],
    addOns: [],
  };
  const saved = await f.agent.put(`/api/estimates/${made.id}/inputs`).set('x-csrf-token', f.csrf()).send(inputs);
  if (saved.status !== 200) throw new Error(`second estimate not saved: ${saved.status} ${JSON.stringify(saved.body)}`);
  const version = await makeAndSend(t, { ...f, estimateId: made.id });
  const accepted = await f.client.agent
    .post(`/api/portal/proposals/${version.id}/accept`)
    .set('x-csrf-token', f.client.csrf())
    .send({ variantId: version.snapshot.options[0].id, signedName: 'Edwina Marl', consent: true });
  if (accepted.status !== 200) throw new Error(`second proposal not accepted: ${accepted.status} ${JSON.stringify(accepted.body)}`);
  const jobs = ((await f.agent.get('/api/jobs')).body as ItemList<JobSummary>).items;
  return jobs.find((j) => j.id !== f.jobId)!.id;
}

export async function addChangeOrder(f: Accepted, body: ChangeOrderCreate, jobId = f.jobId): Promise<ChangeOrderView> {
  const res = await f.agent.post(`/api/jobs/${jobId}/change-orders`).set('x-csrf-token', f.csrf()).send(body);
  if (res.status !== 201) throw new Error(`change order not made: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as ChangeOrderView;
}

export async function sendChangeOrder(f: Accepted, id: string): Promise<ChangeOrderView> {
  const res = await f.agent.post(`/api/change-orders/${id}/send`).set('x-csrf-token', f.csrf()).send({});
  if (res.status !== 200) throw new Error(`change order not sent: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as ChangeOrderView;
}

/** The job's money as the database holds it: contract sum and tax, schedule lines, value lines. */
export async function jobMoney(t: TestServer, f: Accepted, jobId = f.jobId) {
  return withTenant(t.ctx.pool, f.firmId, async (tx) => {
    const job = (
      await tx.client.query<{ contract_sum: string; contract_tax: string }>(
        `select contract_sum::text as contract_sum, contract_tax::text as contract_tax from jobs where tenant_id = $1 and id = $2`,
        [tx.tenantId, jobId],
      )
    ).rows[0];
    const lines = (
      await tx.client.query<{
        id: string;
        position: number;
        label: string;
        role: string;
        amount: string;
        status: string;
        trigger: unknown;
      }>(
        `select id, position, label, role, amount::text as amount, status, trigger from payment_schedule_lines where tenant_id = $1 and job_id = $2 order by position`,
        [tx.tenantId, jobId],
      )
    ).rows;
    const valueLines = (
      await tx.client.query<{ label: string; scheduled_value: string; change_order_id: string | null }>(
        `select label, scheduled_value::text as scheduled_value, change_order_id from job_value_lines where tenant_id = $1 and job_id = $2 order by position`,
        [tx.tenantId, jobId],
      )
    ).rows;
    return { ...job, lines, valueLines };
  });
}

/** Marks schedule lines as billed, as issuing their invoices would. */
export async function markBilled(
  t: TestServer,
  f: Accepted,
  positions: number[],
  status: 'ready' | 'invoiced' = 'invoiced',
): Promise<void> {
  await withTenant(t.ctx.pool, f.firmId, (tx) =>
    tx.client.query(`update payment_schedule_lines set status = $4 where tenant_id = $1 and job_id = $2 and position = any($3)`, [
      tx.tenantId,
      f.jobId,
      positions,
      status,
    ]),
  );
}

/** Makes a change order, sends it and has the client approve it (typed signature): the approved order. */
export async function approvedChangeOrder(f: Accepted, body: ChangeOrderCreate): Promise<ChangeOrderView> {
  const sent = await sendChangeOrder(f, (await addChangeOrder(f, body)).id);
  const res = await f.client.agent
    .post(`/api/portal/change-orders/${sent.id}/decision`)
    .set('x-csrf-token', f.client.csrf())
    .send({ decision: 'approve', signedName: 'Edwina Marl', consent: true });
  if (res.status !== 200) throw new Error(`change order not approved: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as ChangeOrderView;
}
