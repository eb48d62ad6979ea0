import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import type { EstimateView, InvoiceDetail, JobBillingView, ProposalVersionView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import request from 'supertest';
import { sentProposal } from '../proposals/portal-fixtures';
import { startTestServer, TestServer } from '../testing/harness';

// Invoice numbers come from the firm's counter inside the issuing transaction, so however many web
// processes share the database there is never a gap nor a duplicate. As in queue/scale-out.spec.ts,
// two full instances (app, pool, workers, mail catcher) share the test database; here the second one
// runs in a Node process of its own (tsx loads the same harness), so two processes issue at once.
const ISSUES = 200;
/** A schedule of this many lines per job, each line one draft invoice. */
const LINES_PER_JOB = 40;

let a: TestServer;
let b: ChildProcess;
let bUrl: string;

/** The harness's test server in a child process; answers its address once it listens. */
function startSecondProcess(): Promise<{ child: ChildProcess; url: string }> {
  const harness = path.resolve(__dirname, '../testing/harness.ts');
  const source = `
    require(${JSON.stringify(require.resolve('tsx/cjs'))});
    const { startTestServer } = require(${JSON.stringify(harness)});
    startTestServer().then((t) => {
      const server = t.app.listen(0, '127.0.0.1', () => process.send({ port: server.address().port }));
      process.once('message', async () => { server.close(); await t.stop(); process.exit(0); });
    }, (error) => { console.error(error); process.exit(1); });`;
  const child = spawn(process.execPath, ['-e', source], { env: process.env, stdio: ['ignore', 'inherit', 'inherit', 'ipc'] });
  return new Promise((resolve, reject) => {
    child.once('message', (m: { port: number }) => resolve({ child, url: `http://127.0.0.1:${m.port}` }));
    child.once('exit', (code) => reject(new Error(`the second process ended (${code}) before it listened`)));
  });
}

beforeAll(async () => {
  a = await startTestServer();
});
afterAll(async () => {
  await a.stop();
  if (b?.exitCode === null)
    await new Promise((resolve) => {
      b.once('exit', resolve);
      b.send('stop');
    });
}, 30_000);

type Firm = Awaited<ReturnType<typeof sentProposal>>;

/** Another signed job of the same firm and client: the fixture's estimate copied, proposed, sent and accepted. */
async function acceptedJob(p: Firm, n: number): Promise<string> {
  const source = (await p.agent.get(`/api/estimates/${p.estimateId}`)).body as EstimateView;
  const title = `Dining room plaster, part ${n}`;
  const made = await p.agent
    .post('/api/estimates')
    .set('x-csrf-token', p.csrf())
    .send({ siteId: source.siteId, inquiryId: null, title, startDate: source.inputs.startDate });
  const estimateId = (made.body as EstimateView).id;
  await p.agent
    .put(`/api/estimates/${estimateId}/inputs`)
    .set('x-csrf-token', p.csrf())
    .send({ ...source.inputs, title });
  const version = (await p.agent.post('/api/proposals').set('x-csrf-token', p.csrf()).send({ estimateId, expiresOn: '2026-12-31' }))
    .body as ProposalVersionView;
  const sent = await p.agent.post(`/api/proposals/${version.id}/send`).set('x-csrf-token', p.csrf()).send({});
  if (sent.status !== 200) throw new Error(`proposal not sent: ${sent.status} ${JSON.stringify(sent.body)}`);
  const accepted = await p.client.agent
    .post(`/api/portal/proposals/${version.id}/accept`)
    .set('x-csrf-token', p.client.csrf())
    .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });
  if (accepted.status !== 200) throw new Error(`proposal not accepted: ${accepted.status} ${JSON.stringify(accepted.body)}`);
  return withTenant(a.ctx.pool, p.firmId, async (tx) => {
    const { rows } = await tx.client.query<{ id: string }>(`select id from jobs where tenant_id = $1 and proposal_version_id = $2`, [
      tx.tenantId,
      version.id,
    ]);
    return rows[0].id;
  });
}

