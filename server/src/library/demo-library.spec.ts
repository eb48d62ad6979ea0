import { withTenant } from '@layerbook/db';
import { layerQuantity, type Product } from '@layerbook/domain';
import { seedDemoLibrary } from '../seed/demo-library';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('demo library', () => {
  it('seeds three systems that exercise long waits, partial coverage, dilution both ways and a mix recipe', async () => {
    const o = await signUpFirm(t.app, 'Demo Library Studio');
    const seeded = await withTenant(t.ctx.pool, o.firmId, (tx) => seedDemoLibrary(tx));
    const systems = (await o.agent.get('/api/library/systems')).body.items as { id: string; name: string; totalWaitHours: number }[];
    expect(systems).toHaveLength(3);
    const lime = (await o.agent.get(`/api/library/systems/${seeded.systemIds.layeredLime}`)).body;
    expect(lime.layers.map((l: { waitHoursAfter: number }) => l.waitHoursAfter)).toEqual([4, 16, 24, 72, 24]);
    const glaze = (await o.agent.get(`/api/library/systems/${seeded.systemIds.antiquedGlaze}`)).body;
    const glazeLayer = glaze.layers.find((l: { id: string }) => l.id === 'glaze');
    expect(glazeLayer).toMatchObject({
      coverageShare: 0.3,
      dilution: { share: 0.1, convention: 'ofConcentrate' },
      recipe: { by: 'volume' },
    });
    const wash = (await o.agent.get(`/api/library/systems/${seeded.systemIds.limewash}`)).body;
    expect(wash.layers.filter((l: { dilution?: { convention: string } }) => l.dilution?.convention === 'ofMix')).toHaveLength(2);

    // The stored layer feeds the engine as is. DOMAIN.md §2.3 [D]: 84.82 ft² of dome at 30 %, 400 ft²/gal of mix,
    // 15 % waste, water 10 % of the concentrate, 4 medium : 1 tint → tint 5.675 fl oz.
    const products = (await o.agent.get('/api/library/products')).body.items as Product[];
    const q = layerQuantity({ quantity: 84.82 / 0.3, measure: 'area', unit: 'ft' }, glazeLayer, new Map(products.map((p) => [p.id, p])));
    const tint = q.products.find((p) => p.productId === seeded.productIds.tint)!;
    expect(tint.amount / 29.5735295625).toBeCloseTo(5.675, 2);

    const ipa = products.find((p) => p.name === 'Isopropyl alcohol') as unknown as { isFlammable: boolean };
    expect(ipa.isFlammable).toBe(true);
    // the demo's drying-oil and silica flags, which raise the oily-rags and silica cautions
    const flags = (name: string) => (products.find((p) => p.name === name) as Product).hazards;
    expect(flags('Paste wax')).toEqual({ containsDryingOil: true });
    expect(flags('Sanded bonding primer')).toEqual({ containsSilica: true });
    // Every demo system passes the API's own checks again.
    for (const s of systems) {
      const detail = (await o.agent.get(`/api/library/systems/${s.id}`)).body;
      const res = await o.agent.patch(`/api/library/systems/${s.id}`).set('x-csrf-token', o.csrf()).send({ layers: detail.layers });
      expect({ name: s.name, status: res.status }).toEqual({ name: s.name, status: 200 });
    }
  });
});
