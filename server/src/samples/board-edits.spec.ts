import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../testing/harness';
import { firmWithFinish, makeBoard, post, signInClient, type Firm } from './sample-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

const patch = (f: Firm, boardId: string, body: object) => f.agent.patch(`/api/samples/${boardId}`).set('x-csrf-token', f.csrf()).send(body);

const edits = (f: Firm, boardId: string) =>
  withTenant(
    t.ctx.pool,
    f.firmId,
    async (tx) =>
      (
        await tx.client.query(`select 1 from audit_log where tenant_id = $1 and entity_id = $2 and action = 'samples.board_updated'`, [
          tx.tenantId,
          boardId,
        ])
      ).rowCount,
  );

describe('editing a sample board after the client has seen it', () => {
  it('keeps the label the client saw (409 naming label, nothing written) but lets the office notes change', async () => {
    const f = await firmWithFinish(t, 'Label Kept Plaster');
    const client = await signInClient(t, f.firmId, f.clientId, f.clientEmail);
    const board = await makeBoard(f, { clientId: f.clientId, label: 'Hall board', finishSystemId: f.systemId });
    expect((await patch(f, board.id, { label: 'Hall board A' })).status).toBe(200);
    expect((await post(f, `/api/samples/${board.id}/show`)).status).toBe(200);

    for (const stage of ['shown', 'changes_requested'] as const) {
      if (stage === 'changes_requested')
        expect((await post(client, `/api/portal/boards/${board.id}/request-changes`, { comment: 'Warmer, please' })).status).toBe(200);
      const refused = await patch(f, board.id, { label: 'Hall board B', notes: 'Lot 2291' });
      expect({ stage, status: refused.status, errors: refused.body.errors }).toEqual({
        stage,
        status: 409,
        errors: [{ field: 'label', message: 'The label of a board the client has seen cannot change.' }],
      });
      expect(refused.body.detail).toBe(
        'The client has seen this board under its label, so it stays as shown. Start the next round to change it.',
      );
      // The same label sent back with the notes (a form sending every field) is no change.
      const notes = await patch(f, board.id, { label: 'Hall board A', notes: `Lot 2291 (${stage})` });
      expect({ stage, status: notes.status }).toEqual({ stage, status: 200 });
      expect(notes.body).toMatchObject({ label: 'Hall board A', notes: `Lot 2291 (${stage})` });
    }
    expect(await edits(f, board.id)).toBe(3);
    expect((await client.agent.get(`/api/portal/boards/${board.id}`)).body.label).toBe('Hall board A');

    // The next round is a draft again: its label can change.
    const next = (await post(f, `/api/samples/${board.id}/next-round`)).body as { id: string };
    expect((await patch(f, next.id, { label: 'Hall board A, warmer' })).body.label).toBe('Hall board A, warmer');
  });
});
