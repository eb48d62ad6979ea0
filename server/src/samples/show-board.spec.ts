import { withTenant } from '@layerbook/db';
import { linkIn } from '../testing/inbox';
import { newAgent, startTestServer, TestServer } from '../testing/harness';
import { addClient, firmWithFinish, makeBoard, post, signInClient, type Firm } from './sample-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

/** What showing left behind: the board's state, its audit entries, the client's portal logins and the queued e-mails. */
async function afterShow(f: Firm, boardId: string, clientId: string) {
  const db = await withTenant(t.ctx.pool, f.firmId, async (tx) => ({
    status: (await tx.client.query<{ status: string }>(`select status from sample_boards where id = $1`, [boardId])).rows[0]?.status,
    audits: (
      await tx.client.query<{ data: { mailedTo: number } }>(
        `select data from audit_log where entity_id = $1 and action = 'samples.board_shown'`,
        [boardId],
      )
    ).rows.map((r) => r.data.mailedTo),
    logins: (await tx.client.query<{ email: string }>(`select email from portal_users where client_id = $1 order by email`, [clientId]))
      .rows,
  }));
  const { rows: outbox } = await t.queue.boss
    .getDb()
    .executeSql(`select to_address from mail_outbox where purpose_key like $1`, [`sample-shown:${boardId}:%`]);
  return { ...db, outbox: outbox as { to_address: string }[] };
}

describe('showing a board to a client who has no portal login yet (before any proposal)', () => {
  it('makes their login and e-mails them the board, which they can then open in the portal', async () => {
    const f = await firmWithFinish(t, 'First Board Plaster');
    const board = await makeBoard(f, { clientId: f.clientId, label: 'Hall board', finishSystemId: f.systemId });
    const shown = await post(f, `/api/samples/${board.id}/show`);
    expect(shown.status).toBe(200);
    expect(await afterShow(f, board.id, f.clientId)).toEqual({
      status: 'shown',
      audits: [1],
      logins: [{ email: f.clientEmail }],
      outbox: [{ to_address: f.clientEmail }],
    });
    const mail = await t.inbox.waitFor(
      (m) => JSON.stringify(m.to).includes(f.clientEmail) && m.subject === 'First Board Plaster has a sample board for you to look at',
    );
    // The button signs the new client in once and opens the board.
    const url = new URL(linkIn(mail));
    expect(url.pathname).toBe('/portal/sign-in/link');
    expect(url.searchParams.get('next')).toBe(`/portal/boards/${board.id}`);
    const client = await newAgent(t.app, 'portal');
    const redeemed = await client.agent
      .post('/api/portal/auth/redeem')
      .set('x-csrf-token', client.csrf())
      .send({ token: url.searchParams.get('token') });
    expect(redeemed.status).toBe(200);
    expect((await client.agent.get(`/api/portal/boards/${board.id}`)).body).toMatchObject({ id: board.id, status: 'shown' });
    expect(mail.text).toContain('The button signs you in once, within 3 days.');
  });

  it('answers 400 naming client.email when the client has no e-mail address, and leaves the board a draft', async () => {
    const f = await firmWithFinish(t, 'No Address Plaster');
    const made = await post(f, '/api/clients', { kind: 'homeowner', name: 'Petra Quill' });
    const board = await makeBoard(f, { clientId: made.body.id, label: 'Porch board' });
    const refused = await post(f, `/api/samples/${board.id}/show`);
    expect(refused.status).toBe(400);
    expect(refused.body.errors).toEqual([
      { field: 'client.email', message: "Add the client's e-mail address before showing them the board." },
    ]);
    expect(refused.body.detail).toBe('The client has no e-mail address to tell them about the board.');
    expect(await afterShow(f, board.id, made.body.id)).toEqual({ status: 'draft', audits: [], logins: [], outbox: [] });
  });

  it('answers 409 naming client.email when that address already signs in for another client, and leaves the board a draft', async () => {
    const f = await firmWithFinish(t, 'Shared Address Plaster');
    await signInClient(t, f.firmId, f.clientId, f.clientEmail);
    // A designer's office, filed as a second client under the same address.
    const designer = await post(f, '/api/clients', { kind: 'designer', name: 'Quill Interiors', email: f.clientEmail });
    const board = await makeBoard(f, { clientId: designer.body.id, label: 'Study board' });
    const refused = await post(f, `/api/samples/${board.id}/show`);
    expect(refused.status).toBe(409);
    expect(refused.body.errors).toEqual([{ field: 'client.email', message: 'Give this client its own e-mail address.' }]);
    expect(await afterShow(f, board.id, designer.body.id)).toEqual({ status: 'draft', audits: [], logins: [], outbox: [] });
  });

  it('still mails every active login of a client who has several', async () => {
    const f = await firmWithFinish(t, 'Two Logins Plaster');
    const partner = (await addClient(f, 'Partner')).email;
    await signInClient(t, f.firmId, f.clientId, partner);
    const board = await makeBoard(f, { clientId: f.clientId, label: 'Kitchen board' });
    expect((await post(f, `/api/samples/${board.id}/show`)).status).toBe(200);
    const after = await afterShow(f, board.id, f.clientId);
    expect(after.outbox.map((o) => o.to_address).sort()).toEqual([f.clientEmail, partner].sort());
    expect(after.audits).toEqual([2]);
  });
});
