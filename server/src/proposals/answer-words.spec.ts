import { withTenant } from '@layerbook/db';
import { firmWithPricedEstimate } from './proposal-fixtures';
import { makeAndSend, signInByLink } from './portal-fixtures';
import { newAgent, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

async function spanishClientWithProposal(name: string) {
  const f = await firmWithPricedEstimate(t, name);
  await withTenant(t.ctx.pool, f.firmId, (tx) => tx.client.query(`update clients set language = 'es' where id = $1`, [f.clientId]));
  const v = await makeAndSend(t, f);
  const client = await newAgent(t.app, 'portal');
  await signInByLink(client, v.link);
  return { f, v, client };
}

describe('the answer to a Spanish-reading client’s decision', () => {
  it('carries the proposal in the client’s words, as GET does (accept)', async () => {
    const { v, client } = await spanishClientWithProposal('Palabras Plaster');
    const read = await client.agent.get(`/api/portal/proposals/${v.id}`);
    expect(read.status).toBe(200);
    expect(read.body.snapshot.depositRule).not.toBe(v.snapshot.depositRule); // translated on read
    const ok = await client.agent
      .post(`/api/portal/proposals/${v.id}/accept`)
      .set('x-csrf-token', client.csrf())
      .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });
    expect(ok.status).toBe(200);
    expect(ok.body.snapshot.depositRule).toBe(read.body.snapshot.depositRule);
  });

  it('carries the proposal in the client’s words, as GET does (request changes)', async () => {
    const { v, client } = await spanishClientWithProposal('Palabras Dos Plaster');
    const read = await client.agent.get(`/api/portal/proposals/${v.id}`);
    const ok = await client.agent
      .post(`/api/portal/proposals/${v.id}/request-changes`)
      .set('x-csrf-token', client.csrf())
      .send({ comment: 'Otro color, por favor' });
    expect(ok.status).toBe(200);
    expect(ok.body.snapshot.depositRule).toBe(read.body.snapshot.depositRule);
  });
});
