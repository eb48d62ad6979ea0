import { COUNTRIES } from '@layerbook/contracts';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('firm country (ISO 3166-1 alpha-2)', () => {
  // About 500 requests one after another: seconds on a quiet machine, several times that on a busy one.
  it('round-trips every listed country and refuses "UN", which is no country', async () => {
    const o = await signUpFirm(t.app);
    const base = (await o.agent.get('/api/firm')).body as Record<string, unknown>;
    const { id: _id, slug: _slug, updatedAt: _updatedAt, logoUrl: _logo, ...settings } = base;
    for (const { code } of COUNTRIES) {
      const saved = await o.agent
        .patch('/api/firm')
        .set('x-csrf-token', o.csrf())
        .send({ ...settings, country: code });
      expect([code, saved.status]).toEqual([code, 200]);
      expect((await o.agent.get('/api/firm')).body.country).toBe(code);
    }
    const un = await o.agent
      .patch('/api/firm')
      .set('x-csrf-token', o.csrf())
      .send({ ...settings, country: 'UN' });
    expect(un.status).toBe(400);
    expect(un.body.errors.map((e: { field: string }) => e.field)).toEqual(['country']);
    expect((await o.agent.get('/api/firm')).body.country).toBe(COUNTRIES[COUNTRIES.length - 1].code);
  }, 180_000);
});
