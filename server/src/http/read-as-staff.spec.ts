import { inlineQuery, readInOneTrip } from '@layerbook/db';
import { Pool } from 'pg';
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
