import type { ClientSummary, ProposalVersionView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { firmWithPricedEstimate } from './proposal-fixtures';
import { linkIn } from '../testing/inbox';
import { newAgent, TestServer, uniqueEmail } from '../testing/harness';

/**
 * Test set-up for the portal proposal specs (no spec of its own): a firm's priced estimate linked
 * to an inquiry at "proposal sent", a sent version with two options (A and B), and the client
 * signed in by the proposal e-mail's one-time link.
 */
export async function sentProposal(t: TestServer, firmName: string, opts: { expiresOn?: string; signIn?: boolean } = {}) {
  const f = await firmWithPricedEstimate(t, firmName);
  const inquiryId = await withTenant(t.ctx.pool, f.firmId, async (tx) => {
    const { rows } = await tx.client.query<{ id: string }>(
      `insert into inquiries (tenant_id, contact_name, email, source, stage, client_id) values ($1, 'Edwina Marl', $2, 'phone', 'proposal_sent', $3) returning id`,
      [tx.tenantId, f.clientEmail, f.clientId],
    );
    await tx.client.query(`update estimates set inquiry_id = $3 where tenant_id = $1 and id = $2`, [tx.tenantId, f.estimateId, rows[0].id]);
    return rows[0].id;
  });
  const version = await makeAndSend(t, f, opts.expiresOn ?? '2026-12-31');
  const client = await newAgent(t.app, 'portal');
  if (opts.signIn !== false) await signInByLink(client, version.link);
  return { ...f, inquiryId, version, client };
}

type Firm = Awaited<ReturnType<typeof firmWithPricedEstimate>>;

/** Makes a version, sends it and returns it with the sign-in link from its e-mail. */
export async function makeAndSend(t: TestServer, f: Firm, expiresOn = '2026-12-31') {
  const made = await f.agent.post('/api/proposals').set('x-csrf-token', f.csrf()).send({ estimateId: f.estimateId, expiresOn });
  if (made.status !== 201) throw new Error(`proposal not made: ${made.status} ${JSON.stringify(made.body)}`);
  const madeId = (made.body as ProposalVersionView).id;
  const sent = await f.agent.post(`/api/proposals/${madeId}/send`).set('x-csrf-token', f.csrf()).send({});
  if (sent.status !== 200) throw new Error(`proposal not sent: ${sent.status} ${JSON.stringify(sent.body)}`);
  const mail = await t.inbox.waitFor(
    (m) => JSON.stringify(m.to).includes(f.clientEmail) && (m.text ?? '').includes(`/portal/proposals/${madeId}`),
  );
  return { ...(sent.body as ProposalVersionView), link: linkIn(mail) };
}

export async function signInByLink(client: Awaited<ReturnType<typeof newAgent>>, link: string): Promise<void> {
  const token = new URL(link).searchParams.get('token');
  const res = await client.agent.post('/api/portal/auth/redeem').set('x-csrf-token', client.csrf()).send({ token });
  if (res.status !== 200) throw new Error(`portal sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  await client.refresh();
}

/** Another client of the same firm, with their own portal account, signed in. */
export async function otherClientOf(t: TestServer, f: Firm) {
  const email = uniqueEmail('neighbour');
  const made = (await f.agent.post('/api/clients').set('x-csrf-token', f.csrf()).send({ kind: 'homeowner', name: 'Nell Neighbour', email }))
    .body as ClientSummary;
  await withTenant(t.ctx.pool, f.firmId, (tx) =>
    tx.client.query(`insert into portal_users (tenant_id, client_id, email, name) values ($1, $2, $3, 'Nell Neighbour')`, [
      tx.tenantId,
      made.id,
      email,
    ]),
  );
  const c = await newAgent(t.app, 'portal');
  await c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email });
  await signInByLink(c, linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email))));
  return c;
}
