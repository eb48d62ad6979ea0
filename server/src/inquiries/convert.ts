import type { InquiryConversion, InquiryConvert } from '@layerbook/contracts';
import { and, clients, eq, inquiries, sites, TenantTx } from '@layerbook/db';
import { addSite, createClient } from '../clients/service';
import type { Actor } from '../http/actor';
import { badRequest, notFound } from '../http/problem';
import { firmReader } from '../i18n/reader';
import { logActivity } from './service';

/**
 * Links an inquiry to a client and a site — existing ones, given ones, or ones made from what the
 * prospect already told us — so booking a visit or winning never means retyping.
 */
export async function convertInquiry(tx: TenantTx, actor: Actor, id: string, input: InquiryConvert, now: Date): Promise<InquiryConversion> {
  const inq = (
    await tx.db
      .select()
      .from(inquiries)
      .where(and(eq(inquiries.tenantId, tx.tenantId), eq(inquiries.id, id)))
      .for('update')
  )[0];
  if (!inq) throw notFound('inquiry');

  // Filed without a choice (a bare convert, or a stage that files by itself): a client with the same
  // e-mail is the same person, so the inquiry joins that client instead of making a second one.
  // What was asked wins: a client chosen, then a new one described; only then the inquiry's own.
  let clientId = input.clientId ?? (input.client ? null : (inq.clientId ?? (await soleClientWithEmail(tx, inq.email))));
  if (clientId) {
    // Key share: a merge removing this client waits for us, or we see it gone (and answer 400, not a 500).
    const found = await tx.db
      .select({ id: clients.id })
      .from(clients)
      .where(and(eq(clients.tenantId, tx.tenantId), eq(clients.id, clientId)))
      .for('key share');
    if (!found.length) throw badRequest([{ field: 'clientId', message: 'Choose a client of this firm.' }]);
  } else {
    const made = await createClient(
      tx,
      actor,
      input.client ?? {
        kind: 'homeowner',
        isCompany: false,
        name: inq.contactName,
        email: inq.email,
        phone: inq.phone,
        notes: '',
      },
    );
    clientId = made.id;
  }

  // The inquiry's site goes with its client: filed under another client, it takes that client's site or a new one.
  let siteId = input.siteId ?? (input.site ? null : clientId === inq.clientId ? inq.siteId : null);
  if (siteId) {
    const found = await tx.db
      .select({ id: sites.id })
      .from(sites)
      .where(and(eq(sites.tenantId, tx.tenantId), eq(sites.id, siteId), eq(sites.clientId, clientId)));
    if (!found.length) throw badRequest([{ field: 'siteId', message: "Choose one of this client's sites." }]);
  } else if (input.site || inq.siteAddress) {
    const made = await addSite(
      tx,
      clientId,
      input.site ?? {
        label: '',
        addressLine1: inq.siteAddress,
        addressLine2: '',
        city: '',
        region: '',
        postalCode: '',
        // The prospect's place is where the firm works, not wherever our default is.
        country: (await firmReader(tx)).country,
        yearBuilt: inq.yearBuilt,
        accessNotes: '',
      },
    );
    siteId = made.id;
  }

  await tx.db
    .update(inquiries)
    .set({ clientId, siteId, updatedAt: now })
    .where(and(eq(inquiries.tenantId, tx.tenantId), eq(inquiries.id, id)));
  await logActivity(tx, actor, id, 'converted', '', { clientId, siteId });
  return { clientId, siteId };
}

/** The one client of the firm with this e-mail (any case), or null when there is none or several. */
async function soleClientWithEmail(tx: TenantTx, email: string): Promise<string | null> {
  const wanted = email.trim().toLowerCase();
  if (!wanted) return null;
  const { rows } = await tx.client.query<{ id: string }>(
    `select id from clients where tenant_id = $1 and lower(trim(email)) = $2 limit 2`,
    [tx.tenantId, wanted],
  );
  return rows.length === 1 && rows[0] ? rows[0].id : null;
}
