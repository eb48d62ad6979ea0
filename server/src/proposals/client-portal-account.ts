import type { TenantTx } from '@layerbook/db';
import { badRequest, conflict } from '../http/problem';

interface PortalUserRow {
  id: string;
  client_id: string | null;
  status: 'active' | 'disabled';
  name: string;
  email: string;
}

/**
 * The client's portal sign-in, made on first send: one portal user per e-mail per firm, tied to
 * this client. 400 naming `client.email` when the client has none; 409 when the address already
 * signs in for another client or its access was switched off (the office decides, not us).
 */
export async function ensurePortalAccount(
  tx: TenantTx,
  client: { id: string; name: string; email: string },
): Promise<{ id: string; email: string; name: string }> {
  const email = client.email.trim().toLowerCase();
  if (!email)
    throw badRequest(
      [{ field: 'client.email', message: "Add the client's e-mail address before sending." }],
      'The client has no e-mail address to send the proposal to.',
    );
  await tx.client.query(
    `insert into portal_users (tenant_id, client_id, email, name) values ($1, $2, $3, $4) on conflict (tenant_id, email) do nothing`,
    [tx.tenantId, client.id, email, client.name],
  );
  const row = (
    await tx.client.query<PortalUserRow>(
      `select id, client_id, status, name, email from portal_users where tenant_id = $1 and email = $2 for update`,
      [tx.tenantId, email],
    )
  ).rows[0];
  if (row.client_id === null)
    await tx.client.query(`update portal_users set client_id = $3 where tenant_id = $1 and id = $2`, [tx.tenantId, row.id, client.id]);
  else if (row.client_id !== client.id)
    throw conflict('This e-mail address already signs in to the portal for another client.', [
      { field: 'client.email', message: 'Give this client its own e-mail address.' },
    ]);
  if (row.status !== 'active')
    throw conflict("This client's portal access is switched off. Turn it back on before sending.", [
      { field: 'client.email', message: 'Portal access is switched off.' },
    ]);
  return { id: row.id, email: row.email, name: row.name };
}
