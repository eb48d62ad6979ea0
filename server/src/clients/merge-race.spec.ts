import { withTenant } from '@layerbook/db';
import type { Response } from 'supertest';
import { sessionsWaiting } from '../testing/lock-waits';
import { addClient } from './client-fixtures';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;

/**
 * Runs `write` against the duplicate while a merge of it into the kept client is under way (what
 * mergeClient does, held open between its lock and its COMMIT), and answers what `write` got.
 */
async function duringMerge(o: Owner, write: (dup: string) => Promise<Response>): Promise<Response> {
  const kept = await addClient(o, { name: 'Wendeline Rook' });
  const dup = await addClient(o, { name: 'Wendeline Rook' });
  let release!: () => void;
  const gate = new Promise<void>((resolve) => (release = resolve));
  let locked!: () => void;
  const isLocked = new Promise<void>((resolve) => (locked = resolve));
  const merging = withTenant(t.ctx.pool, o.firmId, async (tx) => {
    await tx.client.query(`select id from clients where tenant_id = $1 and id = any($2::uuid[]) order by id for update`, [
      tx.tenantId,
      [dup, kept],
    ]);
    locked();
    await gate;
    await tx.client.query(`update sites set client_id = $3 where tenant_id = $1 and client_id = $2`, [tx.tenantId, dup, kept]);
    await tx.client.query(`delete from clients where tenant_id = $1 and id = $2`, [tx.tenantId, dup]);
  });
  await isLocked;
  const writing = write(dup);
  await sessionsWaiting(t.ctx.pool, 1, 'the request');
  release();
  await merging;
  return writing;
}

describe('writing to a client that a merge removes at that moment', () => {
  it('adding a site answers 404, not 500', async () => {
    const o = await signUpFirm(t.app, 'Merge Race Site Plaster');
    const added = await duringMerge(o, (dup) =>
      o.agent
        .post(`/api/clients/${dup}/sites`)
        .set('x-csrf-token', o.csrf())
        .send({ addressLine1: '7 Tanner Row' })
        .then((r) => r),
    );
    expect(added.status).toBe(404);
  });

  it('adding a contact answers 404, not 500', async () => {
    const o = await signUpFirm(t.app, 'Merge Race Contact Plaster');
    const added = await duringMerge(o, (dup) =>
      o.agent
        .post(`/api/clients/${dup}/contacts`)
        .set('x-csrf-token', o.csrf())
        .send({ name: 'Ivo Rook' })
        .then((r) => r),
    );
    expect(added.status).toBe(404);
  });

  it('filing an inquiry under it answers 400 naming clientId, not 500', async () => {
    const o = await signUpFirm(t.app, 'Merge Race Convert Plaster');
    const inq = await o.agent.post('/api/inquiries').set('x-csrf-token', o.csrf()).send({ contactName: 'Wendeline Rook', source: 'phone' });
    const filed = await duringMerge(o, (dup) =>
      o.agent
        .post(`/api/inquiries/${inq.body.id}/convert`)
        .set('x-csrf-token', o.csrf())
        .send({ clientId: dup })
        .then((r) => r),
    );
    expect([filed.status, filed.body.errors?.[0]?.field]).toEqual([400, 'clientId']);
  });
});
