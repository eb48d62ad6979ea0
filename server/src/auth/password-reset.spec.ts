import { eq, passwordResets, users, withGlobal } from '@layerbook/db';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { LINKS_PER_HOUR, RESET_MINUTES } from './password-reset';
import { minutesFromNow, newToken } from './tokens';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
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
