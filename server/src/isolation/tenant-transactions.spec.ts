import { commitThenRead, readAllInOneTrip, runInOneTrip, withTenant } from '@layerbook/db';
import { Pool } from 'pg';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';

// withTenant's transactions (packages/db/src/tenant): parameterised queries run as statements
// prepared once per connection; a batch of statements goes in one round trip inside the caller's
// transaction (readAllInOneTrip), with its COMMIT when asked, or commits and then reads
// (commitThenRead). One connection in the pool, so every transaction below runs on the same one.
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

  it('a batch sent with its COMMIT commits everything, refuses anything after it, and the connection goes on', async () => {
    const after = withTenant(pool, firmId, async (tx) => {
      await tx.client.query(note('early').text, note('early').values);
      const [rows] = await runInOneTrip(
        tx,
        [{ text: `${note('early').text} returning data->>'tag' as tag`, values: note('early').values }],
        {
          commit: true,
        },
      );
      expect(rows).toEqual([{ tag: 'early' }]);
      await tx.client.query('select 1');
    });
    await expect(after).rejects.toThrow(/committed in its last round trip/);
    // Both rows stayed: the COMMIT went with the statement, and no ROLLBACK followed the refused query.
    await expect(notesTagged('early')).resolves.toBe(2);
  });

  it('a batch that fails before its COMMIT rolls the whole transaction back', async () => {
    const failing = withTenant(pool, firmId, async (tx) => {
      await tx.client.query(note('rolled').text, note('rolled').values);
      await runInOneTrip(
        tx,
        [
          note('rolled'),
          { text: `insert into audit_log (tenant_id, actor_kind, action, entity) values ($1, 'system', null, 'spec')`, values: [firmId] },
        ],
        {
          commit: true,
        },
      );
    });
    await expect(failing).rejects.toThrow(/not-null constraint/);
    await expect(notesTagged('rolled')).resolves.toBe(0);
  });

  it('commitThenRead commits, then reads in a new read-only transaction of the firm, in one trip', async () => {
    const { last, after } = await withTenant(pool, firmId, (tx) =>
      commitThenRead(
        tx,
        [{ ...note('then'), text: `${note('then').text} returning 1 as one` }],
        [
          {
            name: 'spec_then_count',
            text: `select count(*)::int as n from audit_log where tenant_id = $1 and data->>'tag' = $2`,
            values: [firmId, 'then'],
          },
          { text: `select current_setting('transaction_read_only') as ro, current_setting('app.tenant_id') as firm`, values: [] },
        ],
      ),
    );
    expect(last).toEqual([[{ one: 1 }]]);
    expect(after).toEqual([[{ n: 1 }], [{ ro: 'on', firm: firmId }]]);
    await expect(notesTagged('then')).resolves.toBe(1);
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
