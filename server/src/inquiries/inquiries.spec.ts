import { withTenant } from '@layerbook/db';
import request from 'supertest';
import { publicInquiryBody } from '../testing/public-form';
import { linkIn } from '../testing/inbox';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { MIN_FILL_MS } from './public-form';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

/** Submits after the minimum fill time by moving the injected clock, not by sleeping. */
async function submitPublic(slug: string, overrides: Record<string, unknown> = {}) {
  const body = await publicInquiryBody(t.app, slug, overrides);
  t.setNow(new Date(Date.now() + MIN_FILL_MS + 1000));
  try {
    return { body, res: await request(t.app).post(`/api/public/firms/${slug}/inquiries`).send(body) };
  } finally {
    t.setNow(null);
  }
}

async function firmWithSlug(name: string) {
  const owner = await signUpFirm(t.app, name);
  const firm = await owner.agent.get('/api/firm');
  return { ...owner, slug: firm.body.slug as string };
}

describe('public inquiry form', () => {
  it('files the inquiry in that firm only and e-mails the prospect and the owner once each', async () => {
    const a = await firmWithSlug('Willowmere Plaster');
    const b = await firmWithSlug('Other Studio');
    const { body, res } = await submitPublic(a.slug);
    expect(res.status).toBe(201);
    const ack = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(body.email));
    expect(ack.subject).toContain('Willowmere Plaster');
    // The prospect's copy comes from the firm's name at our address, and a reply reaches the firm.
    expect(ack.from?.value).toEqual([{ name: 'Willowmere Plaster', address: 'no-reply@layerbook.local' }]);
    expect(ack.replyTo?.value).toEqual([{ name: '', address: a.email }]);
    const notice = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(a.email) && /New inquiry/.test(m.subject ?? ''));
    expect(notice.text).toContain('Della Hawthorne');
    expect(notice.replyTo).toBeUndefined();
    const listA = await a.agent.get('/api/inquiries');
    expect(listA.body.items).toHaveLength(1);
    expect(listA.body.items[0]).toMatchObject({
      contactName: 'Della Hawthorne',
      stage: 'new',
      source: 'designer_referral',
      referrerName: 'Ottoline Marsh Interiors',
    });
    expect((await b.agent.get('/api/inquiries')).body.items).toHaveLength(0);
    expect(JSON.stringify((await b.agent.get('/api/inquiries/board')).body)).not.toContain('Della');
  });

  it('sends the acknowledgement once even when its job runs twice', async () => {
    const a = await firmWithSlug('Twice Plaster');
    const { body } = await submitPublic(a.slug);
    await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(body.email));
    const { rows } = await t.queue.boss.getDb().executeSql(`select id from mail_outbox where to_address = $1`, [body.email]);
    expect(rows).toHaveLength(1);
    await t.queue.boss.send('mail-send', { outboxId: rows[0].id });
    const marker = await submitPublic(a.slug);
    await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(marker.body.email));
    expect(t.inbox.messages.filter((m) => JSON.stringify(m.to).includes(body.email))).toHaveLength(1);
  });

  it('acknowledges one address once a day however often the form names it; every inquiry is still filed and the office told', async () => {
    const a = await firmWithSlug('Once A Day Plaster');
    const email = `repeat.${Date.now().toString(36)}@example.test`;
    for (let i = 0; i < 3; i++) expect((await submitPublic(a.slug, { email, name: `Asker ${i}` })).res.status).toBe(201);
    const { rows } = await t.queue.boss.getDb().executeSql(`select id from mail_outbox where to_address = $1`, [email]);
    expect(rows).toHaveLength(1);
    expect((await a.agent.get('/api/inquiries')).body.items).toHaveLength(3);
    const { rows: notices } = await t.queue.boss
      .getDb()
      .executeSql(`select id from mail_outbox where to_address = $1 and subject like 'New inquiry%'`, [a.email]);
    expect(notices).toHaveLength(3);
  });

  it('takes "Not sure" as a JSON boolean only: the string "false" is refused naming it, not read as yes', async () => {
    const a = await firmWithSlug('Not Sure Plaster');
    const { res } = await submitPublic(a.slug, { yearBuilt: '', yearBuiltUnknown: 'false' });
    expect([res.status, res.body.errors?.map((e: { field: string }) => e.field)]).toEqual([400, ['yearBuiltUnknown']]);
    expect((await a.agent.get('/api/inquiries')).body.items).toHaveLength(0);
  });

  it('silently drops a bot that fills the honeypot or sends too fast, filing nothing', async () => {
    const a = await firmWithSlug('Honeypot Plaster');
    const honeypot = await submitPublic(a.slug, { website: 'http://spam.example' });
    expect(honeypot.res.status).toBe(201);
    const fast = await request(t.app)
      .post(`/api/public/firms/${a.slug}/inquiries`)
      .send(await publicInquiryBody(t.app, a.slug));
    expect(fast.status).toBe(201);
    expect((await a.agent.get('/api/inquiries')).body.items).toHaveLength(0);
  });

  it('files one inquiry per form stamp: a replayed stamp is quietly dropped', async () => {
    const a = await firmWithSlug('Replay Plaster');
    const { body } = await submitPublic(a.slug);
    t.setNow(new Date(Date.now() + MIN_FILL_MS + 1000));
    try {
      const again = await request(t.app)
        .post(`/api/public/firms/${a.slug}/inquiries`)
        .send({ ...body, email: 'someone.else@example.test' });
      expect(again.status).toBe(201);
    } finally {
      t.setNow(null);
    }
    expect((await a.agent.get('/api/inquiries')).body.items).toHaveLength(1);
  });

  it('refuses a forged form stamp naming the field', async () => {
    const a = await firmWithSlug('Stamp Plaster');
    const { res } = await submitPublic(a.slug, { startedAt: '1.forged' });
    expect(res.status).toBe(400);
    expect(res.body.errors[0].field).toBe('startedAt');
  });

  it('answers 400 naming each bad field, and nothing is filed', async () => {
    const a = await firmWithSlug('Strict Plaster');
    const { res } = await submitPublic(a.slug, {
      name: '',
      email: 'x',
      consent: false,
      heardFrom: 'designer_referral',
      referrerName: '',
      yearBuilt: '',
      rooms: 'x'.repeat(2001),
      extra: 1,
    });
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/problem\+json/);
    const fields = res.body.errors.map((e: { field: string }) => e.field).sort();
    expect(fields).toEqual(expect.arrayContaining(['consent', 'email', 'extra', 'name', 'rooms']));
    expect((await a.agent.get('/api/inquiries')).body.items).toHaveLength(0);
  });

  it('answers 404 for an unknown firm', async () => {
    expect((await request(t.app).get('/api/public/firms/no-such-firm-here')).status).toBe(404);
  });

  it('rate limits one address', async () => {
    const limited = await startTestServer({ PUBLIC_FORM_RATE_LIMIT: '2' });
    try {
      const owner = await signUpFirm(limited.app, 'Limited Plaster');
      const slug = (await owner.agent.get('/api/firm')).body.slug;
      const statuses: number[] = [];
      for (let i = 0; i < 3; i++) statuses.push((await request(limited.app).post(`/api/public/firms/${slug}/inquiries`).send({})).status);
      expect(statuses).toEqual([400, 400, 429]);
    } finally {
      await limited.stop();
    }
  });
});

