import type { ClientSummary, FinishSystemView, SiteView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { addProduct, glazeLayer, joinAs, MEDIUM, primerLayer, PRIMER, TINT } from '../library/library-fixtures';
import { jpegImage } from '../files/test-images';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, TestServer, uniqueEmail } from '../testing/harness';

/** Test set-up for the sample-board specs (no spec of its own). */

export type Firm = Awaited<ReturnType<typeof signUpFirm>>;
type Agent = Pick<Firm, 'agent' | 'csrf'>;
export type ClientAgent = Awaited<ReturnType<typeof newAgent>>;

/** A firm with a two-layer finish system (primer, then a glaze mixed 1:4) and a client with a site. */
export async function firmWithFinish(t: TestServer, firmName = 'Ochre Lane Finishes') {
  const o = await signUpFirm(t.app, firmName);
  const primer = await addProduct(o, PRIMER);
  const tint = await addProduct(o, TINT);
  const medium = await addProduct(o, MEDIUM);
  const system = await o.agent
    .post('/api/library/systems')
    .set('x-csrf-token', o.csrf())
    .send({ name: 'Antiqued glaze over primer', description: 'Warm umber glaze', layers: [primerLayer(primer), glazeLayer(tint, medium)] });
  if (system.status !== 201) throw new Error(`system not made: ${system.status} ${JSON.stringify(system.body)}`);
  const { clientId, siteId, email } = await addClient(o, 'Wren Halloway');
  return {
    ...o,
    systemId: (system.body as FinishSystemView).id,
    productIds: { primer, tint, medium },
    clientId,
    siteId,
    clientEmail: email,
  };
}

export async function addClient(o: Agent, name: string) {
  const email = uniqueEmail('client');
  const client = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name, email });
  if (client.status !== 201) throw new Error(`client not made: ${client.status} ${JSON.stringify(client.body)}`);
  const clientId = (client.body as ClientSummary).id;
  const site = await o.agent
    .post(`/api/clients/${clientId}/sites`)
    .set('x-csrf-token', o.csrf())
    .send({ addressLine1: '14 Kiln Row', city: 'Ashford Vale' });
  return { clientId, siteId: (site.body as SiteView).id, email };
}

/** Gives the client record a portal login and signs it in by the e-mailed one-time link. */
export async function signInClient(
  t: TestServer,
  firmId: string,
  clientId: string,
  email: string,
  name = 'Wren Halloway',
): Promise<ClientAgent> {
  await withTenant(t.ctx.pool, firmId, (tx) =>
    tx.client.query(`insert into portal_users (tenant_id, client_id, email, name) values ($1, $2, $3, $4) on conflict do nothing`, [
      tx.tenantId,
      clientId,
      email,
      name,
    ]),
  );
  const c = await newAgent(t.app, 'portal');
  await c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email });
  const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email) && (m.subject ?? '').startsWith('Your sign-in link'));
  const token = new URL(linkIn(mail)).searchParams.get('token');
  const res = await c.agent.post('/api/portal/auth/redeem').set('x-csrf-token', c.csrf()).send({ token });
  if (res.status !== 200) throw new Error(`portal sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  await c.refresh();
  return c;
}

export async function makeBoard(o: Agent, body: Record<string, unknown>) {
  const res = await o.agent.post('/api/samples').set('x-csrf-token', o.csrf()).send(body);
  if (res.status !== 201) throw new Error(`board not made: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: string; round: number; status: string };
}

export const post = (a: Agent, url: string, body: object = {}) => a.agent.post(url).set('x-csrf-token', a.csrf()).send(body);

export const uploadBoardPhoto = async (a: Agent, boardId: string, file?: { bytes: Buffer; name: string }) =>
  a.agent
    .post(`/api/samples/${boardId}/photos`)
    .set('x-csrf-token', a.csrf())
    .attach('file', file?.bytes ?? (await jpegImage()), file?.name ?? 'board.jpg');

export { joinAs };
