import { Pool } from 'pg';
import pino from 'pino';
import { joinAs } from '../library/library-fixtures';
import { sendFollowUpDigest } from './follow-ups';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';

// An inquiry assigned to someone since deactivated (nothing reassigns their inquiries) is nobody's: its
// follow-up goes to the owners and office with the unassigned ones, not to no one.

let t: TestServer;
let jobs: Pool;
beforeAll(async () => {
  t = await startTestServer();
  jobs = new Pool({ connectionString: testDatabaseUrls().DATABASE_JOBS_URL, max: 2 });
});
afterAll(async () => {
  await jobs.end();
  await t.stop();
});

it("a deactivated member's overdue follow-up still reaches someone in the morning digest", async () => {
  const o = await signUpFirm(t.app, 'Left Firm Plaster');
  const office = await joinAs(t, o, 'office');
  const officeUserId = (await office.agent.get('/api/auth/session')).body.user.id as string;
  const members = (await o.agent.get('/api/team/members')).body;
  const list = (Array.isArray(members) ? members : members.items) as Array<{ id: string; userId: string }>;
  const membership = list.find((m) => m.userId === officeUserId)!;

  const assigned = await o.agent
    .post('/api/inquiries')
    .set('x-csrf-token', o.csrf())
    .send({ contactName: 'Assigned Agatha', source: 'phone', nextFollowUp: '2020-05-01', assigneeUserId: officeUserId });
  expect(assigned.status).toBe(201);
  // An unassigned one too, so the owner certainly gets a digest to look in.
  await o.agent
    .post('/api/inquiries')
    .set('x-csrf-token', o.csrf())
    .send({ contactName: 'Unassigned Ursula', source: 'phone', nextFollowUp: '2020-05-01' });

  const off = await o.agent.post(`/api/team/members/${membership.id}/deactivate`).set('x-csrf-token', o.csrf());
  expect(off.status).toBe(200);

  await sendFollowUpDigest(jobs, t.queue, t.ctx.config, { tenantId: o.firmId, localDate: '2026-03-10' }, pino({ level: 'silent' }));
  const { rows } = await jobs.query<{ to_address: string; text: string }>(
    `select to_address, text from mail_outbox where tenant_id = $1 and purpose_key like 'follow-ups:%'`,
    [o.firmId],
  );
  // the owner's digest holds both; the deactivated member gets none
  expect(rows).toHaveLength(1);
  expect(rows[0].text).toContain('Unassigned Ursula');
  expect(rows[0].text).toContain('Assigned Agatha');
});
