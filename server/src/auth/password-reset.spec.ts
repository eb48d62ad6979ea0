import { eq, passwordResets, users, withGlobal } from '@layerbook/db';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { LINKS_PER_HOUR, RESET_MINUTES } from './password-reset';
import { enrol, invite, passwordStep, stepClock } from './second-factor/second-factor-fixtures';
import { minutesFromNow, newToken } from './tokens';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterEach(() => t.setNow(null));
afterAll(() => t.stop());

/** Asks for a reset link and returns the token of the e-mail it sent (not one seen before). */
async function askForReset(email: string, seen: readonly string[] = []): Promise<string> {
  const { agent, csrf } = await newAgent(t.app);
  expect((await agent.post('/api/auth/password-reset').set('x-csrf-token', csrf()).send({ email })).status).toBe(202);
  const mail = await t.inbox.waitFor(
    (m) => JSON.stringify(m.to ?? '').includes(email) && /reset/i.test(m.subject ?? '') && !seen.some((s) => linkIn(m).includes(s)),
  );
  return new URL(linkIn(mail)).searchParams.get('token')!;
}

async function completeReset(token: string, password: string) {
  const { agent, csrf } = await newAgent(t.app);
  return agent.post('/api/auth/password-reset/complete').set('x-csrf-token', csrf()).send({ token, password });
}

describe('password reset links: only the newest works, and a completed reset voids every other', () => {
  it('voids an older link when a newer one is asked for', async () => {
    const { email } = await signUpFirm(t.app);
    const first = await askForReset(email);
    const second = await askForReset(email, [first]);
    expect(second).not.toBe(first);

    const old = await completeReset(first, 'a-brand-new-pass-42');
    expect(old.status).toBe(410);
    expect(old.headers['content-type']).toMatch(/application\/problem\+json/);
    expect((await completeReset(second, 'a-brand-new-pass-42')).status).toBe(200);
  });

  it('voids every other open link of the person once a reset is completed', async () => {
    const { email } = await signUpFirm(t.app);
    const token = await askForReset(email);
    // A second open link, as a race between two requests could leave behind.
    const other = newToken();
    await withGlobal(t.ctx.pool, async (tx) => {
      const [user] = await tx.db.select({ id: users.id }).from(users).where(eq(users.email, email));
      await tx.db
        .insert(passwordResets)
        .values({ userId: user.id, tokenHash: other.hash, expiresAt: minutesFromNow(t.ctx.now(), RESET_MINUTES) });
    });

    expect((await completeReset(token, 'a-brand-new-pass-42')).status).toBe(200);
    expect((await completeReset(other.token, 'a-brand-new-pass-43')).status).toBe(410);
  });
});

describe('reset links for one person', () => {
  it('stop after a few an hour, however many are asked for (the answer is the same 202)', async () => {
    const { email } = await signUpFirm(t.app);
    const seen: string[] = [];
    for (let i = 0; i < LINKS_PER_HOUR; i++) seen.push(await askForReset(email, seen));
    const { agent, csrf } = await newAgent(t.app);
    expect((await agent.post('/api/auth/password-reset').set('x-csrf-token', csrf()).send({ email })).status).toBe(202);
    // the lookup runs after the answer: give it time, then count the person's links
    await new Promise((resolve) => setTimeout(resolve, 300));
    const rows = await withGlobal(t.ctx.pool, async (tx) => {
      const [user] = await tx.db.select({ id: users.id }).from(users).where(eq(users.email, email));
      return tx.db.select({ id: passwordResets.id }).from(passwordResets).where(eq(passwordResets.userId, user.id));
    });
    expect(rows).toHaveLength(LINKS_PER_HOUR);
  });
});

describe('a completed reset ends every session of the person', () => {
  it('ends a half-signed-in one too (the step before the second factor): the old password cannot go on after the reset', async () => {
    // A firm that requires a second factor; its office members have none yet, so the password leads to setting one up.
    const clock = stepClock(t);
    const owner = await signUpFirm(t.app);
    await enrol(owner, clock.now());
    expect((await owner.agent.put('/api/auth/second-factor/firm').set('x-csrf-token', owner.csrf()).send({ required: true })).status).toBe(
      200,
    );
    const office = await invite(t, owner, 'office');
    const colleague = await invite(t, owner, 'office');

    // Someone with the member's old password reaches the set-up step; so does a colleague, on their own account.
    const holder = await passwordStep(t, office.email, office.password);
    expect(holder.res.body).toMatchObject({ user: null, secondFactor: { step: 'enrol' } });
    const other = await passwordStep(t, colleague.email, colleague.password);

    expect((await completeReset(await askForReset(office.email), 'fresh-quartz-tiles-91')).status).toBe(200);

    // The half state went with the old password: no set-up, nothing signed in.
    const start = (who: typeof holder) => who.agent.post('/api/auth/second-factor/enrolment').set('x-csrf-token', who.csrf()).send({});
    expect((await start(holder)).status).toBe(401);
    expect((await holder.agent.get('/api/auth/session')).body).toMatchObject({ user: null, secondFactor: null });
    // Only that person's: the colleague's half state goes on.
    expect((await start(other)).status).toBe(201);
  });
});
