import type { EstimateInputs, JobSummary } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { firmWithPricedEstimate } from '../proposals/proposal-fixtures';
import { makeAndSend, signInByLink } from '../proposals/portal-fixtures';
import { newAgent, type TestServer } from '../testing/harness';

/**
 * Test set-up for the progress, trigger and reminder specs (no spec of its own): the proposal
 * specs' firm (8.25 % tax, a primer + lime plaster system) with a second room, the Hall (walls and
 * a ceiling), so option A covers three surfaces in two rooms; sent, accepted by the client, and
 * the job it made. `timeZone` sets the firm's zone before anything is dated.
 */
export async function acceptedJob(t: TestServer, firmName: string, opts: { timeZone?: string } = {}) {
  const f = await firmWithPricedEstimate(t, firmName, { save: false });
  const hall = await withTenant(t.ctx.pool, f.firmId, async (tx) => {
    if (opts.timeZone) await tx.client.query(`update firms set time_zone = $2 where id = $1`, [tx.tenantId, opts.timeZone]);
    const { rows: site } = await tx.client.query<{ site_id: string }>(
      `select r.site_id from surfaces s join rooms r on r.tenant_id = s.tenant_id and r.id = s.room_id where s.tenant_id = $1 and s.id = $2`,
      [tx.tenantId, f.surfaceId],
    );
    const room = await tx.client.query<{ id: string }>(
      `insert into rooms (tenant_id, site_id, name, position) values ($1, $2, 'Hall', 1) returning id`,
      [tx.tenantId, site[0].site_id],
    );
    const walls = await tx.client.query<{ id: string }>(
      `insert into surfaces (tenant_id, room_id, name, shape, length_unit, position) values ($1, $2, 'Hall walls', $3, 'ft', 0) returning id`,
      [tx.tenantId, room.rows[0].id, { kind: 'walls', perimeter: 40, height: 8, openings: [] }],
    );
    const ceiling = await tx.client.query<{ id: string }>(
      `insert into surfaces (tenant_id, room_id, name, shape, length_unit, position) values ($1, $2, 'Hall ceiling', $3, 'ft', 1) returning id`,
      [tx.tenantId, room.rows[0].id, { kind: 'ceilingRect', length: 12, width: 8 }],
    );
    return { wallsId: walls.rows[0].id, ceilingId: ceiling.rows[0].id };
  });
  // The Hall first in the estimate's list: the crew order still follows the rooms' order.
  const inputs: EstimateInputs = {
    title: 'Dining room plaster',
    startDate: '2026-12-07',
    isOccupied: false,
    variants: [
      {
        id: 'A',
        label: 'Polished lime',
        surfaces: [
          { surfaceId: hall.wallsId, finishSystemId: f.systemId },
          { surfaceId: f.surfaceId, finishSystemId: f.systemId },
          { surfaceId: hall.ceilingId, finishSystemId: f.systemId },
        ],
      },
      { id: 'B', label: 'Primed only', surfaces: [{ surfaceId: f.surfaceId, finishSystemId: f.simpleId }] },
    ],
    addOns: [],
    equipment: [],
    subcontracts: [],
    sundries: [{ label: 'Masking and protection', amount: '35.00' }],
    discount: null,
    perAreaRates: {},
  };
  const saved = await f.agent.put(`/api/estimates/${f.estimateId}/inputs`).set('x-csrf-token', f.csrf()).send(inputs);
  if (saved.status !== 200) throw new Error(`estimate not saved: ${saved.status} ${JSON.stringify(saved.body)}`);
  const version = await makeAndSend(t, f);
  const client = await newAgent(t.app, 'portal');
  await signInByLink(client, version.link);
  const accepted = await client.agent
    .post(`/api/portal/proposals/${version.id}/accept`)
    .set('x-csrf-token', client.csrf())
    .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });
  if (accepted.status !== 200) throw new Error(`not accepted: ${accepted.status} ${JSON.stringify(accepted.body)}`);
  const job = ((await f.agent.get('/api/jobs')).body as { items: JobSummary[] }).items[0];
  const option = version.snapshot.options.find((o) => o.id === 'A')!;
  return { ...f, ...hall, version, client, job, option };
}

/**
 * Waits until the queue has no billing work left for these firms (checks and billing days), failing on a dead one.
 * A job that failed once waits out its retry delay (10 s and more, by the queue's policy) before running again,
 * so the wait allows for one retry on a busy machine (the specs that call it give themselves 2 minutes); when it
 * gives up, it names the jobs still waiting.
 */
export async function billingQueueSettled(t: TestServer, firmIds: readonly string[], waitMs = 60_000): Promise<void> {
  let waiting: Array<{ name: string; state: string; retry_count: number; output: unknown }> = [];
  for (const deadline = Date.now() + waitMs; Date.now() < deadline; await new Promise((r) => setTimeout(r, 100))) {
    const { rows } = await t.ctx.pool.query<{ name: string; state: string; retry_count: number; output: unknown }>(
      `select name, state, retry_count, output from pgboss.job
        where name in ('billing-evaluate', 'billing-sweep', 'billing-daily') and (data->>'tenantId' = any($1) or name = 'billing-sweep')
          and state in ('created', 'retry', 'active', 'failed')`,
      [firmIds],
    );
    if (rows.some((r) => r.state === 'failed')) throw new Error(`a billing queue job failed: ${JSON.stringify(rows)}`);
    waiting = rows;
    if (!rows.length) return;
  }
  throw new Error(`the billing queue did not settle: ${JSON.stringify(waiting)}`);
}
