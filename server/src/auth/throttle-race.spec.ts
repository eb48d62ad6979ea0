import { newAgent, signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { enrol, passwordStep, stepClock } from './second-factor/second-factor-fixtures';
import { FAILURES_PER_ACCOUNT_AND_ADDRESS } from './throttle';

/*
 * Guesses sent at the same moment: each attempt is counted before its password or code is checked,
 * so no more than the limit are checked from one address in a window, however many arrive at once.
 * (Checking first and counting after let 25 of 25 through.)
 */

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

it('checks at most 5 wrong passwords for one e-mail from one address when 25 are sent at once; the rest get 429', async () => {
  const owner = await signUpFirm(t.app, 'Throttle Race Plaster');
  const guest = await newAgent(t.app);
  const statuses = await Promise.all(
    Array.from({ length: 25 }, (_, i) =>
      guest.agent
        .post('/api/auth/signin')
        .set('x-csrf-token', guest.csrf())
        .send({ email: owner.email, password: `guess-${i}-xyz` })
        .then((r) => r.status),
    ),
  );
  expect(statuses.filter((s) => s === 401)).toHaveLength(FAILURES_PER_ACCOUNT_AND_ADDRESS);
  expect(statuses.filter((s) => s === 429)).toHaveLength(25 - FAILURES_PER_ACCOUNT_AND_ADDRESS);
});

it('checks at most 5 second-factor codes sent at once in the half-signed-in state', async () => {
  const clock = stepClock(t);
  try {
    const owner = await signUpFirm(t.app, 'Code Race Plaster');
    await enrol(owner, clock.now());
    clock.advance();
    const half = await passwordStep(t, owner.email, owner.password);
    expect(half.res.body.secondFactor).toMatchObject({ step: 'code' });
    const statuses = await Promise.all(
      Array.from({ length: 25 }, (_, i) =>
        half.agent
          .post('/api/auth/second-factor')
          .set('x-csrf-token', half.csrf())
          .send({ code: String(100000 + i * 7919).slice(0, 6) })
          .then((r) => r.status),
      ),
    );
    expect(statuses.filter((s) => s === 400).length).toBeLessThanOrEqual(FAILURES_PER_ACCOUNT_AND_ADDRESS);
    expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(25 - FAILURES_PER_ACCOUNT_AND_ADDRESS);
  } finally {
    t.setNow(null);
  }
});
