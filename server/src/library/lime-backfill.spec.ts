import { readFileSync } from 'node:fs';
import path from 'node:path';
import { withTenant } from '@layerbook/db';
import { Pool } from 'pg';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

/** The statements of migration 0053 (the lime flag for lime products saved before the server set it). */
const BACKFILL = readFileSync(path.resolve(__dirname, '../../../migrations/0053_lime_products_flagged.sql'), 'utf8')
  .split('--> statement-breakpoint')
  .map((s) => s.trim())
  .filter(Boolean);

describe('lime products stored without the lime flag (migration 0053)', () => {
  it('get it, so their caution shows; other kinds stay as they were', async () => {
    const firm = await signUpFirm(t.app, 'Backfill Lime Co');
    const ids = await withTenant(t.ctx.pool, firm.firmId, async (tx) => {
      const add = async (name: string, kind: string, hazards: object) =>
        (
          await tx.client.query<{ id: string }>(
            `insert into products (tenant_id, name, kind, unit, containers, hazards) values ($1, $2, $3, 'gallon', '[]', $4) returning id`,
            [tx.tenantId, name, kind, JSON.stringify(hazards)],
          )
        ).rows[0].id;
      return { lime: await add('Old lime putty', 'lime', {}), primer: await add('Old primer', 'primer', { containsSilica: true }) };
    });
    const owner = new Pool({ connectionString: testDatabaseUrls().DATABASE_OWNER_URL, max: 1 });
    const client = await owner.connect();
    try {
      await client.query('begin');
      for (const statement of BACKFILL) await client.query(statement);
      await client.query('commit');
    } finally {
      client.release();
      await owner.end();
    }
    const hazards = await withTenant(t.ctx.pool, firm.firmId, async (tx) =>
      Object.fromEntries(
        (
          await tx.client.query<{ id: string; hazards: object }>(`select id, hazards from products where id = any($1)`, [
            Object.values(ids),
          ])
        ).rows.map((r) => [r.id, r.hazards]),
      ),
    );
    expect(hazards[ids.lime]).toEqual({ isLime: true });
    expect(hazards[ids.primer]).toEqual({ containsSilica: true });
  });
});
