import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, signUpTokenFor, startTestServer, TestServer, uniqueEmail } from '../testing/harness';
import { SIGN_UP_HOURS } from './staff-auth';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

async function askToSignUp(email: string, password = 'qz7-xRv4-mn2W-p9k') {
  const { agent, csrf } = await newAgent(t.app);
  return agent
    .post('/api/auth/signup')
    .set('x-csrf-token', csrf())
    .send({ firmName: 'Bramble Limewash', name: 'Iris Vane', email, password });
}

async function confirm(token: unknown) {
  const { agent, csrf } = await newAgent(t.app);
  const res = await agent.post('/api/auth/signup/confirm').set('x-csrf-token', csrf()).send({ token });
  return { res, agent };
}

async function signIn(email: string, password: string) {
  const { agent, csrf } = await newAgent(t.app);
  return agent.post('/api/auth/signin').set('x-csrf-token', csrf()).send({ email, password });
}

const mailTo = (email: string, subject: RegExp) =>
  t.inbox.waitFor((m) => JSON.stringify(m.to ?? '').includes(email) && subject.test(m.subject ?? ''));

describe('sign-up answers alike for a new and a known e-mail, and the e-mail says which', () => {
  it('answers the same 202 and body, and sends a confirmation link to a new address', async () => {
    const owner = await signUpFirm(t.app);
    const known = await askToSignUp(owner.email);
    const fresh = await askToSignUp(uniqueEmail('iris'));
    expect(known.status).toBe(202);
    expect(fresh.status).toBe(202);
    expect(known.body).toEqual(fresh.body);
    expect(known.body.detail).toMatch(/Check your inbox/);
    expect(known.headers['content-type']).toBe(fresh.headers['content-type']);
  });

  it('tells a known address that someone tried, and changes nothing of its account', async () => {
    const owner = await signUpFirm(t.app);
    expect((await askToSignUp(owner.email, 'a-brand-new-pass-42')).status).toBe(202);
    const mail = await mailTo(owner.email, /tried to open a Layerbook firm/);
    expect(mail.text).toMatch(/sign in instead, or reset your password/);
    expect(mail.text).not.toMatch(/sign-up\/confirm/);
    expect((await signIn(owner.email, 'a-brand-new-pass-42')).status).toBe(401);
    expect((await signIn(owner.email, owner.password)).status).toBe(200);
  });

  it('tells a known address at most once an hour, however often the form is sent, and answers alike each time', async () => {
    const owner = await signUpFirm(t.app);
    const notices = async () => {
      const sql = `select count(*)::int as n from mail_outbox where to_address = $1 and purpose_key like 'sign-up-known:%'`;
      const { rows } = await t.queue.boss.getDb().executeSql(sql, [owner.email]);
      return (rows[0] as { n: number }).n;
    };
    try {
      t.setNow(new Date('2031-06-01T10:05:00Z'));
      const first = await askToSignUp(owner.email);
      for (let i = 0; i < 4; i++) expect((await askToSignUp(owner.email)).body).toEqual(first.body);
      t.setNow(new Date('2031-06-01T10:55:00Z'));
      expect((await askToSignUp(owner.email)).status).toBe(202);
      expect(await notices()).toBe(1);
      t.setNow(new Date('2031-06-01T11:10:00Z'));
      expect((await askToSignUp(owner.email)).status).toBe(202);
      expect(await notices()).toBe(2);
    } finally {
      t.setNow(null);
    }
  });

  it('creates the firm only when the link is followed, signs the owner in, and the link works once', async () => {
    const email = uniqueEmail('iris');
    await askToSignUp(email);
    expect((await signIn(email, 'qz7-xRv4-mn2W-p9k')).status).toBe(401);
    const mail = await mailTo(email, /Finish opening Bramble Limewash/);
    const token = new URL(linkIn(mail)).searchParams.get('token')!;
    expect(await signUpTokenFor(t.app, email)).toBe(token);

    const first = await confirm(token);
    expect(first.res.status).toBe(201);
    expect(first.res.body.user).toMatchObject({ email, role: 'owner', firmName: 'Bramble Limewash', name: 'Iris Vane' });
    expect((await first.agent.get('/api/auth/session')).body.user.email).toBe(email);

    const again = await confirm(token);
    expect(again.res.status).toBe(410);
    expect(again.res.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(again.res.body.errors).toEqual([expect.objectContaining({ field: 'token' })]);
    expect((await signIn(email, 'qz7-xRv4-mn2W-p9k')).status).toBe(200);
  });

  it('refuses an expired link and creates nothing', async () => {
    const email = uniqueEmail('iris');
    await askToSignUp(email);
    const token = await signUpTokenFor(t.app, email);
    t.setNow(new Date(Date.now() + (SIGN_UP_HOURS * 60 + 1) * 60_000));
    try {
      const { res } = await confirm(token);
      expect(res.status).toBe(410);
      expect(res.body.errors).toEqual([expect.objectContaining({ field: 'token', message: expect.stringMatching(/expired/) })]);
    } finally {
      t.setNow(null);
    }
    expect((await signIn(email, 'qz7-xRv4-mn2W-p9k')).status).toBe(401);
  });

  it('refuses an unknown or malformed token, naming the field', async () => {
    const unknown = await confirm('A'.repeat(43));
    expect(unknown.res.status).toBe(410);
    expect(unknown.res.body.errors).toEqual([expect.objectContaining({ field: 'token' })]);
    const malformed = await confirm('nope');
    expect(malformed.res.status).toBe(400);
    expect(malformed.res.body.errors).toEqual([expect.objectContaining({ field: 'token' })]);
  });

  it('still refuses bad fields and weak passwords with 400 before anything is sent', async () => {
    const res = await askToSignUp(uniqueEmail('iris'), 'password123');
    expect(res.status).toBe(400);
    expect(res.body.errors[0]).toMatchObject({ field: 'password' });
  });
});
