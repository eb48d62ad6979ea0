import { createHash, createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { InquirySource, PublicInquiryRequest, PublicSource } from '@layerbook/contracts';
import { and, eq, firms, inArray, memberships, users, withLookup, withTenant } from '@layerbook/db';
import type { AppContext } from '../context';
import { SYSTEM_ACTOR } from '../http/actor';
import { badRequest, notFound } from '../http/problem';
import { enqueueMail } from '../mail/outbox';
import { firmReader } from '../i18n/reader';
import { inquiryAcknowledgementMail, inquiryNotificationMail } from '../mail/inquiry-templates';
import { USED_STAMP_KEEP_HOURS } from '../queue/prune';
import { createInquiry } from './service';

/** By default a form must be open this long before it is sent: bots fill forms in milliseconds. */
export const MIN_FILL_MS = 3000;
// A stamp is good for two hours: long enough to write an inquiry, short enough to limit replays.
const MAX_FILL_MS = 2 * 60 * 60 * 1000;
// How old an expired stamp may be and still vouch for its renewal: below the day spent nonces are kept.
const RENEWABLE_MS = (USED_STAMP_KEEP_HOURS - 1) * 60 * 60 * 1000;

/**
 * The page stamps when the form was shown, with a random nonce, signed so a bot can neither forge
 * an old time nor reuse one stamp: each nonce files one inquiry (used_form_stamps).
 */
export function formStamp(secret: string, now: Date): string {
  const t = String(now.getTime());
  const nonce = randomBytes(12).toString('base64url');
  return `${t}.${nonce}.${createHmac('sha256', secret).update(`inquiry-form:${t}:${nonce}`).digest('base64url')}`;
}

/** Text shaped like a stamp (time in ms, nonce, signature), for finding stamps in a kept page. */
export const FORM_STAMP_SHAPE = /\d{13}\.[A-Za-z0-9_-]{16}\.[A-Za-z0-9_-]{43}/g;

/** Whether `text` is a stamp this server signed, of any age. */
export function isFormStamp(secret: string, text: string): boolean {
  return signedStamp(secret, text) !== null;
}

function readStamp(secret: string, stamp: string | undefined, now: Date): { age: number; nonce: string } | null {
  const signed = signedStamp(secret, stamp);
  return signed && { age: now.getTime() - signed.time, nonce: signed.nonce };
}

/**
 * The nonce of the stamp a renewed form replaced, when it proves the page was opened long ago: this
 * server signed it, it had expired (so it is at least two hours old), and it is young enough that its
 * nonce, once spent, is still on record (prune.ts keeps spent nonces a day). A person told to send
 * once more may then click at once; a bot gains nothing it lacks already, since it must hold a stamp
 * for two hours and each one exempts a single send (its nonce is spent with the new stamp's).
 */
function renewedNonce(secret: string, renewedFrom: string | undefined, now: Date): string | null {
  const old = readStamp(secret, renewedFrom, now);
  return old && old.age > MAX_FILL_MS && old.age <= RENEWABLE_MS ? old.nonce : null;
}

function signedStamp(secret: string, stamp: string | undefined): { time: number; nonce: string } | null {
  const [t, nonce, mac] = (stamp ?? '').split('.');
  if (!t || !nonce || !mac) return null;
  const expected = createHmac('sha256', secret).update(`inquiry-form:${t}:${nonce}`).digest('base64url');
  if (expected.length !== mac.length || !timingSafeEqual(Buffer.from(expected), Buffer.from(mac))) return null;
  return { time: Number(t), nonce };
}

/** Referrals keep their kind (they may be owed thanks or a fee); everything else is the web form. */
function sourceFromForm(heardFrom: PublicSource): InquirySource {
  return heardFrom === 'search_or_social' || heardFrom === 'other' ? 'web_form' : heardFrom;
}

export async function publicFirm(ctx: AppContext, slug: string): Promise<{ id: string; name: string }> {
  const firm = await withLookup(
    ctx.pool,
    { slug },
    async (tx) => (await tx.db.select({ id: firms.id, name: firms.name }).from(firms).where(eq(firms.slug, slug)))[0],
  );
  if (!firm) throw notFound('firm');
  return firm;
}

/**
 * Files a prospect's inquiry with that firm only, and queues the acknowledgement to the prospect
 * (once a day per address) and the notice to the owner and office — all in one transaction, through
 * the outbox.
 * Returns 'ignored' for a bot (honeypot filled, sent too fast, or a stamp spent): it is told nothing different.
 */
export async function submitPublicInquiry(ctx: AppContext, slug: string, input: PublicInquiryRequest): Promise<'filed' | 'ignored'> {
  const now = ctx.now();
  if (input.website) return 'ignored';
  const stamp = readStamp(ctx.config.SESSION_SECRET, input.startedAt, now);
  if (stamp === null || stamp.age > MAX_FILL_MS)
    throw badRequest([{ field: 'startedAt', message: 'This form has expired; reload the page and send it again.' }]);
  const renewed = renewedNonce(ctx.config.SESSION_SECRET, input.renewedFrom, now);
  if (renewed === null && stamp.age < ctx.config.PUBLIC_FORM_MIN_FILL_MS) return 'ignored';
  const firm = await publicFirm(ctx, slug);
  return withTenant(ctx.pool, firm.id, async (tx) => {
    // A stamp files once: a replay (or a double click) is quietly dropped, like any bot. So does a
    // renewal whose old stamp was spent already (it vouches for one send only).
    const nonces = renewed === null ? [stamp.nonce] : [stamp.nonce, renewed];
    const fresh = await tx.client.query(`insert into used_form_stamps (nonce) select unnest($1::text[]) on conflict (nonce) do nothing`, [
      nonces,
    ]);
    if (fresh.rowCount !== nonces.length) return 'ignored' as const;
    // An anonymous prospect is no one we know yet: the form files it as the system does.
    const id = await createInquiry(tx, SYSTEM_ACTOR, {
      contactName: input.name,
      email: input.email,
      phone: input.phone,
      siteAddress: input.siteAddress,
      yearBuilt: typeof input.yearBuilt === 'number' ? input.yearBuilt : null,
      rooms: input.rooms,
      finishIdea: input.finishIdea,
      timeline: input.timeline,
      budgetRange: input.budgetRange,
      source: sourceFromForm(input.heardFrom),
      referrerName: input.referrerName,
      estimatedValue: null,
      assigneeUserId: null,
      nextFollowUp: null,
      consentToContact: input.consent,
    });
    // One acknowledgement per address per firm per day (UTC): the form files every inquiry and tells the
    // office each time, but it is no way to send a firm's mail to a stranger over and over.
    const addressKey = createHash('sha256').update(input.email.trim().toLowerCase()).digest('hex').slice(0, 32);
    await enqueueMail(tx, ctx.queue, {
      purposeKey: `inquiry-ack:${tx.tenantId}:${addressKey}:${now.toISOString().slice(0, 10)}`,
      tenantId: tx.tenantId,
      to: input.email,
      sender: 'firm',
      // The visitor is no client yet: the firm's own language.
      ...inquiryAcknowledgementMail({ firmName: firm.name, name: input.name, language: (await firmReader(tx)).language }),
    });
    const staff = await tx.db
      .select({ userId: users.id, email: users.email, name: users.name })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.tenantId, tx.tenantId), eq(memberships.status, 'active'), inArray(memberships.role, ['owner', 'office'])));
    for (const person of staff) {
      await enqueueMail(tx, ctx.queue, {
        purposeKey: `inquiry-notice:${id}:${person.userId}`,
        tenantId: tx.tenantId,
        to: person.email,
        ...inquiryNotificationMail({
          firmName: firm.name,
          prospect: input.name,
          rooms: input.rooms,
          url: `${ctx.config.PUBLIC_URL}/inquiries/${id}`,
        }),
      });
    }
    return 'filed' as const;
  });
}
