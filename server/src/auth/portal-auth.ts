import { PROBLEM_TYPES, type Language } from '@layerbook/contracts';
import {
  and,
  clients,
  eq,
  firms,
  isNull,
  isUuid,
  portalLinks,
  portalUsers,
  sql,
  type SqlQuery,
  TenantTx,
  withLookup,
  withTenant,
} from '@layerbook/db';
import type { Pool } from 'pg';
import type { AppContext } from '../context';
import type { ClientPrincipal } from '../http/principal';
import { HttpError, gone, notFound } from '../http/problem';
import { LINKS_PER_HOUR } from './password-reset';
import { enqueueMail } from '../mail/outbox';
import { portalUserReader } from '../i18n/reader';
import { portalLinkMail } from '../mail/templates';
import { sessionLive } from './staff-principal';
import { hashToken, minutesFromNow, newToken } from './tokens';

export const PORTAL_LINK_MINUTES = 20;

/** E-mails a one-time link for every firm where this address is a client; silent otherwise. */
export async function requestPortalLink(ctx: AppContext, email: string, next?: string): Promise<void> {
  const accounts = await withLookup(ctx.pool, { email }, (tx) =>
    tx.db
      .select({ id: portalUsers.id, tenantId: portalUsers.tenantId })
      .from(portalUsers)
      .where(and(eq(portalUsers.email, email), eq(portalUsers.status, 'active'))),
  );
  for (const account of accounts) {
    await withTenant(ctx.pool, account.tenantId, async (tx) => {
      const user = (await tx.db.select().from(portalUsers).where(eq(portalUsers.id, account.id)))[0];
      const firm = (await tx.db.select({ name: firms.name }).from(firms))[0];
      if (!user || !firm) return;
      // Someone asking for a client's address from many places must not fill that inbox: a few asked-for
      // links an hour per account, then nothing more (the answer was the same 202 before this ran). Links
      // the firm's own mail carries (proposals, invoices) do not count.
      const recent = await tx.client.query<{ n: number }>(
        `select count(*)::int as n from portal_links
          where tenant_id = $1 and portal_user_id = $2 and asked and created_at > now() - interval '1 hour'`,
        [tx.tenantId, user.id],
      );
      if (recent.rows[0].n >= LINKS_PER_HOUR) return;
      const { id: linkId, token } = await createPortalLink(tx, user.id, ctx.now(), PORTAL_LINK_MINUTES, { asked: true });
      const { language } = await portalUserReader(tx, user.id);
      await enqueueMail(tx, ctx.queue, {
        purposeKey: `portal-link:${linkId}`,
        tenantId: tx.tenantId,
        to: user.email,
        sender: 'firm',
        ...portalLinkMail({
          name: user.name,
          firmName: firm.name,
          // `lang`: the page the link opens speaks the e-mail's language before anyone is signed in
          url: `${ctx.config.PUBLIC_URL}/portal/sign-in/link?token=${token}${next ? `&next=${encodeURIComponent(next)}` : ''}&lang=${language}`,
          minutes: PORTAL_LINK_MINUTES,
          language,
        }),
      });
    });
  }
}

/** A one-time portal sign-in link for a client's account (token for the e-mail, hash at rest). */
export async function createPortalLink(
  tx: TenantTx,
  portalUserId: string,
  now: Date,
  minutes: number,
  { asked = false }: { asked?: boolean } = {},
): Promise<{ id: string; token: string }> {
  const { token, hash } = newToken();
  const [link] = await tx.db
    .insert(portalLinks)
    .values({ tenantId: tx.tenantId, portalUserId, tokenHash: hash, expiresAt: minutesFromNow(now, minutes), asked })
    .returning({ id: portalLinks.id });
  return { id: link.id, token };
}

/**
 * Spends a one-time link and names the client it signs in. A second click on a link (spent or
 * expired) by the client this browser is already signed in as answers that client as it is, with
 * `isSignedInAlready` so the route keeps the session (and its token, which other open tabs hold).
 */
export async function redeemPortalLink(
  ctx: AppContext,
  token: string,
  current: ClientPrincipal | null = null,
): Promise<{ principal: ClientPrincipal; isSignedInAlready: boolean }> {
  const tokenHash = hashToken(token);
  const found = await withLookup(
    ctx.pool,
    { tokenHash },
    async (tx) => (await tx.db.select().from(portalLinks).where(eq(portalLinks.tokenHash, tokenHash)))[0],
  );
  if (!found) throw notFound('sign-in link');
  const portalUserId = await withTenant(ctx.pool, found.tenantId, async (tx) => {
    const link = (await tx.db.select().from(portalLinks).where(eq(portalLinks.id, found.id)).for('update'))[0];
    if (!link) throw notFound('sign-in link');
    const isOwnLink = current?.tenantId === found.tenantId && current.id === link.portalUserId;
    if (!isOwnLink) {
      if (link.usedAt) throw gone('This sign-in link was already used. Ask for a new one.');
      if (link.expiresAt <= ctx.now()) throw gone('This sign-in link has expired. Ask for a new one.');
    }
    await tx.db
      .update(portalLinks)
      .set({ usedAt: ctx.now() })
      .where(and(eq(portalLinks.id, link.id), isNull(portalLinks.usedAt)));
    return link.portalUserId;
  });
  if (current?.tenantId === found.tenantId && current.id === portalUserId) return { principal: current, isSignedInAlready: true };
  const principal = await loadClientPrincipal(ctx.pool, portalUserId, found.tenantId);
  if (!principal) throw accessOff();
  return { principal, isSignedInAlready: false };
}

