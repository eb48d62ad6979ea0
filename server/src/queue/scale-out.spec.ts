import request from 'supertest';
import { signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

// ARCHITECTURE.md: any number of web and worker processes share one database; pg-boss hands each
// job to one worker (SKIP LOCKED), so nothing is done twice. Two full app instances stand in for
// two web processes, each with its own workers (and its own mail catcher).
let a: TestServer;
let b: TestServer;
beforeAll(async () => {
  a = await startTestServer();
  b = await startTestServer();
});
afterAll(async () => {
  await a.stop();
  await b.stop();
});

it('two web and two worker processes share one database without double work', async () => {
  const owner = await signUpFirm(a.app, 'Scale Plaster');
  // The session lives in PostgreSQL, so the same cookie works on the other process.
  const cookie = (await owner.agent.get('/api/auth/session')).request.cookies;
  const onB = await request(b.app).get('/api/auth/session').set('cookie', cookie);
  expect(onB.body.user?.firmName).toBe('Scale Plaster');

  const emails = Array.from({ length: 12 }, () => uniqueEmail('scale'));
  for (const [i, email] of emails.entries()) {
    const app = i % 2 ? b.app : a.app;
    const token = (await request(app).get('/api/auth/session').set('cookie', cookie)).body.csrfToken;
    const res = await request(app)
      .post('/api/team/invitations')
      .set('cookie', cookie)
      .set('x-csrf-token', token)
      .send({ email, role: 'crew' });
    expect(res.status).toBe(201);
  }
  const arrived = (email: string) => [...a.inbox.messages, ...b.inbox.messages].filter((m) => JSON.stringify(m.to).includes(email)).length;
  await Promise.all(
    emails.map((email) =>
      Promise.race([
        a.inbox.waitFor((m) => JSON.stringify(m.to).includes(email)),
        b.inbox.waitFor((m) => JSON.stringify(m.to).includes(email)),
      ]),
    ),
  );
  // Let any duplicate that was going to happen arrive: another round of jobs through both workers.
  const marker = uniqueEmail('marker');
  const token = (await request(a.app).get('/api/auth/session').set('cookie', cookie)).body.csrfToken;
  await request(a.app).post('/api/team/invitations').set('cookie', cookie).set('x-csrf-token', token).send({ email: marker, role: 'crew' });
  await Promise.race([
    a.inbox.waitFor((m) => JSON.stringify(m.to).includes(marker)),
    b.inbox.waitFor((m) => JSON.stringify(m.to).includes(marker)),
  ]);
  expect(emails.map(arrived)).toEqual(emails.map(() => 1));
  // Both processes' workers took part.
  expect(a.inbox.messages.length).toBeGreaterThan(0);
  expect(b.inbox.messages.length).toBeGreaterThan(0);
});