/** Replaces the job's schedule with LINES_PER_JOB lines dated far ahead (none drafts itself), starts billing, drafts every line. */
async function draftsOf(p: Firm, jobId: string): Promise<string[]> {
  const billing = (await p.agent.get(`/api/jobs/${jobId}/billing`)).body as JobBillingView;
  const sum = new Decimal(billing.contractSum);
  const share = sum.div(LINES_PER_JOB).toDecimalPlaces(2, Decimal.ROUND_DOWN);
  const lines = Array.from({ length: LINES_PER_JOB }, (_, i) =>
    i === LINES_PER_JOB - 1
      ? { label: 'Final payment', role: 'final', trigger: { kind: 'walkthrough' }, amount: sum.minus(share.times(i)).toFixed(2) }
      : { label: `Stage payment ${i + 1}`, role: 'milestone', trigger: { kind: 'date', date: '2027-06-01' }, amount: share.toFixed(2) },
  );
  const put = await p.agent.put(`/api/jobs/${jobId}/billing/schedule`).set('x-csrf-token', p.csrf()).send({ method: 'schedule', lines });
  if (put.status !== 200) throw new Error(`schedule not saved: ${put.status} ${JSON.stringify(put.body)}`);
  const started = await p.agent.post(`/api/jobs/${jobId}/billing/start`).set('x-csrf-token', p.csrf()).send({});
  if (started.status !== 200) throw new Error(`billing not started: ${started.status} ${JSON.stringify(started.body)}`);
  const drafts: string[] = [];
  for (const line of (started.body as JobBillingView).lines) {
    const made = await p.agent
      .post(`/api/jobs/${jobId}/invoices`)
      .set('x-csrf-token', p.csrf())
      .send({ kind: 'line', scheduleLineId: line.id });
    if (made.status !== 201) throw new Error(`draft not made: ${made.status} ${JSON.stringify(made.body)}`);
    drafts.push((made.body as InvoiceDetail).id);
  }
  return drafts;
}

it(`${ISSUES} concurrent issues split over two processes on one database take the numbers 1–${ISSUES}: no gap, no duplicate`, async () => {
  const p = await sentProposal(a, 'Counter Plaster');
  const drafts: string[] = [];
  for (let n = 1; drafts.length < ISSUES; n++) drafts.push(...(await draftsOf(p, await acceptedJob(p, n))));
  expect(drafts).toHaveLength(ISSUES);
  // The second process starts once the set-up's e-mails are through (its workers would take some).
  ({ child: b, url: bUrl } = await startSecondProcess());

  // The session lives in PostgreSQL: the same cookie and CSRF token work on the other process.
  const cookie = (await p.agent.get('/api/auth/session')).request.cookies;
  const onB = await request(bUrl).get('/api/auth/session').set('cookie', cookie);
  expect(onB.body.user?.firmName).toBe('Counter Plaster');

  const began = process.hrtime.bigint();
  const answers = await Promise.all(
    drafts.map((id, i) =>
      request(i % 2 ? bUrl : a.app)
        .post(`/api/invoices/${id}/issue`)
        .set('cookie', cookie)
        .set('x-csrf-token', p.csrf())
        .send({ send: false }),
    ),
  );
  const ms = Number(process.hrtime.bigint() - began) / 1e6;
  expect(answers.filter((r) => r.status !== 200).map((r) => `${r.status} ${JSON.stringify(r.body)}`)).toEqual([]);

  const numbers = await withTenant(a.ctx.pool, p.firmId, async (tx) => {
    const { rows } = await tx.client.query<{ number: number }>(`select number from invoices where tenant_id = $1 and status <> 'draft'`, [
      tx.tenantId,
    ]);
    return rows.map((r) => r.number);
  });
  const sorted = [...numbers].sort((x, y) => x - y);
  const duplicates = sorted.filter((n, i) => i > 0 && n === sorted[i - 1]).length;
  const gaps = sorted.reduce((g, n, i) => g + (i > 0 ? Math.max(0, n - sorted[i - 1] - 1) : n - 1), 0);
  expect(sorted).toEqual(Array.from({ length: ISSUES }, (_, i) => i + 1));
  // Each answer carries its own number; together they are the same 200.
  const answered = answers.map((r) => (r.body as InvoiceDetail).number).sort();
  expect(new Set(answered).size).toBe(ISSUES);
  console.log(
    `${ISSUES} issues over 2 processes: numbers ${sorted[0]}–${sorted.at(-1)}, ${gaps} gaps, ${duplicates} duplicates, ${ms.toFixed(0)} ms`,
  );
}, 180_000);
