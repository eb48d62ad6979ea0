import type { FinishSystemView, ProductView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { sessionsWaiting } from '../testing/lock-waits';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { addProduct, PRIMER, primerLayer } from './library-fixtures';
import { updateProduct } from './products';
import { createSystem } from './systems';

/* A product's row lock orders a unit change and a finish system save that uses it: the second sees the first. */

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('switching a product between volume and weight while a finish system is saved with it', () => {
  it('waits for the save, then refuses (409), so no active system measures a kg product by the gallon', async () => {
    const o = await signUpFirm(t.app, 'Unit Race Plaster');
    const primer = await addProduct(o, PRIMER); // by the gallon, in no system yet
    const actor = { kind: 'staff' as const, userId: o.userId, role: 'owner' as const };

    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    let savedInTx!: () => void;
    const savedYet = new Promise<void>((resolve) => (savedInTx = resolve));
    // Request 1: a new system using the primer by volume, saved but not yet committed.
    const saving = withTenant(t.ctx.pool, o.firmId, async (tx) => {
      await createSystem(tx, actor, { name: 'Primed', description: '', layers: [primerLayer(primer)] });
      savedInTx();
      await held;
    });
    await savedYet;
    // Request 2: count the primer in kg. It waits for the save (the product's lock), then finds the system.
    const switching = withTenant(t.ctx.pool, o.firmId, (tx) =>
      updateProduct(tx, actor, primer, { unit: 'kg', containers: [{ label: '20 kg', size: 20, unit: 'kg', price: '95.00' }] }, new Date()),
    ).then(
      () => 'switched',
      (error: unknown) => (error as { status?: number }).status,
    );
    await sessionsWaiting(t.ctx.pool, 1, 'the unit change');
    release();
    await saving;
    expect(await switching).toBe(409);

    const product = (await o.agent.get(`/api/library/products/${primer}`)).body as ProductView;
    const systems = (await o.agent.get('/api/library/systems')).body.items as FinishSystemView[];
    expect([product.unit, systems.map((s) => s.name)]).toEqual(['gallon', ['Primed']]);
    // the system still computes (duplicating runs the engine over its layers again)
    const copy = await o.agent.post(`/api/library/systems/${systems[0].id}/duplicate`).set('x-csrf-token', o.csrf());
    expect(copy.status).toBe(201);
  });
});