describe('inquiries in admin', () => {
  it('creates, moves through stages, logs activity and audits stage changes and reassignment', async () => {
    const o = await firmWithSlug('Pipeline Plaster');
    const team = await o.agent.get('/api/team/members');
    const created = await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'Ambrose Fell', source: 'phone', estimatedValue: '18000.00', siteAddress: '3 Mill Lane', yearBuilt: 1952 });
    expect(created.status).toBe(201);
    const id = created.body.id;
    const assigned = await o.agent
      .patch(`/api/inquiries/${id}`)
      .set('x-csrf-token', o.csrf())
      .send({ assigneeUserId: team.body.items[0].userId, nextFollowUp: '2026-12-10' });
    expect(assigned.body).toMatchObject({ assigneeName: 'Olive Owner', nextFollowUp: '2026-12-10' });
    const moved = await o.agent.post(`/api/inquiries/${id}/stage`).set('x-csrf-token', o.csrf()).send({ stage: 'visit_booked' });
    expect(moved.body.stage).toBe('visit_booked');
    expect(moved.body.clientId).toBeTruthy();
    expect(moved.body.siteId).toBeTruthy();
    const client = await o.agent.get(`/api/clients/${moved.body.clientId}`);
    expect(client.body).toMatchObject({ name: 'Ambrose Fell', kind: 'homeowner' });
    expect(client.body.sites[0]).toMatchObject({ addressLine1: '3 Mill Lane', yearBuilt: 1952, isPre1978: true });
    const noted = await o.agent
      .post(`/api/inquiries/${id}/activities`)
      .set('x-csrf-token', o.csrf())
      .send({ kind: 'call', body: 'Left a voicemail about Thursday' });
    expect(noted.status).toBe(201);
    expect(noted.body.activities[0]).toMatchObject({ kind: 'call', body: 'Left a voicemail about Thursday', actorName: 'Olive Owner' });
    expect(noted.body.activities.map((a: { kind: string }) => a.kind)).toEqual(
      expect.arrayContaining(['created', 'assignment', 'follow_up', 'stage_change', 'converted', 'call']),
    );
    const audit = await withTenant(t.ctx.pool, o.firmId, (tx) =>
      tx.client.query(`select action from audit_log where entity_id = $1 order by created_at`, [id]),
    );
    expect(audit.rows.map((r) => r.action)).toEqual(['inquiry.reassigned', 'inquiry.stage_changed']);
    const conversion = await o.agent.post(`/api/inquiries/${id}/convert`).set('x-csrf-token', o.csrf()).send({});
    expect(conversion.body).toEqual({ clientId: moved.body.clientId, siteId: moved.body.siteId });
  });

  it('files an inquiry again as asked: under another client it takes a new site, not the old client’s; "both" is refused naming the field', async () => {
    const o = await firmWithSlug('Refile Plaster');
    const made = await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'Mae Orr', source: 'phone', siteAddress: '9 Quarry Row' });
    const first = (await o.agent.post(`/api/inquiries/${made.body.id}/convert`).set('x-csrf-token', o.csrf()).send({})).body as {
      clientId: string;
      siteId: string;
    };
    const other = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Orr Holdings' });
    // another client chosen: the inquiry does not drag the first client's site along (that was a 400 on a siteId never sent)
    const moved = await o.agent
      .post(`/api/inquiries/${made.body.id}/convert`)
      .set('x-csrf-token', o.csrf())
      .send({ clientId: other.body.id });
    expect(moved.status).toBe(200);
    expect(moved.body.clientId).toBe(other.body.id);
    expect(moved.body.siteId).not.toBe(first.siteId);
    // a new client described is made, not ignored because the inquiry is filed already
    const described = await o.agent
      .post(`/api/inquiries/${made.body.id}/convert`)
      .set('x-csrf-token', o.csrf())
      .send({ client: { kind: 'homeowner', isCompany: false, name: 'Mae Orr Jr', email: '', phone: '', notes: '' } });
    expect(described.status).toBe(200);
    expect([first.clientId, other.body.id]).not.toContain(described.body.clientId);
    const both = await o.agent
      .post(`/api/inquiries/${made.body.id}/convert`)
      .set('x-csrf-token', o.csrf())
      .send({ clientId: other.body.id, client: { kind: 'homeowner', isCompany: false, name: 'X', email: '', phone: '', notes: '' } });
    expect([both.status, both.body.errors?.map((e: { field: string }) => e.field)]).toEqual([400, ['client']]);
  });

  it('answers the board as a list of stages in order, each with its count and cards', async () => {
    const o = await firmWithSlug('Board Plaster');
    const made = await o.agent.post('/api/inquiries').set('x-csrf-token', o.csrf()).send({ contactName: 'Card One', source: 'phone' });
    await o.agent.post(`/api/inquiries/${made.body.id}/stage`).set('x-csrf-token', o.csrf()).send({ stage: 'contacted' });
    const board = await o.agent.get('/api/inquiries/board');
    expect(Object.keys(board.body)).toEqual(['items']);
    expect(board.body.items.map((c: { stage: string }) => c.stage)).toEqual([
      'new',
      'contacted',
      'visit_booked',
      'samples',
      'proposal_sent',
      'won',
      'lost',
    ]);
    expect(board.body.items[1]).toMatchObject({ stage: 'contacted', label: 'Contacted', likelihoodPercent: 15, count: 1 });
    expect(board.body.items[1].items.map((i: { contactName: string }) => i.contactName)).toEqual(['Card One']);
    expect(board.body.items[0]).toMatchObject({ count: 0, items: [] });
  });

  it('lists the chance of winning by stage; the owner sets it, office reads it', async () => {
    const o = await firmWithSlug('Likely Plaster');
    const before = await o.agent.get('/api/inquiries/stages');
    expect(before.body.items[0]).toEqual({ stage: 'new', label: 'New', likelihoodPercent: 10 });
    expect(before.body.items).toHaveLength(7);
    const likelihoods = { new: 5, contacted: 20, visit_booked: 30, samples: 55, proposal_sent: 65, won: 100, lost: 0 };
    const saved = await o.agent.put('/api/inquiries/stages').set('x-csrf-token', o.csrf()).send({ likelihoods });
    expect(saved.body.items.map((s: { likelihoodPercent: number }) => s.likelihoodPercent)).toEqual([5, 20, 30, 55, 65, 100, 0]);
    const bad = await o.agent
      .put('/api/inquiries/stages')
      .set('x-csrf-token', o.csrf())
      .send({ likelihoods: { ...likelihoods, samples: 120 } });
    expect(bad.status).toBe(400);
    expect(bad.body.errors[0].field).toBe('likelihoods.samples');
  });

  it('requires a reason to mark an inquiry lost', async () => {
    const o = await firmWithSlug('Lost Plaster');
    const { body } = await o.agent.post('/api/inquiries').set('x-csrf-token', o.csrf()).send({ contactName: 'X', source: 'phone' });
    const bad = await o.agent.post(`/api/inquiries/${body.id}/stage`).set('x-csrf-token', o.csrf()).send({ stage: 'lost' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors[0].field).toBe('lostReason');
    const ok = await o.agent
      .post(`/api/inquiries/${body.id}/stage`)
      .set('x-csrf-token', o.csrf())
      .send({ stage: 'lost', lostReason: 'Chose a cheaper painter' });
    expect(ok.body).toMatchObject({ stage: 'lost', lostReason: 'Chose a cheaper painter' });
  });

  it('validates each field and refuses an assignee from another firm', async () => {
    const o = await firmWithSlug('Valid Plaster');
    const other = await signUpFirm(t.app, 'Elsewhere');
    const res = await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: '', source: 'carrier pigeon', estimatedValue: 12.345, nextFollowUp: '2026-02-30' });
    expect(res.status).toBe(400);
    expect(res.body.errors.map((e: { field: string }) => e.field).sort()).toEqual([
      'contactName',
      'estimatedValue',
      'nextFollowUp',
      'source',
    ]);
    const foreign = await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'Y', source: 'phone', assigneeUserId: other.userId });
    expect(foreign.status).toBe(400);
    expect(foreign.body.errors[0].field).toBe('assigneeUserId');
  });

  it('lists with filters, search and keyset pages that never repeat or skip', async () => {
    const o = await firmWithSlug('Paging Plaster');
    for (let i = 0; i < 7; i++) {
      await o.agent
        .post('/api/inquiries')
        .set('x-csrf-token', o.csrf())
        .send({ contactName: `Prospect ${i}`, source: i % 2 ? 'phone' : 'showroom', estimatedValue: `${1000 * (i + 1)}.00` });
    }
    const seen: string[] = [];
    let after: string | null = null;
    do {
      const page: request.Response = await o.agent.get('/api/inquiries').query({ limit: 3, ...(after ? { after } : {}) });
      seen.push(...page.body.items.map((i: { contactName: string }) => i.contactName));
      after = page.body.nextCursor;
    } while (after);
    expect(seen).toEqual(['Prospect 6', 'Prospect 5', 'Prospect 4', 'Prospect 3', 'Prospect 2', 'Prospect 1', 'Prospect 0']);
    const byValue = await o.agent.get('/api/inquiries').query({ sort: 'value', limit: 2 });
    expect(byValue.body.items.map((i: { estimatedValue: string }) => i.estimatedValue)).toEqual(['7000.00', '6000.00']);
    const next = await o.agent.get('/api/inquiries').query({ sort: 'value', limit: 2, after: byValue.body.nextCursor });
    expect(next.body.items.map((i: { estimatedValue: string }) => i.estimatedValue)).toEqual(['5000.00', '4000.00']);
    expect((await o.agent.get('/api/inquiries').query({ source: 'phone' })).body.items).toHaveLength(3);
    expect((await o.agent.get('/api/inquiries').query({ q: 'prospect 4' })).body.items).toHaveLength(1);
    const bad = await o.agent.get('/api/inquiries').query({ sort: 'sideways', after: 'garbage', limit: 1000 });
    expect(bad.status).toBe(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['limit', 'sort']);
    const badCursor = await o.agent.get('/api/inquiries').query({ after: 'garbage' });
    expect(badCursor.body.errors[0].field).toBe('after');
  });

  it('shows the weighted pipeline and overdue follow-ups on today', async () => {
    const o = await firmWithSlug('Weighted Plaster');
    const add = async (value: string, stage: string, nextFollowUp: string | null) => {
      const c = await o.agent
        .post('/api/inquiries')
        .set('x-csrf-token', o.csrf())
        .send({ contactName: `V${value}`, source: 'phone', estimatedValue: value, nextFollowUp });
      if (stage !== 'new') await o.agent.post(`/api/inquiries/${c.body.id}/stage`).set('x-csrf-token', o.csrf()).send({ stage });
    };
    // DOMAIN.md §2.13 worked example [D]: 18,000×20% + 9,500×40% + 32,000×70% + 6,000×90% = 35,200 (weighted pipeline, common practice).
    await o.agent
      .put('/api/inquiries/stages')
      .set('x-csrf-token', o.csrf())
      .send({ likelihoods: { new: 10, contacted: 20, visit_booked: 20, samples: 70, proposal_sent: 40, won: 100, lost: 0 } });
    await add('18000.00', 'visit_booked', '2000-01-01');
    await add('9500.00', 'proposal_sent', null);
    await add('32000.00', 'samples', null);
    const today = await o.agent.get('/api/inquiries/today');
    expect(today.body.pipeline).toMatchObject({ unweighted: '59500.00', weighted: '29800.00', openCount: 3, currency: 'USD' });
    expect(today.body.overdue.map((i: { contactName: string }) => i.contactName)).toEqual(['V18000.00']);
    expect(today.body.overdue[0].isFollowUpOverdue).toBe(true);
    await o.agent
      .put('/api/inquiries/stages')
      .set('x-csrf-token', o.csrf())
      .send({ likelihoods: { new: 10, contacted: 90, visit_booked: 20, samples: 70, proposal_sent: 40, won: 100, lost: 0 } });
    const six = await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'V6000', source: 'phone', estimatedValue: '6000.00' });
    await o.agent.post(`/api/inquiries/${six.body.id}/stage`).set('x-csrf-token', o.csrf()).send({ stage: 'contacted' });
    expect((await o.agent.get('/api/inquiries/today')).body.pipeline).toMatchObject({ unweighted: '65500.00', weighted: '35200.00' });
  });

  it("keeps crew out and answers another firm's ids with 404", async () => {
    const a = await firmWithSlug('A Plaster');
    const b = await firmWithSlug('B Plaster');
    const bInq = await b.agent.post('/api/inquiries').set('x-csrf-token', b.csrf()).send({ contactName: 'Secret', source: 'phone' });
    const bClient = await b.agent.post('/api/clients').set('x-csrf-token', b.csrf()).send({ kind: 'designer', name: 'B Designer' });
    const bSite = await b.agent
      .post(`/api/clients/${bClient.body.id}/sites`)
      .set('x-csrf-token', b.csrf())
      .send({ addressLine1: '1 B Street' });
    const id = bInq.body.id;
    const w = (r: request.Test) => r.set('x-csrf-token', a.csrf());
    const statuses = [
      (await a.agent.get(`/api/inquiries/${id}`)).status,
      (await w(a.agent.patch(`/api/inquiries/${id}`)).send({ contactName: 'Mine' })).status,
      (await w(a.agent.post(`/api/inquiries/${id}/stage`)).send({ stage: 'won' })).status,
      (await w(a.agent.post(`/api/inquiries/${id}/activities`)).send({ kind: 'note', body: 'x' })).status,
      (await w(a.agent.post(`/api/inquiries/${id}/convert`)).send({})).status,
      (await a.agent.get(`/api/clients/${bClient.body.id}`)).status,
      (await w(a.agent.patch(`/api/clients/${bClient.body.id}`)).send({ name: 'Mine' })).status,
      (await w(a.agent.post(`/api/clients/${bClient.body.id}/contacts`)).send({ name: 'Z' })).status,
      (await w(a.agent.post(`/api/clients/${bClient.body.id}/sites`)).send({ addressLine1: 'Z' })).status,
      (await w(a.agent.patch(`/api/sites/${bSite.body.id}`)).send({ label: 'Mine' })).status,
    ];
    expect(statuses).toEqual([404, 404, 404, 404, 404, 404, 404, 404, 404, 404]);
    // Linking A's inquiry to B's client is refused too.
    const aInq = await a.agent.post('/api/inquiries').set('x-csrf-token', a.csrf()).send({ contactName: 'A1', source: 'phone' });
    const link = await w(a.agent.post(`/api/inquiries/${aInq.body.id}/convert`)).send({ clientId: bClient.body.id });
    expect(link.status).toBe(400);
    expect((await b.agent.get(`/api/inquiries/${id}`)).body).toMatchObject({ contactName: 'Secret', stage: 'new' });
  });
});

