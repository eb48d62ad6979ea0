import type { ClientMatch } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { findClientMatches } from '../clients/merge';
import { notFound } from '../http/problem';

/** Clients of the firm that may be the inquiry's prospect: same e-mail, phone digits or name. */
export async function clientMatchesOfInquiry(tx: TenantTx, id: string): Promise<ClientMatch[]> {
  const { rows } = await tx.client.query<{ email: string; phone: string; contact_name: string }>(
    `select email, phone, contact_name from inquiries where tenant_id = $1 and id = $2`,
    [tx.tenantId, id],
  );
  const inquiry = rows[0];
  if (!inquiry) throw notFound('inquiry');
  return findClientMatches(tx, { email: inquiry.email, phone: inquiry.phone, name: inquiry.contact_name });
}
