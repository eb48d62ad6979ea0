import { withTenant } from '@layerbook/db';
import { pdfText } from './pdf/pdf-text';
import { firmWithPricedEstimate } from './proposal-fixtures';
import { makeAndSend, signInByLink } from './portal-fixtures';
import { binary } from '../testing/binary';
import { newAgent, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('the signed copy of a Spanish-reading client', () => {
  it('writes the signing time in Spanish like the rest of the document', async () => {
    const f = await firmWithPricedEstimate(t, 'Estuco Fino Studio');
    await withTenant(t.ctx.pool, f.firmId, (tx) => tx.client.query(`update clients set language = 'es' where id = $1`, [f.clientId]));
    const v = await makeAndSend(t, f);
    const client = await newAgent(t.app, 'portal');
    await signInByLink(client, v.link);
    const ok = await client.agent
      .post(`/api/portal/proposals/${v.id}/accept`)
      .set('x-csrf-token', client.csrf())
      .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });
    expect(ok.status).toBe(200);
    const res = await binary(client.agent, `/api/portal/proposals/${v.id}/signed-pdf`);
    expect(res.status).toBe(200);
    const text = pdfText(res.body as Buffer).replace(/\s+/g, ' ');
    // the rest of the PDF is Spanish (dates "31 de diciembre de 2026")
    expect(text).toContain('de diciembre de 2026');
    expect(text).not.toContain('December 1, 2026');
  });
});
