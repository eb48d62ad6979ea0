import type { SecondFactorEnrolment } from '@layerbook/contracts';
import { linkIn } from '../../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer } from '../../testing/harness';
import { auditOf, enrol, passwordStep, stepClock } from './second-factor-fixtures';
import { codeAt } from './totp';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterEach(() => t.setNow(null));
afterAll(() => t.stop());

const sidOf = (res: { headers: Record<string, unknown> }) => {
  const cookies = res.headers['set-cookie'];
  return (Array.isArray(cookies) ? cookies.join(';') : '').match(/lb\.sid=([^;]+)/)?.[1];
};

describe('setting up a second factor', () => {
  it('answers the URI, the QR code and the grouped secret, turns on with a right code and shows ten codes once', async () => {
    const clock = stepClock(t);
    const owner = await signUpFirm(t.app);
    const status = await owner.agent.get('/api/auth/second-factor');
    expect(status.body).toEqual({ enrolled: false, enrolledAt: null, recoveryCodesLeft: 0, firmRequires: false });

    // Signed in, the password first (as for renewing codes or turning it off): a session alone is not enough.
    const start = (body: object) => owner.agent.post('/api/auth/second-factor/enrolment').set('x-csrf-token', owner.csrf()).send(body);
    const bare = await start({});
    expect(bare.status).toBe(400);
    expect(bare.body.errors).toEqual([{ field: 'password', message: 'Enter your password.' }]);
    const wrongPassword = await start({ password: 'not-my-password' });
    expect(wrongPassword.status).toBe(400);
    expect(wrongPassword.body.errors).toEqual([expect.objectContaining({ field: 'password' })]);
    expect((await start({ password: owner.password, extra: 1 })).status).toBe(400);
    expect((await owner.agent.get('/api/auth/second-factor')).body.enrolled).toBe(false);
    const started = await start({ password: owner.password });
    expect(started.status).toBe(201);
    const body = started.body as SecondFactorEnrolment;
    const secret = body.secretGroups.join('');
    expect(body.secretGroups.every((g) => /^[A-Z2-7]{4}$/.test(g))).toBe(true);
    expect(body.otpauthUri).toBe(
      `otpauth://totp/Layerbook:${encodeURIComponent(owner.email)}?secret=${secret}&period=30&digits=6&algorithm=SHA1&issuer=Layerbook`,
    );
    expect(body.qrDataUrl).toMatch(/^data:image\/png;base64,/);

    const confirm = (code: string) =>
      owner.agent.post('/api/auth/second-factor/enrolment/confirm').set('x-csrf-token', owner.csrf()).send({ code });
    const wrong = await confirm(codeAt(secret, new Date(clock.now().getTime() - 5 * 60_000)));
    expect(wrong.status).toBe(400);
    expect(wrong.body.errors).toEqual([expect.objectContaining({ field: 'code' })]);
    expect((await confirm('12ab56')).body.errors[0].field).toBe('code');

    const right = await confirm(codeAt(secret, clock.now()));
    expect(right.status).toBe(200);
    expect(right.body.user.email).toBe(owner.email);
    expect(right.body.codes).toHaveLength(10);
    expect(new Set(right.body.codes).size).toBe(10);

    // Kept sealed and hashed: neither the secret nor a code is in the database as given.
    const { rows } = await t.ctx.pool.query<{ secret_sealed: string }>('select secret_sealed from user_second_factors where user_id = $1', [
      owner.userId,
    ]);
    expect(rows[0].secret_sealed).not.toContain(secret);
    const stored = await t.ctx.pool.query<{ code_hash: string }>('select code_hash from user_recovery_codes where user_id = $1', [
      owner.userId,
    ]);
    expect(stored.rows).toHaveLength(10);
    for (const code of right.body.codes as string[]) expect(stored.rows.map((r) => r.code_hash)).not.toContain(code.replace('-', ''));

    const after = await owner.agent.get('/api/auth/second-factor');
    expect(after.body).toMatchObject({ enrolled: true, recoveryCodesLeft: 10 });
    expect(await auditOf(t, owner.firmId, 'staff.secondFactorEnrolled')).toEqual([
      expect.objectContaining({ actor_user_id: owner.userId }),
    ]);
    // A second set-up waits until this one is turned off.
    expect((await start({ password: owner.password })).status).toBe(409);
  });
});

