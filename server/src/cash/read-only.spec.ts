import type { TenantTx } from '@layerbook/db';
import type { Request } from 'express';
import { Pool } from 'pg';
import request from 'supertest';
import { createApp } from '../app';
import { loadConfig } from '../config';
import { openReadPool, type AppContext } from '../context';
import { newAgent, signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';
import { cashFirm } from './cash-fixtures';
import { withStaffReport } from './read-only';

let t: TestServer;
let owner: Awaited<ReturnType<typeof cashFirm>>;
let other: Awaited<ReturnType<typeof signUpFirm>>;
/** Stands in for the standby: a second pool on the same database whose connections name themselves. */
let readPool: Pool;
const READ_APP_NAME = 'layerbook-test-read';

beforeAll(async () => {
  t = await startTestServer();
  // Figures to compare: an invoice part paid, one payment received.
  owner = await cashFirm(t, 'Replica Lime Works');
  const invoiceId = await owner.invoice(1, '2026-11-02', '2026-11-16', '640.00', { status: 'part_paid', amountPaid: '240.00' });
  await owner.payment(invoiceId, 1, '2026-11-10', '240.00');
  other = await signUpFirm(t.app, 'Other Stucco Shop');
  readPool = new Pool({ connectionString: t.ctx.config.DATABASE_URL, max: 2, application_name: READ_APP_NAME });
}, 120_000);
afterAll(async () => {
  await readPool.end();
  await t.stop();
});

/** The signed-in claim a session would hold (no session id: nothing to check it against). */
const signedIn = (who: { firmId: string; userId: string }) =>
  ({ user: { kind: 'staff', tenantId: who.firmId, id: who.userId } }) as unknown as Request;

/** Which pool ran the transaction, whether it is read-only, as which role, with which firm set, and the firms it sees. */
async function whereAmI(tx: TenantTx) {
  const { rows } = await tx.client.query<{ app: string; ro: string; role: string; tenant: string; firms: string[] }>(
    `select current_setting('application_name') as app, current_setting('transaction_read_only') as ro, current_user as role,
            current_setting('app.tenant_id') as tenant, array(select id::text from firms) as firms`,
  );
  return rows[0];
}

/** Any write in the transaction: refused by PostgreSQL when it is read-only. */
const tryWrite = (tx: TenantTx) => tx.client.query(`update firms set name = name where id = $1`, [tx.tenantId]);

describe('DATABASE_READ_URL', () => {
  const base = { ...testDatabaseUrls(), SESSION_SECRET: 'read-replica-spec-secret-long-enough-1234' };

  it('is optional: unset or empty, there is no read pool', () => {
    expect(loadConfig(base).DATABASE_READ_URL).toBeUndefined();
    expect(openReadPool(loadConfig({ ...base, DATABASE_READ_URL: '' }), 'layerbook-web')).toBeUndefined();
  });

  it('set, opens a pool of its own', async () => {
    const pool = openReadPool(loadConfig({ ...base, DATABASE_READ_URL: base.DATABASE_URL }), 'layerbook-web');
    expect(pool).toBeInstanceOf(Pool);
    const { rows } = await pool!.query<{ app: string }>(`select current_setting('application_name') as app`);
    expect(rows[0].app).toBe('layerbook-web-read');
    await pool!.end();
  });
});

describe('withStaffReport', () => {
  it('without a read pool reads the primary, read-only, as the app role under row-level security', async () => {
    const seen = await withStaffReport(t.ctx, signedIn(owner), 'office', whereAmI);
    expect(seen).toEqual({
      app: expect.not.stringMatching(READ_APP_NAME) as unknown,
      ro: 'on',
      role: 'layerbook_app',
      tenant: owner.firmId,
      firms: [owner.firmId],
    });
    // PostgreSQL error 25006, read_only_sql_transaction (PostgreSQL "SET TRANSACTION")
    await expect(withStaffReport(t.ctx, signedIn(owner), 'office', tryWrite)).rejects.toMatchObject({ code: '25006' });
  });

  it('with a read pool reads there, read-only, as the app role under row-level security', async () => {
    const ctx: AppContext = { ...t.ctx, readPool };
    const seen = await withStaffReport(ctx, signedIn(other), 'office', whereAmI);
    expect(seen).toEqual({ app: READ_APP_NAME, ro: 'on', role: 'layerbook_app', tenant: other.firmId, firms: [other.firmId] });
    await expect(withStaffReport(ctx, signedIn(other), 'office', tryWrite)).rejects.toMatchObject({ code: '25006' });
  });

  it('checks who may read on the primary: no member, no read on the replica', async () => {
    const connect = jest.spyOn(readPool, 'connect');
    const stranger = { firmId: owner.firmId, userId: other.userId };
    await expect(withStaffReport({ ...t.ctx, readPool }, signedIn(stranger), 'office', whereAmI)).rejects.toMatchObject({ status: 401 });
    expect(connect).not.toHaveBeenCalled();
    connect.mockRestore();
  });
});

describe('the cash routes with a read pool', () => {
  const reads = [
    '/api/cash/receivables',
    '/api/cash/receivables/invoices',
    '/api/cash/received',
    '/api/cash/forecast',
    '/api/cash/jobs',
    '/api/cash/exports/receivables.csv',
    '/api/cash/exports/payments.csv?from=2026-01-01&to=2026-12-31',
  ];

  it('answer every figure and export from the read pool, the same as from the primary', async () => {
    const app = createApp({ ...t.ctx, readPool });
    const { agent, csrf } = await newAgent(app);
    const signIn = await agent.post('/api/auth/signin').set('x-csrf-token', csrf()).send({ email: owner.email, password: owner.password });
    expect(signIn.status).toBe(200);

    const connect = jest.spyOn(readPool, 'connect');
    const texts = new Map<string, string>();
    for (const url of reads) {
      const [replica, primary] = [await agent.get(url), await owner.agent.get(url)];
      expect({ url, status: replica.status }).toEqual({ url, status: 200 });
      expect(replica.text).toBe(primary.text);
      texts.set(url, replica.text);
    }
    expect(texts.get('/api/cash/exports/payments.csv?from=2026-01-01&to=2026-12-31')).toContain('240.00');
    expect(texts.get('/api/cash/receivables')).toContain('400.00');
    expect(connect).toHaveBeenCalledTimes(reads.length);

    // Not signed in: refused before the read pool is touched.
    expect((await request(app).get('/api/cash/received')).status).toBe(401);
    expect(connect).toHaveBeenCalledTimes(reads.length);
    connect.mockRestore();
  });
});
