import type { Language } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import type { Reader } from '../i18n/reader';

/** An active owner or office member, with the language they read in at this firm (theirs, else the firm's). */
export interface OfficeRecipient {
  readonly id: string;
  readonly email: string;
  readonly reader: Reader;
}

/** The people who act on a client's answer: the firm's active owners and office members. */
export async function officeRecipients(tx: TenantTx): Promise<OfficeRecipient[]> {
  const { rows } = await tx.client.query<{ id: string; email: string; language: Language; country: string }>(
    `select u.id, u.email, coalesce(m.language, f.language) as language, f.country
       from memberships m join users u on u.id = m.user_id join firms f on f.id = m.tenant_id
      where m.tenant_id = $1 and m.status = 'active' and m.role in ('owner', 'office') order by u.id`,
    [tx.tenantId],
  );
  return rows.map((r) => ({ id: r.id, email: r.email, reader: { language: r.language, country: r.country } }));
}
