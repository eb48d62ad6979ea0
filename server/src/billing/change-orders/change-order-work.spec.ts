import type { JobBillingView, JobProgressView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../../testing/harness';
import { billingJob } from '../billing-fixtures';
import { approvedChangeOrder } from './change-order-fixtures';
import { billingQueueSettled } from '../progress-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

// An engine-priced change order adds surfaces under a finish; its money is spread over the unbilled payments, the
// stage payment "when <layer> is finished on every surface" among them — which must then wait for those surfaces.
describe('the work a change order adds', () => {
  it('is on the job to mark, and holds back the stage payment that took its money', async () => {
    const f = await billingJob(t, 'Change Order Work Plaster');
    const nicheId = await withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const { rows } = await tx.client.query<{ room_id: string }>(`select room_id from surfaces where tenant_id = $1 and id = $2`, [
        tx.tenantId,
        f.surfaceId,
      ]);
      const made = await tx.client.query<{ id: string }>(
        `insert into surfaces (tenant_id, room_id, name, shape, length_unit) values ($1, $2, 'Niche walls', $3, 'ft') returning id`,
        [tx.tenantId, rows[0].room_id, { kind: 'walls', perimeter: 12, height: 8, openings: [] }],
      );
      return made.rows[0].id;
    });
    const started = await f.send('post', `/api/jobs/${f.jobId}/billing/start`);
    expect(started.status).toBe(200);
    const stage = (started.body as JobBillingView).lines.find((l) => l.trigger.kind === 'layerComplete')!;
    await approvedChangeOrder(f, {
      title: 'Niche',
      description: '',
      pricing: { kind: 'engine', surfaceIds: [nicheId], finishSystemId: f.systemId },
    });
    // the stage payment grew with the change order
    const grown = (await f.billing()).lines.find((l) => l.id === stage.id)!;
    expect(Number(grown.amount)).toBeGreaterThan(Number(stage.amount));

    const progress = (await f.agent.get(`/api/jobs/${f.jobId}/progress`)).body as JobProgressView;
    const layerId = stage.trigger.kind === 'layerComplete' ? stage.trigger.layerId : '';
    // Every surface of the accepted option done for the stage's layer.
    for (const w of progress.workItems.filter((i) => i.layerId === layerId && i.surfaceId !== nicheId)) {
      const res = await f.send('post', `/api/jobs/${f.jobId}/progress`, { kind: 'layerDone', workItemId: w.id, on: '2026-12-01' });
      expect(res.status).toBe(201);
    }
    await billingQueueSettled(t, [f.firmId]);
    const line = (await f.billing()).lines.find((l) => l.id === stage.id)!;
    expect(progress.workItems.filter((w) => w.surfaceId === nicheId).map((w) => w.layerId)).toEqual(
      progress.workItems.filter((w) => w.surfaceId === f.surfaceId).map((w) => w.layerId),
    );
    expect(line.status).toBe('scheduled');
    // the niche's layer done too: now the stage payment is drafted
    const niche = progress.workItems.find((w) => w.surfaceId === nicheId && w.layerId === layerId)!;
    expect(
      (await f.send('post', `/api/jobs/${f.jobId}/progress`, { kind: 'layerDone', workItemId: niche.id, on: '2026-12-01' })).status,
    ).toBe(201);
    await billingQueueSettled(t, [f.firmId]);
    expect((await f.billing()).lines.find((l) => l.id === stage.id)!.status).toBe('ready');
  }, 120_000);
});