/** Its own problem type, so the portal says the firm turned access off (asking for a new link would not help). */
const accessOff = () =>
  new HttpError(
    410,
    'Portal access turned off',
    'The firm has turned off this client account. Contact the firm.',
    undefined,
    PROBLEM_TYPES.portalAccessOff,
  );

/**
 * The firm's name when this browser's client claim names an account the firm has turned off (or
 * removed), for the session answer; null while the account is active. Read only after the session
 * check found no live client, so a signed-out session costs nothing.
 */
export async function portalAccessOffAt(pool: Pool, portalUserId: string, tenantId: string): Promise<{ firmName: string } | null> {
  if (!isUuid(portalUserId) || !isUuid(tenantId)) return null;
  return withTenant(pool, tenantId, async (tx) => {
    const firm = (await tx.db.select({ name: firms.name }).from(firms))[0];
    const user = (await tx.db.select({ status: portalUsers.status }).from(portalUsers).where(eq(portalUsers.id, portalUserId)))[0];
    return firm && user?.status !== 'active' ? { firmName: firm.name } : null;
  });
}

export function loadClientPrincipal(pool: Pool, portalUserId: string, tenantId: string): Promise<ClientPrincipal | null> {
  return withTenant(pool, tenantId, (tx) => loadClientInTx(tx, portalUserId));
}

interface ClientRow {
  name: string;
  email: string;
  status: string;
  firm_name: string;
  language: Language;
  own_language: Language | null;
  firm_language: Language;
  country: string;
  session_live: boolean;
}

/** The client's row for the first round trip of a request's transaction, prepared once per connection (see staffRowQuery). */
export function clientRowQuery(tenantId: string, portalUserId: string, sessionId: string | null): SqlQuery {
  if (!isUuid(tenantId) || !isUuid(portalUserId)) throw new Error('clientRowQuery needs ids');
  const live = sessionLive(sessionId, portalUserId, 3);
  return {
    name: `lb_client_row${live.suffix}`,
    text: `select p.name, p.email, p.status, f.name as firm_name, coalesce(c.language, f.language) as language,
                 c.language as own_language, f.language as firm_language, f.country,
                 ${live.sql} as session_live
            from portal_users p join firms f on f.id = p.tenant_id left join clients c on c.id = p.client_id
           where p.tenant_id = $1 and p.id = $2`,
    values: [tenantId, portalUserId, ...live.values],
  };
}

export function toClientPrincipal(tenantId: string, portalUserId: string, row: ClientRow | undefined): ClientPrincipal | null {
  if (!row || row.status !== 'active' || !row.session_live) return null;
  return {
    kind: 'client',
    id: portalUserId,
    tenantId,
    name: row.name,
    email: row.email,
    firmName: row.firm_name,
    language: row.language,
    ownLanguage: row.own_language,
    firmLanguage: row.firm_language,
    country: row.country,
  };
}

/** Loads a portal client inside the request's firm transaction (see loadStaffInTx). */
export async function loadClientInTx(tx: TenantTx, portalUserId: string): Promise<ClientPrincipal | null> {
  {
    const rows = await tx.db
      .select({
        name: portalUsers.name,
        email: portalUsers.email,
        status: portalUsers.status,
        firmName: firms.name,
        language: sql<Language>`coalesce(${clients.language}, ${firms.language})`,
        ownLanguage: clients.language,
        firmLanguage: firms.language,
        country: firms.country,
      })
      .from(portalUsers)
      .innerJoin(firms, eq(firms.id, portalUsers.tenantId))
      .leftJoin(clients, eq(clients.id, portalUsers.clientId))
      .where(and(eq(portalUsers.tenantId, tx.tenantId), eq(portalUsers.id, portalUserId)));
    const row = rows[0];
    if (!row || row.status !== 'active') return null;
    return {
      kind: 'client',
      id: portalUserId,
      tenantId: tx.tenantId,
      name: row.name,
      email: row.email,
      firmName: row.firmName,
      language: row.language,
      ownLanguage: row.ownLanguage,
      firmLanguage: row.firmLanguage,
      country: row.country,
    };
  }
}
