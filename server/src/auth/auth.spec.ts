import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('sign-up, sign-in and sign-out', () => {
  it('creates a firm with its owner and signs them in', async () => {
    const { agent } = await signUpFirm(t.app, 'Quarry Lane Finishes');
    const res = await agent.get('/api/auth/session');
    expect(res.body.user).toMatchObject({ role: 'owner', firmName: 'Quarry Lane Finishes', name: 'Olive Owner' });
  });

  it('answers 400 problem+json naming each bad field, and refuses unknown fields', async () => {
    const { agent, csrf } = await newAgent(t.app);
    const res = await agent
      .post('/api/auth/signup')
      .set('x-csrf-token', csrf())
      .send({ firmName: '', name: 'A', email: 'not-an-email', password: 'short', admin: true });
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
    const fields = res.body.errors.map((e: { field: string }) => e.field).sort();
    expect(fields).toEqual(['admin', 'email', 'firmName', 'password']);
  });

  it('refuses a common password', async () => {
    const { agent, csrf } = await newAgent(t.app);
    const res = await agent
      .post('/api/auth/signup')
      .set('x-csrf-token', csrf())
      .send({ firmName: 'Firm', name: 'A', email: uniqueEmail(), password: 'password123' });
    expect(res.status).toBe(400);
    expect(res.body.errors[0]).toMatchObject({ field: 'password' });
  });

  it('signs in with the right password, regenerating the session id, and out again', async () => {
    const { email, password } = await signUpFirm(t.app);
    const { agent, csrf } = await newAgent(t.app);
    const before = (await agent.get('/api/auth/session')).headers['set-cookie'];
    const res = await agent.post('/api/auth/signin').set('x-csrf-token', csrf()).send({ email, password });
    expect(res.status).toBe(200);
    expect(res.body.user.email).toBe(email);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/lb\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toEqual(String(before));
    const out = await agent.post('/api/auth/signout').set('x-csrf-token', res.body.csrfToken).send({});
    expect(out.status).toBe(200);
    expect((await agent.get('/api/auth/session')).body.user).toBeNull();
  });

  it('gives the same generic message for a wrong password and an unknown e-mail', async () => {
    const { email } = await signUpFirm(t.app);
    const { agent, csrf } = await newAgent(t.app);
    const wrong = await agent.post('/api/auth/signin').set('x-csrf-token', csrf()).send({ email, password: 'not-the-password' });
    const unknown = await agent
      .post('/api/auth/signin')
      .set('x-csrf-token', csrf())
      .send({ email: uniqueEmail(), password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.detail).toBe(unknown.body.detail);
  });

  it('throttles repeated failures for an e-mail alike whether or not it has an account (no lock, no 423)', async () => {
    const { email, password } = await signUpFirm(t.app);
    const unknown = uniqueEmail();
    const { agent, csrf } = await newAgent(t.app);
    const attempt = (e: string, p: string) => agent.post('/api/auth/signin').set('x-csrf-token', csrf()).send({ email: e, password: p });
    for (let i = 0; i < 5; i++) {
      const known = await attempt(email, 'wrong-password-x');
      const none = await attempt(unknown, 'wrong-password-x');
      expect([known.status, none.status]).toEqual([401, 401]);
      expect(known.body).toEqual({ ...none.body, requestId: known.body.requestId });
    }
    const knownThrottled = await attempt(email, password);
    const unknownThrottled = await attempt(unknown, 'wrong-password-x');
    expect([knownThrottled.status, unknownThrottled.status]).toEqual([429, 429]);
    expect(knownThrottled.body).toEqual({ ...unknownThrottled.body, requestId: knownThrottled.body.requestId });
  });

  it('refuses a state-changing request without the CSRF token', async () => {
    const { agent } = await newAgent(t.app);
    const res = await agent.post('/api/auth/signin').send({ email: uniqueEmail(), password: 'whatever-123' });
    expect(res.status).toBe(403);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
  });

  it('answers malformed JSON with 400 problem+json', async () => {
    const { agent, csrf } = await newAgent(t.app);
    const res = await agent.post('/api/auth/signin').set('x-csrf-token', csrf()).set('content-type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
    expect(res.body.errors[0].field).toBe('(body)');
  });
});

describe('password reset by e-mailed link', () => {
  it('sends a single-use link that sets a new password, and signs out every other session', async () => {
    const { email, agent: elsewhere } = await signUpFirm(t.app);
    expect((await elsewhere.get('/api/auth/session')).body.user?.email).toBe(email);
    const { agent, csrf } = await newAgent(t.app);
    expect((await agent.post('/api/auth/password-reset').set('x-csrf-token', csrf()).send({ email })).status).toBe(202);
    const mail = await t.inbox.waitFor((m) => m.to !== undefined && JSON.stringify(m.to).includes(email) && /reset/i.test(m.subject ?? ''));
    expect(mail.html).toBeTruthy();
    const token = new URL(linkIn(mail)).searchParams.get('token')!;
    const done = await agent
      .post('/api/auth/password-reset/complete')
      .set('x-csrf-token', csrf())
      .send({ token, password: 'a-brand-new-pass-42' });
    expect(done.status).toBe(200);
    expect(done.body.user.email).toBe(email);
    const again = await agent
      .post('/api/auth/password-reset/complete')
      .set('x-csrf-token', done.body.csrfToken)
      .send({ token, password: 'a-brand-new-pass-43' });
    expect(again.status).toBe(410);
    expect((await elsewhere.get('/api/auth/session')).body.user).toBeNull();
    expect((await elsewhere.get('/api/team/members')).status).toBe(401);
  });

  it('answers the same for an unknown e-mail', async () => {
    const { agent, csrf } = await newAgent(t.app);
    expect((await agent.post('/api/auth/password-reset').set('x-csrf-token', csrf()).send({ email: uniqueEmail() })).status).toBe(202);
  });
});

describe('sign-in rate limit', () => {
  it('answers 429 after too many attempts from one address', async () => {
    const limited = await startTestServer({ SIGN_IN_RATE_LIMIT: '3' });
    try {
      const { agent, csrf } = await newAgent(limited.app);
      const statuses: number[] = [];
      for (let i = 0; i < 4; i++) {
        statuses.push(
          (await agent.post('/api/auth/signin').set('x-csrf-token', csrf()).send({ email: uniqueEmail(), password: 'whatever-123' }))
            .status,
        );
      }
      expect(statuses).toEqual([401, 401, 401, 429]);
    } finally {
      await limited.stop();
    }
  });
});
