import request from 'supertest';
import type { MailCatcher } from './mail-catcher';

export type HttpAgent = ReturnType<typeof request.agent>;

/** A signed-in owner of a new firm on a server reached over HTTP: sign-up, the e-mailed link, then the session's CSRF token. */
export async function signUpOver(
  baseUrl: string,
  catcher: MailCatcher,
  firmName: string,
): Promise<{ agent: HttpAgent; csrf: () => string; firmId: string; cookie: string }> {
  const agent = request.agent(baseUrl);
  let token = ((await agent.get('/api/auth/session')).body as { csrfToken: string }).csrfToken;
  const email = `fault.owner.${Date.now().toString(36)}@example.test`;
  const signup = await agent
    .post('/api/auth/signup')
    .set('x-csrf-token', token)
    .send({ firmName, name: 'Olive Owner', email, password: 'qz7-xRv4-mn2W-p9k' });
  if (signup.status !== 202) throw new Error(`signup failed: ${signup.status} ${JSON.stringify(signup.body)}`);
  const mail = await catcher.waitFor((m) => m.to.includes(email) && m.text.includes('/sign-up/confirm?'));
  const link = new URL(mail.text.match(/https?:\/\/\S+/)![0]);
  const confirmed = await agent
    .post('/api/auth/signup/confirm')
    .set('x-csrf-token', token)
    .send({ token: link.searchParams.get('token') });
  if (confirmed.status !== 201) throw new Error(`signup confirm failed: ${confirmed.status} ${JSON.stringify(confirmed.body)}`);
  const session = await agent.get('/api/auth/session');
  token = (session.body as { csrfToken: string }).csrfToken;
  const firmId = (session.body as { user: { firmId: string } }).user.firmId;
  return { agent, csrf: () => token, firmId, cookie: session.request.cookies };
}
