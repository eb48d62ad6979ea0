import { commitWith, readAllInOneTrip, withTenant } from '@layerbook/db';
import { Pool } from 'pg';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';

// withTenant's transactions (packages/db/src/tenant): parameterised queries run as statements
// prepared once per connection, commitWith() ends a transaction with its last statement in one
// round trip, and readAllInOneTrip() reads inside the caller's transaction. One connection in
// the pool, so every transaction below runs on the same one.
let t: TestServer;
let pool: Pool;
let firmId: string;
beforeAll(async () => {
  t = await startTestServer();
  pool = new Pool({ connectionString: testDatabaseUrls().DATABASE_URL, max: 1 });
  firmId = (await signUpFirm(t.app)).firmId;
});
afterAll(async () => {
  await pool.end();
  await t.stop();
});

const note = (tag: string) => ({
  text: `insert into audit_log (tenant_id, actor_kind, action, entity, data) values ($1, 'system', 'spec.note', 'spec', jsonb_build_object('tag', $2::text))`,
  values: [firmId, tag],
});
const notesTagged = async (tag: string) =>
  withTenant(pool, firmId, async (tx) => {
    const { rows } = await tx.client.query(`select count(*)::int as n from audit_log where tenant_id = $1 and data->>'tag' = $2`, [
      firmId,
      tag,
    ]);
    return (rows[0] as { n: number }).n;
  });

describe('transactions of a firm', () => {
  it('prepare a parameterised query once per connection and run it by name after', async () => {
    const probe = `select count(*)::int as n from audit_log where tenant_id = $1 and action = $2`;
    await withTenant(pool, firmId, (tx) => tx.client.query(probe, [firmId, 'spec.none']));
    const prepared = await withTenant(pool, firmId, async (tx) => {
      await tx.client.query(probe, [firmId, 'spec.none']);
      return (await tx.client.query(`select name, statement from pg_prepared_statements`)).rows as Array<{
        name: string;
        statement: string;
      }>;
    });
    const mine = prepared.filter((p) => p.statement === probe);
    expect(mine).toHaveLength(1);
    expect(mine[0].name).toMatch(/^lb_q_[0-9a-f]{24}$/);
  });

  it('a query that fails to parse leaves no broken name behind', async () => {
    const broken = `select count(*) frm audit_log where tenant_id = $1`;
    await expect(withTenant(pool, firmId, (tx) => tx.client.query(broken, [firmId]))).rejects.toThrow(/syntax error/);
    await expect(withTenant(pool, firmId, (tx) => tx.client.query(broken, [firmId]))).rejects.toThrow(/syntax error/);
    await expect(notesTagged('nothing')).resolves.toBe(0);
  });

  it('commitWith commits everything with its statement, refuses anything after it, and the connection goes on', async () => {
    const after = withTenant(pool, firmId, async (tx) => {
      await tx.client.query(note('early').text, note('early').values);
      const rows = await commitWith(tx.client, {
        text: `${note('early').text} returning data->>'tag' as tag`,
        values: note('early').values,
      });
      expect(rows).toEqual([{ tag: 'early' }]);
      await tx.client.query('select 1');
    });
    await expect(after).rejects.toThrow(/committed by commitWith/);
    // Both rows stayed: the COMMIT went with the statement, and no ROLLBACK followed the refused query.
    await expect(notesTagged('early')).resolves.toBe(2);
  });

  it('a commitWith that fails rolls the whole transaction back', async () => {
    const failing = withTenant(pool, firmId, async (tx) => {
      await tx.client.query(note('rolled').text, note('rolled').values);
      await commitWith(tx.client, {
        text: `insert into audit_log (tenant_id, actor_kind, action, entity) values ($1, 'system', null, 'spec')`,
        values: [firmId],
      });
    });
    await expect(failing).rejects.toThrow(/not-null constraint/);
    await expect(notesTagged('rolled')).resolves.toBe(0);
  });

  it('readAllInOneTrip reads inside the caller transaction, its own writes included', async () => {
    const [counted, same] = await withTenant(pool, firmId, async (tx) => {
      await tx.client.query(note('inside').text, note('inside').values);
      return readAllInOneTrip(tx, [
        {
          name: 'spec_notes_tagged',
          text: `select count(*)::int as n from audit_log where tenant_id = $1 and data->>'tag' = $2`,
          values: [firmId, 'inside'],
        },
        { text: `select $1::text as firm`, values: [firmId] },
      ]);
    });
    expect(counted).toEqual([{ n: 1 }]);
    expect(same).toEqual([{ firm: firmId }]);
  });
});
