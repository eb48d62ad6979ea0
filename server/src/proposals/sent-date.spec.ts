import { firmWithPricedEstimate } from './proposal-fixtures';
import { signInByLink } from './portal-fixtures';
import { linkIn } from '../testing/inbox';
import { newAgent, startTestServer, TestServer } from '../testing/harness';
import type { ProposalVersionView } from '@layerbook/contracts';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('a proposal drafted one day and sent another', () => {
  it('is dated the day it was sent, and the client can still sign it (the fingerprint follows the date)', async () => {
    // 10:00 in New York (the firms' default zone) on 1 December: the draft is made.
    t.setNow(new Date('2026-12-01T15:00:00Z'));
    const f = await firmWithPricedEstimate(t, 'Dated Plaster Co');
    const made = await f.agent
      .post('/api/proposals')
      .set('x-csrf-token', f.csrf())
      .send({ estimateId: f.estimateId, expiresOn: '2026-12-31' });
    expect(made.status).toBe(201);
    const draft = made.body as ProposalVersionView;
    expect(draft.snapshot.issuedOn).toBe('2026-12-01');

    // Sent three days later.
    t.setNow(new Date('2026-12-04T15:00:00Z'));
    const sent = await f.agent.post(`/api/proposals/${draft.id}/send`).set('x-csrf-token', f.csrf()).send({});
    expect(sent.status).toBe(200);
    expect(sent.body.snapshot.issuedOn).toBe('2026-12-04');
    expect(sent.body.snapshotHash).not.toBe(draft.snapshotHash);

    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(f.clientEmail) && (m.text ?? '').includes(draft.id));
    const client = await newAgent(t.app, 'portal');
    await signInByLink(client, linkIn(mail));
    const read = await client.agent.get(`/api/portal/proposals/${draft.id}`);
    expect(read.body.snapshot.issuedOn).toBe('2026-12-04');
    const accepted = await client.agent
      .post(`/api/portal/proposals/${draft.id}/accept`)
      .set('x-csrf-token', client.csrf())
      .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });
    expect(accepted.status).toBe(200);
  });
});
