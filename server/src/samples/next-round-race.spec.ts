import { withTenant } from '@layerbook/db';
import { startTestServer, type TestServer } from '../testing/harness';
import { firmWithFinish, makeBoard, post } from './sample-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe("a sample board's next round started twice at once (a double click)", () => {
  it('is made once: one 201 and one 409 each time, never a 500, and one round in the table', async () => {
    const f = await firmWithFinish(t, 'Double Round Finishes');
    for (let attempt = 0; attempt < 5; attempt++) {
      const board = await makeBoard(f, { clientId: f.clientId, siteId: f.siteId, label: `Board ${attempt}`, finishSystemId: f.systemId });
      // The client asked for changes (set directly: the portal's part is not what is under test).
      await withTenant(t.ctx.pool, f.firmId, (tx) =>
        tx.client.query(`update sample_boards set status = 'changes_requested' where tenant_id = $1 and id = $2`, [tx.tenantId, board.id]),
      );
      const answers = await Promise.all([post(f, `/api/samples/${board.id}/next-round`), post(f, `/api/samples/${board.id}/next-round`)]);
      expect(answers.map((a) => a.status).sort()).toEqual([201, 409]);
      const rounds = await withTenant(
        t.ctx.pool,
        f.firmId,
        async (tx) =>
          (await tx.client.query(`select 1 from sample_boards where tenant_id = $1 and previous_board_id = $2`, [tx.tenantId, board.id]))
            .rowCount,
      );
      expect(rounds).toBe(1);
    }
  });
});

describe('a sample board shown twice at once (a double click)', () => {
  it('is shown once: one 200 and one 409, and one audit entry', async () => {
    const f = await firmWithFinish(t, 'Double Show Finishes');
    const board = await makeBoard(f, { clientId: f.clientId, siteId: f.siteId, label: 'Stair niche', finishSystemId: f.systemId });
    const answers = await Promise.all([post(f, `/api/samples/${board.id}/show`), post(f, `/api/samples/${board.id}/show`)]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 409]);
    // the e-mail to the client is queued in the same transaction as the audit entry: one entry, one showing
    const audits = await withTenant(
      t.ctx.pool,
      f.firmId,
      async (tx) =>
        (
          await tx.client.query(`select 1 from audit_log where tenant_id = $1 and entity_id = $2 and action = 'samples.board_shown'`, [
            tx.tenantId,
            board.id,
          ])
        ).rowCount,
    );
    expect(audits).toBe(1);
  });
});
