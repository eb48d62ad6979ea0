import { inlineQuery, readInOneTrip, readInTwoTrips, withTenantAndFirst } from '@layerbook/db';
import { Pool } from 'pg';
import { staffRowQuery } from '../auth/staff-principal';
import { buildInvoiceListQuery } from '../billing/invoice-read';
import { joinAs } from '../proposals/proposal-fixtures';
import { newAgent, signUpFirm, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('inlineQuery: parameters written in as literals for the one-trip read', () => {
  it('quotes strings (quotes, backslashes, a "$2" inside a value), dates, null, numbers and booleans', () => {
    const text = inlineQuery({
      text: 'select $1::text, $2::timestamptz, $3, $4, $5, $6, $10',
      values: [`O'Brien \\ $2`, new Date('2026-12-01T15:00:00.000Z'), null, -3, true, undefined, 0, 0, 0, 51],
    });
    expect(text).toBe(`select  E'O''Brien \\\\ $2'::text, '2026-12-01T15:00:00.000Z'::timestamptz, null, (-3), true, null, (51)`);
  });

  it('refuses what it cannot write as a literal', () => {
    expect(() => inlineQuery({ text: 'select $1', values: [{ a: 1 }] })).toThrow('$1');
    expect(() => inlineQuery({ text: 'select $1', values: [Number.NaN] })).toThrow('$1');
  });

  it('reads back exactly the strings it was given', async () => {
    const tricky = [`O'Brien`, 'back\\slash', `'); drop table firms; --`, 'ünïcode ✓', '$1 $$ $q$'];
    const firm = await signUpFirm(t.app, 'Inline Literal Plaster');
    const { rows } = await readInOneTrip(t.ctx.pool, firm.firmId, 'select 1', {
      text: `select unnest(array[$1, $2, $3, $4, $5]::text[]) as v`,
      values: tricky,
    });
    expect(rows.map((r) => r['v'])).toEqual(tricky);
  });
});

describe('readInOneTrip', () => {
  it('rolls a failed read back, so the connection goes back to the pool clean', async () => {
    const firm = await signUpFirm(t.app, 'Failed Read Plaster');
    const pool = new Pool({ connectionString: t.ctx.config.DATABASE_URL, max: 1 });
    try {
      await expect(readInOneTrip(pool, firm.firmId, 'select 1', { text: `select 'x'::int`, values: [] })).rejects.toThrow();
      const again = await readInOneTrip(pool, firm.firmId, 'select 1 as one', {
        text: `select current_setting('app.tenant_id') as firm`,
        values: [],
      });
      expect(again.first).toEqual([{ one: 1 }]);
      expect(again.rows).toEqual([{ firm: firm.firmId }]);
      // The firm was set for that transaction only.
      expect((await pool.query(`select coalesce(current_setting('app.tenant_id', true), '') as firm`)).rows[0].firm).toBe('');
    } finally {
      await pool.end();
    }
  });

  it('is read only', async () => {
    const firm = await signUpFirm(t.app, 'Read Only Plaster');
    await expect(
      readInOneTrip(t.ctx.pool, firm.firmId, 'select 1', {
        text: `update firms set name = 'Changed' where id = $1`,
        values: [firm.firmId],
      }),
    ).rejects.toThrow(/read-only/);
  });
});

describe('readInTwoTrips: the re-check, then the reads (named ones prepared once per connection)', () => {
  const prepared = (pool: Pool) =>
    pool.query<{ name: string }>(`select name from pg_prepared_statements order by name`).then((r) => r.rows.map((x) => x.name));

  it('prepares a named read once per connection, answers each read in order and leaves no transaction open', async () => {
    const firm = await signUpFirm(t.app, 'Two Trip Plaster');
    const pool = new Pool({ connectionString: t.ctx.config.DATABASE_URL, max: 1 });
    try {
      for (const n of [2, 3]) {
        const { checked, results } = await readInTwoTrips(
          pool,
          firm.firmId,
          `select 'me' as who`,
          (first) => first[0]['who'],
          (who) => [
            { name: 'test_doubled', text: `select $1::int * 2 as v, $2::text as who`, values: [n, who] },
            { text: `select current_setting('app.tenant_id') as firm`, values: [] },
          ],
        );
        expect(checked).toBe('me');
        expect(results).toEqual([[{ v: 2 * n, who: 'me' }], [{ firm: firm.firmId }]]);
      }
      expect(await prepared(pool)).toEqual(['test_doubled']);
      expect((await pool.query(`select coalesce(current_setting('app.tenant_id', true), '') as firm`)).rows[0].firm).toBe('');
    } finally {
      await pool.end();
    }
  });

  it('rolls back what the check or a read refuses, and a read that failed is prepared afresh next time', async () => {
    const firm = await signUpFirm(t.app, 'Refused Trip Plaster');
    const pool = new Pool({ connectionString: t.ctx.config.DATABASE_URL, max: 1 });
    const read = (divisor: number) =>
      readInTwoTrips(
        pool,
        firm.firmId,
        'select 1',
        () => null,
        () => [{ name: 'test_divided', text: `select 10 / $1::int as v`, values: [divisor] }],
      );
    try {
      await expect(
        readInTwoTrips(
          pool,
          firm.firmId,
          'select 1',
          () => {
            throw new Error('not you');
          },
          () => [],
        ),
      ).rejects.toThrow('not you');
      await expect(read(0)).rejects.toThrow(/division by zero/);
      expect(await prepared(pool)).toEqual([]);
      expect((await read(5)).results).toEqual([[{ v: 2 }]]);
      expect(await prepared(pool)).toEqual(['test_divided']);
      expect((await pool.query(`select coalesce(current_setting('app.tenant_id', true), '') as firm`)).rows[0].firm).toBe('');
    } finally {
      await pool.end();
    }
  });
});

describe('the signed-in person and a list, prepared once per connection', () => {
  it('runs the re-check and the invoice list as prepared statements, the same rows each time', async () => {
    const firm = await signUpFirm(t.app, 'Prepared Trip Plaster');
    const pool = new Pool({ connectionString: t.ctx.config.DATABASE_URL, max: 1 });
    try {
      const list = buildInvoiceListQuery(firm.firmId, { filter: 'all', limit: 50 }, new Date('2026-12-01T15:00:00Z'));
      expect(list.name).toMatch(/^invoice_list_[0-9a-f]{16}$/);
      for (let i = 0; i < 2; i++) {
        const { first, rows } = await readInOneTrip(pool, firm.firmId, staffRowQuery(firm.firmId, firm.userId), list);
        expect(first).toEqual([expect.objectContaining({ role: 'owner', status: 'active', email: firm.email, session_live: true })]);
        expect(rows).toEqual([]);
        const again = await withTenantAndFirst(pool, firm.firmId, staffRowQuery(firm.firmId, firm.userId), (_tx, r) => Promise.resolve(r));
        expect(again).toEqual(first);
      }
      const names = (await pool.query<{ name: string }>(`select name from pg_prepared_statements order by name`)).rows.map((r) => r.name);
      expect(names).toEqual([list.name, 'lb_staff_row']);
      // The same list asked again is the same statement: its text does not change with the values.
      const later = buildInvoiceListQuery(firm.firmId, { filter: 'all', limit: 50 }, new Date('2026-12-02T15:00:00Z'));
      expect(later.name).toBe(list.name);
    } finally {
      await pool.end();
    }
  });
});

describe('the invoice list in one round trip', () => {
  it('answers who first (401, 403), then what was wrong with the input (400 naming the field)', async () => {
    const owner = await signUpFirm(t.app, 'One Trip Plaster');
    const crew = await joinAs(t, owner, 'crew');
    const anonymous = await newAgent(t.app);
    expect((await anonymous.agent.get('/api/invoices?filter=late')).status).toBe(401);
    expect((await crew.agent.get('/api/invoices?filter=late')).status).toBe(403);
    expect((await crew.agent.get('/api/invoices')).status).toBe(403);
    const bad = await owner.agent.get('/api/invoices?filter=late');
    expect(bad.status).toBe(400);
    expect(bad.body.errors[0].field).toBe('filter');
    const search = await owner.agent.get(`/api/invoices?q=${encodeURIComponent(`O'Brien \\ %_`)}`);
    expect(search.status).toBe(200);
    expect(search.body).toEqual({ items: [], nextCursor: null });
  });
  // A session ended elsewhere while this process holds a copy: http/session-cache.spec.ts (on this list).
});