describe('follow-up reminders', () => {
  it('e-mails each person their due follow-ups once per day, however often the job runs', async () => {
    const o = await firmWithSlug('Reminder Plaster');
    await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'Overdue Olga', source: 'phone', nextFollowUp: '2020-05-01' });
    await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'Later Lars', source: 'phone', nextFollowUp: '2999-01-01' });
    // Only this test's firms: the test database holds every other spec's firms too.
    await t.queue.boss.send('follow-up-sweep', { force: true, tenantIds: [o.firmId] });
    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(o.email) && /Follow-ups/.test(m.subject ?? ''));
    expect(mail.text).toContain('Overdue Olga');
    expect(mail.text).not.toContain('Later Lars');
    expect(linkIn(mail)).toContain('/today');
    await t.queue.boss.send('follow-up-sweep', { force: true, tenantIds: [o.firmId] });
    const marker = await firmWithSlug('Marker Plaster');
    await marker.agent
      .post('/api/inquiries')
      .set('x-csrf-token', marker.csrf())
      .send({ contactName: 'M', source: 'phone', nextFollowUp: '2020-05-01' });
    await t.queue.boss.send('follow-up-sweep', { force: true, tenantIds: [o.firmId, marker.firmId] });
    await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(marker.email) && /Follow-ups/.test(m.subject ?? ''));
    expect(t.inbox.messages.filter((m) => JSON.stringify(m.to).includes(o.email) && /Follow-ups/.test(m.subject ?? ''))).toHaveLength(1);
  });
});
