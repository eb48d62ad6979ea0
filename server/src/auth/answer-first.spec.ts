import * as passwordReset from './password-reset';
import * as portalAuth from './portal-auth';
import { newAgent, startTestServer, type TestServer } from '../testing/harness';

/*
 * A request for a reset link or a portal sign-in link is answered before the address is looked up,
 * so the time to answer is the same whether or not the address has an account (no enumeration by
 * timing; OWASP ASVS 5.0 6.3.8). Shown without a clock: the work is held until after the answer.
 */

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

function held<T extends object, K extends keyof T>(module: T, name: K) {
  let release!: () => void;
  const gate = new Promise<void>((resolve) => (release = resolve));
  let started = false;
  const spy = jest.spyOn(module, name as never).mockImplementation((() => {
    started = true;
    return gate;
  }) as never);
  return { release, started: () => started, restore: () => spy.mockRestore() };
}

/** Posts the request with the lookup held, and shows it answered 202 while the lookup had only started. */
async function answeredFirst(work: ReturnType<typeof held>, ask: () => Promise<{ status: number }>): Promise<void> {
  try {
    expect((await ask()).status).toBe(202);
    // the answer is in the caller's hands; the lookup runs after it, held here until released
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(work.started()).toBe(true);
  } finally {
    work.release();
    work.restore();
  }
}

it('answers a password reset request with 202 before its lookup runs', async () => {
  const guest = await newAgent(t.app);
  await answeredFirst(held(passwordReset, 'requestPasswordReset'), () =>
    guest.agent.post('/api/auth/password-reset').set('x-csrf-token', guest.csrf()).send({ email: 'who@example.test' }),
  );
});

it('answers a portal sign-in link request with 202 before its lookup runs', async () => {
  const c = await newAgent(t.app, 'portal');
  await answeredFirst(held(portalAuth, 'requestPortalLink'), () =>
    c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email: 'who@example.test' }),
  );
});
