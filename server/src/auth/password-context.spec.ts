import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

const tokenFrom = (url: string) => new URL(url).searchParams.get('token')!;

function expectPasswordRefused(res: { status: number; headers: Record<string, string>; body: { errors?: unknown } }) {
  expect(res.status).toBe(400);
  expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
  expect(res.body.errors).toEqual([{ field: 'password', message: expect.stringMatching(/your name, your e-mail or your firm/) }]);
}

describe('a new password may not contain the person’s e-mail, name or firm name (OWASP ASVS 5.0 §6.2)', () => {
  it.each([
    ['the firm name', 'Gildersleeve Plaster', 'gildersleeve-9-walls'],
    ['the person’s name', 'Harrow Fresco', 'ROSALIND-and-the-walls'],
    ['the e-mail', 'Harrow Fresco', '{email}'],
  ])('sign-up refuses %s and creates nothing', async (_what, firmName, password) => {
    const { agent, csrf } = await newAgent(t.app);
    const email = uniqueEmail('rosalind');
    const res = await agent
      .post('/api/auth/signup')
      .set('x-csrf-token', csrf())
      .send({ firmName, name: 'Rosalind Thackeray', email, password: password.replace('{email}', email) });
    expectPasswordRefused(res);
    const signin = await agent.post('/api/auth/signin').set('x-csrf-token', csrf()).send({ email, password: 'anything-at-all-1' });
    expect(signin.status).toBe(401);
  });

  it('invitation acceptance refuses the firm name and the invitee’s name', async () => {
    const owner = await signUpFirm(t.app, 'Ashcombe Scagliola');
    const email = uniqueEmail('invitee');
    await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email, role: 'office' });
    const token = tokenFrom(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email))));
    const guest = await newAgent(t.app);
    const accept = (name: string, password: string) =>
      guest.agent.post('/api/auth/invitations/accept').set('x-csrf-token', guest.csrf()).send({ token, name, password });

    expectPasswordRefused(await accept('Tamsin Orde', 'ashcombe-ceilings-1'));
    expectPasswordRefused(await accept('Tamsin Orde', 'tamsin-ceilings-1'));
    expect((await accept('Tamsin Orde', 'marmorino-ceilings-1')).status).toBe(200);
  });

  it('a password reset refuses the firm name and leaves the link usable', async () => {
    const owner = await signUpFirm(t.app, 'Pennyroyal Limewash');
    const { agent, csrf } = await newAgent(t.app);
    await agent.post('/api/auth/password-reset').set('x-csrf-token', csrf()).send({ email: owner.email });
    const token = tokenFrom(
      linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(owner.email) && /reset/i.test(m.subject ?? ''))),
    );
    const complete = (password: string) =>
      agent.post('/api/auth/password-reset/complete').set('x-csrf-token', csrf()).send({ token, password });

    expectPasswordRefused(await complete('PENNYROYAL-again-7'));
    expectPasswordRefused(await complete('olive-and-glaze-7'));
    expect((await complete('marmorino-again-7')).status).toBe(200);
  });
});
