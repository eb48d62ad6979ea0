import { withTenant } from '@layerbook/db';
import { binary, pdfTextOf } from '../testing/binary';
import { startTestServer, type TestServer } from '../testing/harness';
import { firmWithPricedEstimate } from './proposal-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

// The office prints what the client reads: the proposal PDF in the client's language, as the invoices are.
describe('the proposal PDF the office downloads', () => {
  it('is in the client’s language', async () => {
    const f = await firmWithPricedEstimate(t, 'Yeso Claro Studio');
    await withTenant(t.ctx.pool, f.firmId, (tx) => tx.client.query(`update clients set language = 'es' where id = $1`, [f.clientId]));
    const made = await f.agent
      .post('/api/proposals')
      .set('x-csrf-token', f.csrf())
      .send({ estimateId: f.estimateId, expiresOn: '2026-12-31' });
    expect(made.status).toBe(201);
    const res = await binary(f.agent, `/api/proposals/${made.body.id}/pdf`);
    expect(res.status).toBe(200);
    const text = pdfTextOf(res.body);
    expect(text).toContain('Fecha: 1 de diciembre de 2026');
    expect(text).toContain('31 de diciembre de 2026');
  });
});
