import type { CashJobs, EstimateView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { sentProposal } from './portal-fixtures';
import { startTestServer, type TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('the office re-saves the estimate after the proposal was sent, then the client accepts', () => {
  it('makes the job from the version the client signed (option B, primer only), not from the estimate as saved since', async () => {
    const p = await sentProposal(t, 'Resave Accept Plaster');
    const signedB = p.version.snapshot.options.find((o) => o.id === 'B')!;
    // v1 as sent: option B puts only the "Primed walls" system on the walls.
    expect(p.version.snapshot.scope[0].surfaces[0].finishes.find((x) => x.optionId === 'B')?.finish).toBe('Primed walls');

    // Preparing a v2, the office changes option B to the lime plaster system and saves (allowed: the
    // estimate is only "proposed"). v1 stays sent and acceptable.
    const est = (await p.agent.get(`/api/estimates/${p.estimateId}`)).body as EstimateView;
    const inputs = {
      ...est.inputs,
      variants: est.inputs.variants.map((v) =>
        v.id === 'B' ? { ...v, surfaces: v.surfaces.map((s) => ({ ...s, finishSystemId: p.systemId })) } : v,
      ),
    };
    const saved = await p.agent.put(`/api/estimates/${p.estimateId}/inputs`).set('x-csrf-token', p.csrf()).send(inputs);
    expect(saved.status).toBe(200);

    const accepted = await p.client.agent
      .post(`/api/portal/proposals/${p.version.id}/accept`)
      .set('x-csrf-token', p.client.csrf())
      .send({ variantId: 'B', signedName: 'Edwina Marl', consent: true });
    expect(accepted.status).toBe(200);

    const job = await withTenant(t.ctx.pool, p.firmId, async (tx) => {
      const j = (
        await tx.client.query<{ id: string; contract_sum: string }>(`select id, contract_sum::text from jobs where tenant_id = $1`, [
          tx.tenantId,
        ])
      ).rows[0];
      const layers = (
        await tx.client.query<{ layer_id: string }>(
          `select layer_id from job_work_items where tenant_id = $1 and job_id = $2 order by position`,
          [tx.tenantId, j.id],
        )
      ).rows.map((r) => r.layer_id);
      return { ...j, layers };
    });
    // The contract sum, the crew's work (work items, and so the sheet and schedule of values) and the
    // Cash page's estimated price are all the signed option B's: the version keeps the result it was made from.
    expect(job.contract_sum).toBe(signedB.total);
    expect(job.layers).toEqual(['prime']);
    const cash = (await p.agent.get('/api/cash/jobs')).body as CashJobs;
    expect(cash.jobs.find((j) => j.jobId === job.id)?.estimated).toBe(signedB.total);
  });
});
