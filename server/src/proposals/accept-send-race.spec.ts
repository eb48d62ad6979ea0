import type { ProposalVersionView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { sentProposal } from './portal-fixtures';
import { startTestServer, type TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('the client accepts v1 while the office sends v2 of the same estimate', () => {
  it('the first to reach the estimate wins (the acceptance, 200) and the send hears 409; no deadlock, no 500', async () => {
    const p = await sentProposal(t, 'Race Accept Plaster');
    const v2 = await p.agent
      .post('/api/proposals')
      .set('x-csrf-token', p.csrf())
      .send({ estimateId: p.estimateId, expiresOn: '2026-12-31' });
    expect(v2.status).toBe(201);
    const v2Id = (v2.body as ProposalVersionView).id;

    // Only to line the two requests up deterministically: a third transaction holds the estimate row
    // for a moment, as any other write to the estimate would.
    let release!: () => void;
    let held!: () => void;
    const gate = new Promise<void>((r) => (release = r));
    const holding = new Promise<void>((r) => (held = r));
    const holder = withTenant(t.ctx.pool, p.firmId, async (tx) => {
      await tx.client.query(`select 1 from estimates where tenant_id = $1 and id = $2 for update`, [tx.tenantId, p.estimateId]);
      held();
      await gate;
    });
    await holding;

    // The client's accept (locks v1 with the estimate: waits) ...
    const accept = p.client.agent
      .post(`/api/portal/proposals/${p.version.id}/accept`)
      .set('x-csrf-token', p.client.csrf())
      .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true })
      .then((r) => r);
    await pause(300);
    // ... and the office's send of v2 (takes the estimate first, then v2: waits behind the acceptance).
    const send = p.agent
      .post(`/api/proposals/${v2Id}/send`)
      .set('x-csrf-token', p.csrf())
      .send({})
      .then((r) => r);
    await pause(300);
    release();
    await holder;
    const [a, s] = await Promise.all([accept, send]);
    // Both writers take the estimate before a version (proposal-versions.ts lockVersion): locking v2 first deadlocked (40P01, a 500).
    expect([a.status, s.status]).toEqual([200, 409]);
  });
});
