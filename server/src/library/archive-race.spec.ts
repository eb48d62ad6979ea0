import type { FinishSystemView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { acceptedJob } from '../billing/progress-fixtures';
import { setProductArchived } from './products';
import { updateSystem } from './systems';
import { startTestServer, type TestServer } from '../testing/harness';

/* The product's row lock orders an archive and a system save that uses it: the second sees the first. */

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('archiving a product while a finish system is changed to use it', () => {
  it('never leaves an active finish system naming an archived product', async () => {
    const job = await acceptedJob(t, 'Review Archive Race');
    const actor = { kind: 'staff' as const, userId: job.userId, role: 'owner' as const };
    const glaze = await job.agent
      .post('/api/library/products')
      .set('x-csrf-token', job.csrf())
      .send({
        name: 'Glaze medium',
        kind: 'glaze',
        unit: 'gallon',
        containers: [{ label: 'Gallon', size: 1, unit: 'gallon', price: '30.00' }],
      });
    expect(glaze.status).toBe(201);
    const system = (await job.agent.get(`/api/library/systems/${job.simpleId}`)).body as FinishSystemView;
    const layers = system.layers.map((l) => ({ ...l, productId: glaze.body.id as string }));

    let releaseArchive!: () => void;
    const held = new Promise<void>((r) => (releaseArchive = r));
    let archivedInTx!: () => void;
    const archivedYet = new Promise<void>((r) => (archivedInTx = r));
    // Request 1: archive the product (checks no active system uses it), still uncommitted...
    const archiving = withTenant(t.ctx.pool, job.firmId, async (tx) => {
      await setProductArchived(tx, actor, glaze.body.id, true, new Date());
      archivedInTx();
      await held;
    });
    await archivedYet;
    // ...request 2: put the product in an active system. It waits for the archive (the product's lock),
    // then finds the product archived and refuses (400), so nothing names an archived product.
    const saving = withTenant(t.ctx.pool, job.firmId, (tx) => updateSystem(tx, actor as never, job.simpleId, { layers }, new Date())).then(
      () => 'saved',
      (error: unknown) => (error as { status?: number }).status,
    );
    await new Promise((resolve) => setTimeout(resolve, 100));
    releaseArchive();
    await archiving;
    expect(await saving).toBe(400);

    const { rows } = await withTenant(t.ctx.pool, job.firmId, (tx) =>
      tx.client.query<{ archived: boolean; used: boolean }>(
        `select (select archived_at is not null from products where tenant_id = $1 and id = $2) as archived,
                (select archived_at is null and layers::text like '%' || $2 || '%' from finish_systems where tenant_id = $1 and id = $3) as used`,
        [tx.tenantId, glaze.body.id, job.simpleId],
      ),
    );
    expect(rows[0]).toEqual({ archived: true, used: false });
  });
});
