import type { SecondFactorEnrolled, SecondFactorEnrolment, StaffSession } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { linkIn } from '../../testing/inbox';
import { newAgent, uniqueEmail, type signUpFirm, type TestServer } from '../../testing/harness';
import { codeAt, STEP_SECONDS } from './totp';

export type Owner = Awaited<ReturnType<typeof signUpFirm>>;
/** Anyone with an agent and a CSRF token (a signed-in owner, a member after sign-in). */
export type Signed = Pick<Awaited<ReturnType<typeof newAgent>>, 'agent' | 'csrf'>;

/** A test clock that moves a whole TOTP step at a time (a code is taken once per step). */
export function stepClock(t: TestServer) {
  let now = new Date(Math.floor(Date.now() / 1000 / STEP_SECONDS) * STEP_SECONDS * 1000 + 5_000);
  t.setNow(now);
  return {
    now: () => now,
    advance(ms = STEP_SECONDS * 1000) {
      now = new Date(now.getTime() + ms);
      t.setNow(now);
    },
  };
}

/** Sets up a second factor for a signed-in person (who proves their password first); answers the secret and the recovery codes. */
export async function enrol(who: Signed & { readonly password: string }, now: Date): Promise<{ secret: string; codes: readonly string[] }> {
  const started = await who.agent
    .post('/api/auth/second-factor/enrolment')
    .set('x-csrf-token', who.csrf())
    .send({ password: who.password });
  if (started.status !== 201) throw new Error(`enrolment failed: ${started.status} ${JSON.stringify(started.body)}`);
  const secret = (started.body as SecondFactorEnrolment).secretGroups.join('');
  const confirmed = await who.agent
    .post('/api/auth/second-factor/enrolment/confirm')
    .set('x-csrf-token', who.csrf())
    .send({ code: codeAt(secret, now) });
  if (confirmed.status !== 200) throw new Error(`confirm failed: ${confirmed.status} ${JSON.stringify(confirmed.body)}`);
  return { secret, codes: (confirmed.body as SecondFactorEnrolled).codes };
}

/** The password step on a fresh agent (which keeps the anonymous CSRF token it answers). */
export async function passwordStep(t: TestServer, email: string, password: string) {
  const who = await newAgent(t.app);
  const res = await who.agent.post('/api/auth/signin').set('x-csrf-token', who.csrf()).send({ email, password });
  const token = (res.body as Partial<StaffSession>).csrfToken ?? who.csrf();
  return { ...who, res, csrf: () => token };
}

/** Invites a member and accepts for them; answers their e-mail and password. */
export async function invite(t: TestServer, owner: Owner, role: 'office' | 'crew') {
  const email = uniqueEmail(role);
  const password = 'member-password-2026';
  await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email, role });
  const token = new URL(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email)))).searchParams.get('token')!;
  const member = await newAgent(t.app);
  await member.agent
    .post('/api/auth/invitations/accept')
    .set('x-csrf-token', member.csrf())
    .send({ token, name: `A ${role}`, password });
  return { email, password };
}

/** The firm's audit entries of one action, oldest first. */
export async function auditOf(t: TestServer, firmId: string, action: string) {
  return withTenant(t.ctx.pool, firmId, async (tx) => {
    const { rows } = await tx.client.query<{ actor_user_id: string; data: Record<string, unknown> }>(
      'select actor_user_id, data from audit_log where action = $1 order by created_at, id',
      [action],
    );
    return rows;
  });
}
