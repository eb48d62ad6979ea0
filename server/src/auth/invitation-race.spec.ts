import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, type TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

/*
 * Two firms invite the same new address and both invitations are accepted at the same moment: one
 * makes the account, the other is asked for that account's password (409 naming it), never a 500.
 */
it('accepts two firms’ invitations for one new e-mail sent at once as 200 and 409 (on password), never 500', async () => {
  for (let i = 0; i < 6; i++) {
    const firmA = await signUpFirm(t.app, 'Race Firm Alpha');
    const firmB = await signUpFirm(t.app, 'Race Firm Bravo');
    const email = uniqueEmail('newbie');
    const tokens: string[] = [];
    for (const firm of [firmA, firmB]) {
      const sent = await firm.agent.post('/api/team/invitations').set('x-csrf-token', firm.csrf()).send({ email, role: 'crew' });
      expect(sent.status).toBe(201);
    }
    for (const name of ['Alpha', 'Bravo']) {
      const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email) && (m.subject ?? '').includes(name));
      tokens.push(new URL(linkIn(mail)).searchParams.get('token')!);
    }
    const agents = await Promise.all([newAgent(t.app), newAgent(t.app)]);
    const answers = await Promise.all(
      tokens.map((token, k) =>
        agents[k].agent
          .post('/api/auth/invitations/accept')
          .set('x-csrf-token', agents[k].csrf())
          .send({ token, name: 'Nina Newbie', password: 'scratch-coat-9931' }),
      ),
    );
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses.filter((st) => st >= 500)).toEqual([]);
    if (statuses[1] === 409) {
      expect(answers.find((a) => a.status === 409)!.body.errors?.[0]?.field).toBe('password');
    }
  }
});