describe('signing in with a second factor', () => {
  it('holds a half state that reads nothing, then signs in with a code on a new session id; a code works once', async () => {
    const clock = stepClock(t);
    const owner = await signUpFirm(t.app);
    const { secret } = await enrol(owner, clock.now());
    clock.advance();

    const half = await passwordStep(t, owner.email, owner.password);
    expect(half.res.status).toBe(200);
    expect(half.res.body).toMatchObject({ user: null, secondFactor: { step: 'code' } });
    expect(Date.parse(half.res.body.secondFactor.expiresAt) - clock.now().getTime()).toBe(5 * 60_000);
    const halfSid = sidOf(half.res);
    expect(halfSid).toBeTruthy();

    const session = await half.agent.get('/api/auth/session');
    expect(session.body).toMatchObject({ user: null, secondFactor: { step: 'code' } });
    for (const path of ['/api/firm', '/api/clients', '/api/jobs', '/api/invoices', '/api/team/members', '/api/auth/second-factor']) {
      expect([path, (await half.agent.get(path)).status]).toEqual([path, 401]);
    }
    expect((await half.agent.post('/api/auth/second-factor/enrolment').set('x-csrf-token', half.csrf()).send({})).status).toBe(401);

    const send = (code: string) => half.agent.post('/api/auth/second-factor').set('x-csrf-token', half.csrf()).send({ code });
    const wrong = await send('000000');
    expect(wrong.status).toBe(400);
    expect(wrong.body.errors[0].field).toBe('code');
    const code = codeAt(secret, clock.now());
    const done = await send(code);
    expect(done.status).toBe(200);
    expect(done.body.user.email).toBe(owner.email);
    expect(done.body.secondFactor).toBeNull();
    expect(sidOf(done)).not.toBe(halfSid);
    expect((await half.agent.get('/api/firm')).status).toBe(200);
    const signIns = await auditOf(t, owner.firmId, 'staff.signedIn');
    expect(signIns.at(-1)?.data).toEqual({ secondFactor: true, secondFactorBy: 'app' });

    // The same code (the same step) is refused on the next sign-in; the next step's code works.
    const again = await passwordStep(t, owner.email, owner.password);
    const reused = await again.agent.post('/api/auth/second-factor').set('x-csrf-token', again.csrf()).send({ code });
    expect(reused.status).toBe(400);
    clock.advance();
    const next = await again.agent
      .post('/api/auth/second-factor')
      .set('x-csrf-token', again.csrf())
      .send({ code: codeAt(secret, clock.now()) });
    expect(next.status).toBe(200);
  });

  it('takes a recovery code once, however it is typed', async () => {
    const clock = stepClock(t);
    const owner = await signUpFirm(t.app);
    const { codes } = await enrol(owner, clock.now());
    const typed = ` ${codes[3].toUpperCase().replace('-', ' ')} `;
    const first = await passwordStep(t, owner.email, owner.password);
    const used = await first.agent.post('/api/auth/second-factor').set('x-csrf-token', first.csrf()).send({ code: typed });
    expect(used.status).toBe(200);
    expect((await auditOf(t, owner.firmId, 'staff.signedIn')).at(-1)?.data).toEqual({ secondFactor: true, secondFactorBy: 'recoveryCode' });
    expect((await first.agent.get('/api/auth/second-factor')).body.recoveryCodesLeft).toBe(9);

    const second = await passwordStep(t, owner.email, owner.password);
    expect((await second.agent.post('/api/auth/second-factor').set('x-csrf-token', second.csrf()).send({ code: typed })).status).toBe(400);

    // New codes need proof, not the session alone (ASVS 5.0 7.5.1: re-authenticate before changing an authentication factor)...
    const renew = (body: object) =>
      first.agent.post('/api/auth/second-factor/recovery-codes').set('x-csrf-token', used.body.csrfToken).send(body);
    expect((await renew({})).status).toBe(400);
    const wrong = await renew({ password: 'not-the-password' });
    expect([wrong.status, wrong.body.errors?.[0]?.field]).toEqual([400, 'password']);
    // ...and replace the old ones.
    const renewed = await renew({ password: owner.password });
    expect(renewed.body.codes).toHaveLength(10);
    expect((await second.agent.post('/api/auth/second-factor').set('x-csrf-token', second.csrf()).send({ code: codes[4] })).status).toBe(
      400,
    );
    const fresh = await second.agent
      .post('/api/auth/second-factor')
      .set('x-csrf-token', second.csrf())
      .send({ code: renewed.body.codes[0] });
    expect(fresh.status).toBe(200);
    expect(await auditOf(t, owner.firmId, 'staff.recoveryCodesRenewed')).toHaveLength(1);
  });

  it('ends the half state after five minutes and throttles wrong codes like passwords', async () => {
    const clock = stepClock(t);
    const owner = await signUpFirm(t.app);
    const { secret } = await enrol(owner, clock.now());
    clock.advance();
    const late = await passwordStep(t, owner.email, owner.password);
    clock.advance(5 * 60_000 + 1);
    const expired = await late.agent
      .post('/api/auth/second-factor')
      .set('x-csrf-token', late.csrf())
      .send({ code: codeAt(secret, clock.now()) });
    expect(expired.status).toBe(401);
    expect((await late.agent.get('/api/auth/session')).body.secondFactor).toBeNull();

    const guess = await passwordStep(t, owner.email, owner.password);
    for (let i = 0; i < 5; i++) {
      expect(
        (
          await guess.agent
            .post('/api/auth/second-factor')
            .set('x-csrf-token', guess.csrf())
            .send({ code: `12345${i}` })
        ).status,
      ).toBe(400);
    }
    const throttled = await guess.agent
      .post('/api/auth/second-factor')
      .set('x-csrf-token', guess.csrf())
      .send({ code: codeAt(secret, clock.now()) });
    expect(throttled.status).toBe(429);
  });
});

describe('a password reset', () => {
  it('still asks an enrolled person for the code before signing them in', async () => {
    const clock = stepClock(t);
    const owner = await signUpFirm(t.app);
    const { secret } = await enrol(owner, clock.now());
    const asked = await newAgent(t.app);
    await asked.agent.post('/api/auth/password-reset').set('x-csrf-token', asked.csrf()).send({ email: owner.email });
    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to ?? '').includes(owner.email) && /reset/i.test(m.subject ?? ''));
    const token = new URL(linkIn(mail)).searchParams.get('token')!;
    const reset = await asked.agent
      .post('/api/auth/password-reset/complete')
      .set('x-csrf-token', asked.csrf())
      .send({ token, password: 'a-brand-new-pass-42' });
    expect(reset.status).toBe(200);
    expect(reset.body).toMatchObject({ user: null, secondFactor: { step: 'code' } });
    expect((await asked.agent.get('/api/firm')).status).toBe(401);
    clock.advance();
    const done = await asked.agent
      .post('/api/auth/second-factor')
      .set('x-csrf-token', String(reset.body.csrfToken))
      .send({ code: codeAt(secret, clock.now()) });
    expect(done.status).toBe(200);
    expect(done.body.user.email).toBe(owner.email);
  });
});
