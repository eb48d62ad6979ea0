import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import { newAgent, startTestServer, TestServer } from '../testing/harness';
import { joinAs } from './proposal-fixtures';
import { makeAndSend, otherClientOf, sentProposal, signInByLink } from './portal-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  // 10:00 in New York (the firms' default zone): "today" is 2026-12-01.
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Portal = Awaited<ReturnType<typeof sentProposal>>['client'];
const post = (c: Portal, url: string, body: object) => c.agent.post(url).set('x-csrf-token', c.csrf()).send(body);
const accept = (c: Portal, id: string, body: object = {}) =>
  post(c, `/api/portal/proposals/${id}/accept`, { variantId: 'B', signedName: 'Edwina Marl', consent: true, ...body });
const to = (address: string) => (m: { to?: unknown }) => JSON.stringify(m.to).includes(address);

describe('a client reads and accepts a proposal in the portal', () => {
  it('lists the project, shows the snapshot, and accepting option B makes the job, wins the inquiry and mails everyone once', async () => {
    const p = await sentProposal(t, 'Gesso & Glaze Studio');
    const office = await joinAs(t, p, 'office');
    const officeEmail = (await office.agent.get('/api/auth/session')).body.user.email as string;

    const list = await p.client.agent.get('/api/portal/proposals');
    expect(list.status).toBe(200);
    expect(list.body).toEqual({
      items: [
        {
          estimateId: p.estimateId,
          title: 'Dining room plaster',
          siteAddress: '1 Round Row, Ochreford',
          latest: {
            id: p.version.id,
            version: 1,
            status: 'sent',
            expiresOn: '2026-12-31',
            isExpired: false,
            sentAt: '2026-12-01T15:00:00.000Z',
          },
          // No job yet, so no change orders.
          changeOrders: [],
        },
      ],
    });
    const read = await p.client.agent.get(`/api/portal/proposals/${p.version.id}`);
    expect(read.status).toBe(200);
    expect(read.body).toMatchObject({
      id: p.version.id,
      version: 1,
      status: 'sent',
      expiresOn: '2026-12-31',
      isExpired: false,
      isLatest: true,
      decidedAt: null,
      acceptedVariantId: null,
      signedName: null,
      clientComment: '',
    });
    expect(read.body.snapshot).toEqual(p.version.snapshot);

    const pdf = await p.client.agent.get(`/api/portal/proposals/${p.version.id}/pdf`);
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect(pdf.headers['content-disposition']).toMatch(/^attachment; filename="proposal-dining-room-plaster-v1\.pdf"$/);
    expect(pdf.headers['x-content-type-options']).toBe('nosniff');

    const optionB = p.version.snapshot.options.find((o) => o.id === 'B')!;
    const accepted = await accept(p.client, p.version.id, { signedName: '  Edwina Marl ' }).set('user-agent', 'JestBrowser/1.0');
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({
      status: 'accepted',
      acceptedVariantId: 'B',
      signedName: 'Edwina Marl',
      decidedAt: '2026-12-01T15:00:00.000Z',
    });

    const stored = await withTenant(t.ctx.pool, p.firmId, async (tx) => ({
      version: (
        await tx.client.query(`select signed_name, signed_ip, signed_user_agent, decided_at from proposal_versions where id = $1`, [
          p.version.id,
        ])
      ).rows[0],
      estimate: (await tx.client.query(`select status from estimates where id = $1`, [p.estimateId])).rows[0],
      inquiry: (await tx.client.query(`select stage from inquiries where id = $1`, [p.inquiryId])).rows[0],
      activity: (
        await tx.client.query(`select kind, data from inquiry_activities where inquiry_id = $1 and kind = 'stage_change'`, [p.inquiryId])
      ).rows,
      audit: (
        await tx.client.query(
          `select action, actor_kind from audit_log where tenant_id = $1 and action in ('proposal.accepted', 'job.created', 'inquiry.stage_changed') order by action`,
          [tx.tenantId],
        )
      ).rows,
    }));
    expect(stored.version).toMatchObject({
      signed_name: 'Edwina Marl',
      signed_user_agent: 'JestBrowser/1.0',
      decided_at: new Date('2026-12-01T15:00:00Z'),
    });
    expect(stored.version.signed_ip).toMatch(/127\.0\.0\.1|::1/);
    expect(stored.estimate.status).toBe('accepted');
    expect(stored.inquiry.stage).toBe('won');
    expect(stored.activity).toEqual([{ kind: 'stage_change', data: { from: 'proposal_sent', to: 'won' } }]);
    expect(stored.audit).toEqual([
      { action: 'inquiry.stage_changed', actor_kind: 'client' },
      { action: 'job.created', actor_kind: 'client' },
      { action: 'proposal.accepted', actor_kind: 'client' },
    ]);

    // The office sees the job: option B's total, and its payment lines adding up to it exactly.
    const jobs = await office.agent.get('/api/jobs');
    expect(jobs.status).toBe(200);
    expect(jobs.body.items).toEqual([
      expect.objectContaining({
        clientName: 'Edwina Marl',
        optionLabel: 'Primed only',
        contractSum: optionB.total,
        currency: 'USD',
        status: 'scheduled',
        startDate: '2026-12-07',
      }),
    ]);
    const job = (await office.agent.get(`/api/jobs/${jobs.body.items[0].id}`)).body;
    expect(job).toMatchObject({
      proposalVersionId: p.version.id,
      estimateId: p.estimateId,
      inquiryId: p.inquiryId,
      acceptedVariantId: 'B',
    });
    expect(
      job.paymentSchedule.map((l: { position: number; label: string; amount: string; status: string }) => [
        l.position,
        l.label,
        l.amount,
        l.status,
      ]),
    ).toEqual(optionB.payments.map((pay, i) => [i + 1, pay.label, pay.amount, 'draft']));
    const sum = job.paymentSchedule.reduce((acc: Decimal, l: { amount: string }) => acc.plus(l.amount), new Decimal(0));
    expect(sum.toFixed(2)).toBe(optionB.total);

    // E-mails: the owner, the office member and the client, once each.
    const ownerMail = await t.inbox.waitFor((m) => to(p.email)(m) && /accepted/.test(m.subject ?? ''));
    expect(ownerMail.subject).toBe('Edwina Marl accepted Dining room plaster');
    expect(ownerMail.text).toContain('Primed only');
    await t.inbox.waitFor((m) => to(officeEmail)(m) && /accepted/.test(m.subject ?? ''));
    const clientMail = await t.inbox.waitFor((m) => to(p.clientEmail)(m) && /You accepted/.test(m.subject ?? ''));
    expect(clientMail.subject).toBe('You accepted the proposal from Gesso & Glaze Studio: Dining room plaster');
    // Times in the firm's zone (New York by default), never UTC; the client's copy answers to the firm.
    expect(ownerMail.text).toMatch(/ E[SD]T\./);
    expect(`${ownerMail.text}${clientMail.text}`).not.toContain('UTC');
    expect(clientMail.from?.value[0]?.name).toBe('Gesso & Glaze Studio');
    expect(clientMail.replyTo?.value).toEqual([{ name: '', address: p.email }]);

    // Accepting again: 409, nothing new written or sent.
    const again = await accept(p.client, p.version.id);
    expect(again.status).toBe(409);
    expect(again.body.detail).toBe('This proposal was already accepted.');
    expect((await post(p.client, `/api/portal/proposals/${p.version.id}/decline`, {})).status).toBe(409);
    const counts = await withTenant(t.ctx.pool, p.firmId, (tx) =>
      tx.client.query(
        `select (select count(*) from jobs)::int as jobs, (select count(*) from mail_outbox where purpose_key like $1)::int as mails`,
        [`proposal-accepted%${p.version.id}%`],
      ),
    );
    expect(counts.rows[0]).toEqual({ jobs: 1, mails: 3 });
    const marker = await sentProposal(t, 'Marker Lime Works');
    await t.inbox.waitFor(to(marker.clientEmail));
    expect(t.inbox.messages.filter((m) => to(p.clientEmail)(m) && /You accepted/.test(m.subject ?? ''))).toHaveLength(1);
    expect(t.inbox.messages.filter((m) => to(officeEmail)(m) && /accepted/.test(m.subject ?? ''))).toHaveLength(1);
  });

  it('names each bad field: missing signedName, consent not ticked, unknown option', async () => {
    const p = await sentProposal(t, 'Field Check Plaster');
    const missing = await post(p.client, `/api/portal/proposals/${p.version.id}/accept`, { variantId: 'A', consent: true });
    expect(missing.status).toBe(400);
    expect(missing.headers['content-type']).toContain('application/problem+json');
    expect(missing.body.errors.map((e: { field: string }) => e.field)).toEqual(['signedName']);
    const short = await accept(p.client, p.version.id, { signedName: ' E ' });
    expect(short.body.errors.map((e: { field: string }) => e.field)).toEqual(['signedName']);
    const unticked = await accept(p.client, p.version.id, { consent: false });
    expect(unticked.status).toBe(400);
    expect(unticked.body.errors).toEqual([{ field: 'consent', message: 'Tick the box to confirm you accept this proposal.' }]);
    const unknown = await accept(p.client, p.version.id, { variantId: 'Z' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.errors.map((e: { field: string }) => e.field)).toEqual(['variantId']);
    const extra = await accept(p.client, p.version.id, { price: '1.00' });
    expect(extra.body.errors.map((e: { field: string }) => e.field)).toEqual(['price']);
    const noComment = await post(p.client, `/api/portal/proposals/${p.version.id}/request-changes`, { comment: '  ' });
    expect(noComment.status).toBe(400);
    expect(noComment.body.errors.map((e: { field: string }) => e.field)).toEqual(['comment']);
    expect((await p.client.agent.get(`/api/portal/proposals/${p.version.id}`)).body.status).toBe('sent');
  });

  it('refuses an expired offer (409) by the firm’s calendar', async () => {
    const p = await sentProposal(t, 'Late Plaster', { expiresOn: '2026-12-02', signIn: false });
    // Still open all of 2 December in New York; closed on the 3rd. The e-mailed link lasts 3 days.
    t.setNow(new Date('2026-12-03T04:00:00Z'));
    try {
      await signInByLink(p.client, p.version.link);
      expect((await p.client.agent.get(`/api/portal/proposals/${p.version.id}`)).body.isExpired).toBe(false);
      t.setNow(new Date('2026-12-03T15:00:00Z'));
      expect((await p.client.agent.get(`/api/portal/proposals/${p.version.id}`)).body.isExpired).toBe(true);
      const late = await accept(p.client, p.version.id);
      expect(late.status).toBe(409);
      expect(late.body.detail).toBe('This proposal expired on December 2, 2026; ask the firm for a new one.');
      // Asking for a renewal still reaches the firm.
      const ask = await post(p.client, `/api/portal/proposals/${p.version.id}/request-changes`, { comment: 'Could you renew the offer?' });
      expect(ask.status).toBe(200);
    } finally {
      t.setNow(new Date('2026-12-01T15:00:00Z'));
    }
  });

  it('refuses a superseded version (409) and shows it as not the latest', async () => {
    const p = await sentProposal(t, 'Two Versions Plaster');
    const v2 = await makeAndSend(t, p);
    const old = await p.client.agent.get(`/api/portal/proposals/${p.version.id}`);
    expect(old.body).toMatchObject({ status: 'superseded', isLatest: false });
    const res = await accept(p.client, p.version.id);
    expect(res.status).toBe(409);
    expect(res.body.detail).toBe('A newer version of this proposal was sent; please read that one.');
    expect((await p.client.agent.get('/api/portal/proposals')).body.items[0].latest).toMatchObject({
      id: v2.id,
      version: 2,
      status: 'sent',
    });
    expect((await accept(p.client, v2.id, { variantId: 'A' })).status).toBe(200);
  });

  it('lets the client decline or ask for changes; the office hears of it', async () => {
    const p = await sentProposal(t, 'Answer Plaster');
    const asked = await post(p.client, `/api/portal/proposals/${p.version.id}/request-changes`, { comment: 'Could the border be ochre?' });
    expect(asked.status).toBe(200);
    expect(asked.body).toMatchObject({
      status: 'changes_requested',
      clientComment: 'Could the border be ochre?',
      decidedAt: '2026-12-01T15:00:00.000Z',
    });
    const mail = await t.inbox.waitFor((m) => to(p.email)(m) && /asked for changes/.test(m.subject ?? ''));
    expect(mail.text).toContain('Could the border be ochre?');
    expect((await accept(p.client, p.version.id)).status).toBe(409);

    const v2 = await makeAndSend(t, p);
    const declined = await post(p.client, `/api/portal/proposals/${v2.id}/decline`, {});
    expect(declined.status).toBe(200);
    expect(declined.body).toMatchObject({ status: 'declined', clientComment: '' });
    await t.inbox.waitFor((m) => to(p.email)(m) && /declined/.test(m.subject ?? ''));
    const audit = await withTenant(t.ctx.pool, p.firmId, (tx) =>
      tx.client.query(
        `select action, actor_kind from audit_log where tenant_id = $1 and action like 'proposal.%' and actor_kind = 'client' order by created_at`,
        [tx.tenantId],
      ),
    );
    expect(audit.rows.map((r) => r.action)).toEqual(['proposal.changes_requested', 'proposal.declined']);
  });
});

describe('who may see a proposal in the portal', () => {
  it('answers 404 to another client of the firm and to another firm’s client; 401 to staff', async () => {
    const p = await sentProposal(t, 'Private Plaster');
    const id = p.version.id;
    const routes = (c: Portal) => [
      c.agent.get(`/api/portal/proposals/${id}`),
      c.agent.get(`/api/portal/proposals/${id}/pdf`),
      accept(c, id),
      post(c, `/api/portal/proposals/${id}/decline`, {}),
      post(c, `/api/portal/proposals/${id}/request-changes`, { comment: 'x' }),
    ];
    const neighbour = await otherClientOf(t, p);
    for (const res of await Promise.all(routes(neighbour))) expect(res.status).toBe(404);
    expect((await neighbour.agent.get('/api/portal/proposals')).body).toEqual({ items: [] });

    const other = await sentProposal(t, 'Other Firm Plaster');
    for (const res of await Promise.all(routes(other.client))) expect(res.status).toBe(404);

    // A draft is never shown.
    const draft = await p.agent
      .post('/api/proposals')
      .set('x-csrf-token', p.csrf())
      .send({ estimateId: p.estimateId, expiresOn: '2026-12-31' });
    expect((await p.client.agent.get(`/api/portal/proposals/${draft.body.id}`)).status).toBe(404);
    expect((await p.client.agent.get('/api/portal/proposals/not-a-uuid')).status).toBe(400);

    // Staff sessions are not client sessions.
    for (const res of await Promise.all(routes({ agent: p.agent, csrf: p.csrf, refresh: async () => {} }))) expect(res.status).toBe(401);
    const anonymous = await newAgent(t.app, 'portal');
    expect((await anonymous.agent.get(`/api/portal/proposals/${id}`)).status).toBe(401);

    expect((await p.client.agent.get(`/api/portal/proposals/${id}`)).body.status).toBe('sent');
  });
});
