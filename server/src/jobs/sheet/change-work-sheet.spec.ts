import type { JobSheet } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { billingJob } from '../../billing/billing-fixtures';
import { approvedChangeOrder } from '../../billing/change-orders/change-order-fixtures';
import { joinAs } from '../../proposals/proposal-fixtures';
import { startTestServer, type TestServer } from '../../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

/** 1 US gallon = 231 in³ = 3.785411784 L (NIST Handbook 44, Appendix C; NIST SP 811 B.8). */
const ML_PER_GALLON = 3785.411784;

// An engine-priced change order's surfaces are the crew's work too: on the sheet in their room, with their
// sizes, layers and material need, the finish they get and its products, and a button to mark each layer.
describe('the job sheet after a change order adds work', () => {
  it('shows the added surfaces marked with their change order, and the crew marks them', async () => {
    const f = await billingJob(t, 'Sheet Change Work');
    const { vaultId, hallWalls } = await withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const site = await tx.client.query<{ site_id: string; room_id: string }>(
        `select r.site_id, r.id as room_id from surfaces s join rooms r on r.id = s.room_id where s.tenant_id = $1 and s.id = $2`,
        [tx.tenantId, f.surfaceId],
      );
      const room = await tx.client.query<{ id: string }>(
        `insert into rooms (tenant_id, site_id, name, position) values ($1, $2, 'Stair hall', 5) returning id`,
        [tx.tenantId, site.rows[0].site_id],
      );
      const vault = await tx.client.query<{ id: string }>(
        `insert into surfaces (tenant_id, room_id, name, shape, length_unit) values ($1, $2, 'Vault', $3, 'ft') returning id`,
        [tx.tenantId, room.rows[0].id, { kind: 'ceilingRect', length: 10, width: 6 }],
      );
      const walls = await tx.client.query<{ id: string }>(
        `insert into surfaces (tenant_id, room_id, name, shape, length_unit) values ($1, $2, 'Alcove walls', $3, 'ft') returning id`,
        [tx.tenantId, site.rows[0].room_id, { kind: 'walls', perimeter: 10, height: 8, openings: [] }],
      );
      return { vaultId: vault.rows[0].id, hallWalls: walls.rows[0].id };
    });
    const co = await approvedChangeOrder(f, {
      title: 'Stair hall ceiling and alcove',
      description: '',
      pricing: { kind: 'engine', surfaceIds: [vaultId, hallWalls], finishSystemId: f.simpleId },
    });
    const crew = await joinAs(t, f, 'crew');
    const res = await crew.agent.get(`/api/jobs/${f.jobId}/sheet`);
    expect(res.status).toBe(200);
    const sheet = res.body as JobSheet;

    // The alcove follows the sold surfaces of its room; the stair hall, which only the change order reaches, comes last.
    const sold = sheet.rooms[0];
    expect(sold.surfaces.map((s) => [s.name, s.changeOrder])).toEqual([
      [sold.surfaces[0].name, null],
      ['Alcove walls', co.number],
    ]);
    const stair = sheet.rooms.at(-1)!;
    expect(stair.name).toBe('Stair hall');
    const [vault] = stair.surfaces;
    // 10 × 6 ft ceiling = 60 ft² (rectangle area)
    expect([vault.name, vault.changeOrder, vault.measure, vault.quantity, vault.isCeiling]).toEqual(['Vault', co.number, 'area', 60, true]);
    expect(vault.finishId).toBe(f.simpleId);
    // every layer has its work item, and its material need: primer 60 ft² ÷ 350 ft²/gal × 1.10 waste, in mL (fixture rates)
    expect(vault.layers.every((l) => l.workItemId !== null)).toBe(true);
    expect(vault.layers[0].products[0].quantity).toBeCloseTo((60 / 350) * 1.1 * ML_PER_GALLON, 6);
    // the finish it gets, with its products (name, unit and hazards only)
    expect(sheet.finishes.map((x) => x.id)).toContain(f.simpleId);
    for (const p of vault.layers.flatMap((l) => l.products)) {
      expect(Object.keys(sheet.products.find((x) => x.id === p.productId)!).sort()).toEqual(['hazards', 'id', 'name', 'unit']);
    }
    // the crew marks the added layer done from the sheet
    const marked = await crew.agent
      .post(`/api/jobs/${f.jobId}/progress`)
      .set('x-csrf-token', crew.csrf())
      .send({ kind: 'layerDone', workItemId: vault.layers[0].workItemId, on: '2026-12-01' });
    expect(marked.status).toBe(201);
    const after = (await crew.agent.get(`/api/jobs/${f.jobId}/sheet`)).body as JobSheet;
    expect(after.rooms.at(-1)!.surfaces[0].layers[0].doneOn).toBe('2026-12-01');
  }, 120_000);
});
