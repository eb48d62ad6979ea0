import {
  changeOrderCreate,
  changeOrderDecision,
  estimateCreate,
  estimateInputs,
  invoiceIssue,
  invoiceVoid,
  offlinePaymentCreate,
  proposalAcceptance,
  proposalCreate,
} from '@layerbook/contracts';
import { type TenantTx, withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import type { Pool } from 'pg';
import pino from 'pino';
import { createChangeOrder, sendChangeOrder } from '../billing/change-orders/change-orders';
import { decideChangeOrder } from '../billing/change-orders/decide';
import { issueInvoice } from '../billing/issue';
import { recordOfflinePayment } from '../billing/offline-payments';
import { recordProgress } from '../billing/progress';
import { startBilling } from '../billing/schedule';
import { voidInvoice } from '../billing/void';
import { sendDueReminders } from '../billing/reminders/send-reminders';
import { evaluateJobBilling } from '../billing/triggers/evaluate';
import { loadWorkItems } from '../billing/work-items';
import { loadConfig } from '../config';
import type { AppContext } from '../context';
import { localDate } from '../firms/local-date';
import { type Actor, SYSTEM_ACTOR } from '../http/actor';
import type { ClientPrincipal } from '../http/principal';
import { parse } from '../http/validate';
import { acceptProposal } from '../proposals/decide-proposal';
import { createEstimate, saveEstimateInputs } from '../proposals/estimates';
import { createVersion } from '../proposals/proposal-versions';
import { sendVersion } from '../proposals/send-proposal';
import { type BillingEvaluateJob, QUEUES } from '../queue/queues';

/*
 * The demo firm's billing: two signed jobs made the way the office and the client make them (an
 * estimate on the demo house, a proposal sent and accepted in the portal), then billed through the
 * same service functions the routes call. Every date is counted from the seed's `now`, so the demo
 * always shows an overdue invoice, a paid one, one part paid, an open one, a void one with its
 * credit note and a draft the queue made. Names, amounts and reasons are invented.
 */

const DAY = 24 * 60 * 60 * 1000;

/** The seed's clock: each step runs at its own moment in the past, as `ctx.now()` and `now` read it. */
interface SeedClock {
  at(daysAgo: number, hour?: number): Date;
  readonly now: Date;
}

/**
 * What the services need from the outside world, for a seed: the mail they write goes to the outbox
 * but no send job is queued (the demo client is invented; pg-boss may not be set up yet), the
 * billing checks they ask for are noted for the seed to run, and no file is stored.
 */
function seedContext(pool: Pool, clock: { current: Date }, checks: Set<string>): AppContext {
  const config = loadConfig({
    DATABASE_URL: 'unused-by-the-seed',
    DATABASE_OWNER_URL: 'unused-by-the-seed',
    DATABASE_JOBS_URL: 'unused-by-the-seed',
    SESSION_SECRET: 'the-seed-signs-no-session-at-all-here',
    ...(process.env['PUBLIC_URL'] ? { PUBLIC_URL: process.env['PUBLIC_URL'] } : {}),
  });
  return {
    config,
    pool,
    // Billing checks are run by the seed itself (runChecks), in its transaction, as the worker would.
    queue: {
      send: (name, data) => {
        if (name === QUEUES.billingEvaluate) checks.add((data as BillingEvaluateJob).jobId);
        return Promise.resolve();
      },
    },
    logger: pino({ level: 'silent' }),
    storage: {
      put: () => Promise.reject(new Error('The demo seed stores no files.')),
      get: () => Promise.resolve(null),
      delete: () => Promise.resolve(),
      close: () => undefined,
    },
    now: () => clock.current,
  };
}

export interface DemoBillingPeople {
  readonly ownerId: string;
  readonly officeId: string;
  readonly crewId: string;
  readonly clientId: string;
  readonly siteId: string;
}

interface DemoJobPlan {
  readonly title: string;
  readonly optionLabel: string;
  readonly systemName: string;
  readonly surfaceNames: readonly string[];
  /** days before the seed's today: estimate made, proposal sent, accepted */
  readonly daysAgo: { readonly estimate: number; readonly sent: number; readonly accepted: number; readonly start: number };
}

/**
 * Dates the rows a step made with the seed's clock (they were made at the transaction's start), so
 * lists, newest first, read in the story's order. The audit log and the insert-only tables keep
 * the moment of seeding.
 */
/**
 * Dates what this transaction made at the seed's clock. The audit log is append-only for the web
 * role, so its rows are dated afterwards by the owner (`dateDemoHistory`): each transaction's start
 * (PostgreSQL's now(), to the microsecond) is kept with the moment it stands for.
 */
async function stamp(tx: TenantTx, at: Date, history: DemoHistory): Promise<void> {
  for (const table of ['jobs', 'invoices', 'change_orders'] as const) {
    await tx.client.query(`update ${table} set created_at = $2 where tenant_id = $1 and created_at = now()`, [tx.tenantId, at]);
  }
  history.push({ txStart: (await tx.client.query<{ t: string }>(`select now()::text as t`)).rows[0].t, at });
}

/** Each seeding transaction's start and the moment of the demo's story it stands for. */
export type DemoHistory = Array<{ readonly txStart: string; readonly at: Date }>;

const VOID_REASON = 'Issued before the colour was settled; billed again with the agreed colour.';

type InFirm = <T>(work: (tx: TenantTx) => Promise<T>) => Promise<T>;

/** The demo client's portal account, as the portal's routes see a signed-in client. */
async function demoClient(tx: TenantTx, people: DemoBillingPeople): Promise<ClientPrincipal> {
  const { rows } = await tx.client.query<{
    id: string;
    name: string;
    email: string;
    firm_name: string;
    language: 'en' | 'es';
    own_language: 'en' | 'es' | null;
    firm_language: 'en' | 'es';
    country: string;
  }>(
    `select p.id, p.name, p.email, f.name as firm_name, coalesce(c.language, f.language) as language, c.language as own_language,
            f.language as firm_language, f.country
       from portal_users p join firms f on f.id = p.tenant_id join clients c on c.id = p.client_id
      where p.tenant_id = $1 and p.client_id = $2`,
    [tx.tenantId, people.clientId],
  );
  return {
    kind: 'client',
    id: rows[0].id,
    tenantId: tx.tenantId,
    name: rows[0].name,
    email: rows[0].email,
    firmName: rows[0].firm_name,
    language: rows[0].language,
    ownLanguage: rows[0].own_language,
    firmLanguage: rows[0].firm_language,
    country: rows[0].country,
  };
}

/** Surfaces of the demo house and a finish system of the demo firm, by their names (a missing one stops the seed). */
async function surfacesAndSystem(
  tx: TenantTx,
  siteId: string,
  names: { surfaceNames: readonly string[]; systemName: string },
): Promise<{ surfaceIds: string[]; finishSystemId: string }> {
  const { rows: surfaces } = await tx.client.query<{ id: string }>(
    `select s.id from surfaces s join rooms r on r.id = s.room_id
      where s.tenant_id = $1 and r.site_id = $2 and s.name = any($3) order by r.position, s.position`,
    [tx.tenantId, siteId, names.surfaceNames],
  );
  const { rows: systems } = await tx.client.query<{ id: string }>(`select id from finish_systems where tenant_id = $1 and name = $2`, [
    tx.tenantId,
    names.systemName,
  ]);
  if (surfaces.length !== names.surfaceNames.length || !systems[0])
    throw new Error(`demo: surfaces or system "${names.systemName}" missing`);
  return { surfaceIds: surfaces.map((s) => s.id), finishSystemId: systems[0].id };
}

/** An estimate on the demo house, a proposal version sent to the demo client and accepted in the portal: the job. */
async function acceptedJob(
  inFirm: InFirm,
  ctx: AppContext,
  clock: { current: Date },
  at: SeedClock['at'],
  people: DemoBillingPeople,
  plan: DemoJobPlan,
): Promise<{ jobId: string; versionId: string }> {
  const office: Actor = { kind: 'staff', userId: people.officeId, role: 'office' };
  clock.current = at(plan.daysAgo.estimate, 15);
  const estimateId = await inFirm(async (tx) => {
    const found = await surfacesAndSystem(tx, people.siteId, plan);
    const startDate = await firmDay(tx, at(plan.daysAgo.start));
    const id = await createEstimate(
      tx,
      office,
      parse(estimateCreate, { siteId: people.siteId, inquiryId: null, title: plan.title, startDate }),
    );
    await saveEstimateInputs(
      tx,
      office,
      id,
      parse(estimateInputs, {
        title: plan.title,
        startDate,
        isOccupied: true,
        variants: [
          {
            id: 'A',
            label: plan.optionLabel,
            surfaces: found.surfaceIds.map((surfaceId) => ({ surfaceId, finishSystemId: found.finishSystemId })),
          },
        ],
        addOns: [],
        equipment: [],
        subcontracts: [],
        sundries: [{ label: 'Dust sheets, masking and floor protection', amount: '85.00' }],
        discount: null,
        perAreaRates: {},
        internalNotes: '',
        clientNotes: 'Furniture moved by the household before we arrive.',
      }),
      clock.current,
    );
    return id;
  });
  clock.current = at(plan.daysAgo.sent, 16);
  const versionId = await inFirm(async (tx) => {
    const expiresOn = await firmDay(tx, at(plan.daysAgo.sent - 30));
    const version = await createVersion(tx, people.officeId, parse(proposalCreate, { estimateId, expiresOn }), clock.current);
    await sendVersion(tx, ctx, people.officeId, version.id);
    return version.id;
  });
  clock.current = at(plan.daysAgo.accepted, 19);
  const jobId = await inFirm(async (tx) => {
    const client = await demoClient(tx, people);
    await acceptProposal(
      tx,
      ctx,
      client,
      versionId,
      () => parse(proposalAcceptance, { variantId: 'A', signedName: client.name, consent: true }),
      { ip: '192.0.2.44', userAgent: 'Demo seed (the client signed in the portal)' },
    );
    const { rows } = await tx.client.query<{ id: string }>(`select id from jobs where tenant_id = $1 and proposal_version_id = $2`, [
      tx.tenantId,
      versionId,
    ]);
    return rows[0].id;
  });
  return { jobId, versionId };
}

async function firmDay(tx: TenantTx, at: Date): Promise<string> {
  const { rows } = await tx.client.query<{ time_zone: string }>(`select time_zone from firms where id = $1`, [tx.tenantId]);
  return localDate(rows[0].time_zone, at);
}

/**
 * The two billed demo jobs, after the firm is in place. Each step is its own transaction at its own
 * moment of the seed's clock, and the billing checks a step asks for run after it in theirs, as the
 * worker would; so the job's history and each invoice's trail read in the order things happened.
 */
export async function seedDemoBilling(pool: Pool, firmId: string, people: DemoBillingPeople, now: Date): Promise<DemoHistory> {
  const history: DemoHistory = [];
  const clock = { current: now };
  const at = (daysAgo: number, hour = 15) => {
    const d = new Date(now.getTime() - daysAgo * DAY);
    d.setUTCHours(hour, 0, 0, 0);
    return d;
  };
  const checks = new Set<string>();
  const ctx = seedContext(pool, clock, checks);
  const inFirm = <T>(work: (tx: TenantTx) => Promise<T>) =>
    withTenant(pool, firmId, async (tx) => {
      const out = await work(tx);
      await stamp(tx, clock.current, history);
      return out;
    });
  const timeZone = await inFirm(
    async (tx) =>
      (await tx.client.query<{ time_zone: string }>(`select time_zone from firms where id = $1`, [tx.tenantId])).rows[0].time_zone,
  );
  const day = (daysAgo: number) => localDate(timeZone, at(daysAgo));
  const office: Actor = { kind: 'staff', userId: people.officeId, role: 'office' };
  const crew: Actor = { kind: 'staff', userId: people.crewId, role: 'crew' };
  /** Moves the clock and does one step in its own transaction, then the billing checks it asked for (the queue's part). */
  const step = async <T>(daysAgo: number, work: (tx: TenantTx) => Promise<T>): Promise<T> => {
    clock.current = at(daysAgo);
    const out = await inFirm(work);
    for (const jobId of [...checks]) {
      checks.delete(jobId);
      await inFirm((tx) => evaluateJobBilling(tx, jobId, localDate(timeZone, clock.current), SYSTEM_ACTOR));
    }
    return out;
  };
  const lineInvoice = (jobId: string, role: 'deposit' | 'milestone' | 'final') =>
    inFirm(async (tx) => {
      const { rows } = await tx.client.query<{ id: string }>(
        `select i.id from invoices i join payment_schedule_lines l on l.id = i.schedule_line_id
          where i.tenant_id = $1 and i.job_id = $2 and l.role = $3 and i.status <> 'void'`,
        [tx.tenantId, jobId, role],
      );
      if (!rows[0]) throw new Error(`demo seed: no ${role} invoice drafted on job ${jobId}`);
      return rows[0].id;
    });
  /** Marks the layers `fromOrder`..`throughOrder` (1 = the first layer) done on every surface, two marks a day from `daysAgo`. */
  const markLayers = async (jobId: string, fromOrder: number, throughOrder: number, daysAgo: number) => {
    const items = (await inFirm((tx) => loadWorkItems(tx, jobId))).filter((i) => i.layerOrder >= fromOrder && i.layerOrder <= throughOrder);
    for (const [n, item] of items.entries()) {
      const on = daysAgo - Math.floor(n / 2);
      await step(on, (tx) =>
        recordProgress(tx, ctx.queue, crew, jobId, { kind: 'layerDone', workItemId: item.id, on: day(on) }, clock.current),
      );
    }
  };
  const issue = (daysAgo: number, id: string) =>
    step(daysAgo, (tx) => issueInvoice(tx, ctx, office, id, parse(invoiceIssue, { send: true }), clock.current));
  const pay = (daysAgo: number, id: string, method: 'cheque' | 'transfer', share: 'all' | 'half', reference: string) =>
    step(daysAgo, async (tx) => {
      const { rows } = await tx.client.query<{ due: string }>(
        `select (total - amount_paid - amount_credited)::text as due from invoices where tenant_id = $1 and id = $2`,
        [tx.tenantId, id],
      );
      const due = new Decimal(rows[0].due);
      const amount = (share === 'all' ? due : due.div(2)).toDecimalPlaces(2, Decimal.ROUND_DOWN).toFixed(2);
      await recordOfflinePayment(
        tx,
        office,
        id,
        parse(offlinePaymentCreate, { method, amount, receivedOn: day(daysAgo), reference }),
        clock.current,
      );
    });
  /** The order (1 = first) of the layer the job's stage payment waits for. */
  const stageLayer = (jobId: string) =>
    inFirm(async (tx) => {
      const { rows } = await tx.client.query<{ layer_id: string }>(
        `select trigger->>'layerId' as layer_id from payment_schedule_lines where tenant_id = $1 and job_id = $2 and role = 'milestone'`,
        [tx.tenantId, jobId],
      );
      const item = (await loadWorkItems(tx, jobId)).find((i) => i.layerId === rows[0]?.layer_id);
      if (!item) throw new Error(`demo seed: job ${jobId} has no stage payment waiting for a layer`);
      return item.layerOrder;
    });
  /** A change order made and sent: a lump sum, or priced from surfaces of the demo house with a finish system (by names). */
  const changeOrder = async (
    jobId: string,
    daysAgo: number,
    title: string,
    description: string,
    price: string | { surfaceNames: string[]; systemName: string },
  ) => {
    const made = await step(daysAgo, async (tx) => {
      const pricing =
        typeof price === 'string' ? { kind: 'lumpSum', price } : { kind: 'engine', ...(await surfacesAndSystem(tx, people.siteId, price)) };
      return createChangeOrder(tx, office, jobId, () => parse(changeOrderCreate, { title, description, pricing }), clock.current);
    });
    await step(daysAgo, (tx) => sendChangeOrder(tx, ctx, office, made.id));
    return made.id;
  };
  const approve = (daysAgo: number, changeOrderId: string) =>
    step(daysAgo, async (tx) =>
      decideChangeOrder(tx, ctx, await demoClient(tx, people), changeOrderId, () =>
        parse(changeOrderDecision, { decision: 'approve', signedName: 'Hattie Brambleton', consent: true }),
      ),
    );
  const job = async (plan: DemoJobPlan) => {
    const made = await acceptedJob(inFirm, ctx, clock, at, people, plan);
    await step(plan.daysAgo.accepted - 2, (tx) => startBilling(tx, ctx.queue, office, made.jobId, clock.current));
    return made.jobId;
  };

  // The stair hall: signed ten weeks ago; deposit paid, the stage payment overdue, a change order
  // approved, the walkthrough held this week and its final invoice drafted by the queue for review.
  const hall = await job({
    title: 'Stair hall lime plaster',
    optionLabel: 'Layered lime, burnished and waxed',
    systemName: 'Layered lime plaster, burnished and waxed',
    surfaceNames: ['Hall walls', 'Barrel vault'],
    daysAgo: { estimate: 80, sent: 78, accepted: 74, start: 68 },
  });
  const hallDeposit = await lineInvoice(hall, 'deposit');
  await issue(72, hallDeposit);
  await pay(64, hallDeposit, 'cheque', 'all', 'Cheque 1184');
  const hallLayer = await stageLayer(hall);
  await markLayers(hall, 1, hallLayer, 54);
  // Left unpaid: issued 49 days ago at net 14 it is 35 days late, the cash page's "31–60 days late"
  // age (e2e/cash.e2e.ts drills into it).
  await issue(49, await lineInvoice(hall, 'milestone'));
  const niche = await changeOrder(
    hall,
    46,
    'Lime-plaster niche on the half landing',
    'Form and plaster a shallow arched niche in the landing wall, finished like the hall walls.',
    '640.00',
  );
  await approve(43, niche);
  await markLayers(hall, hallLayer + 1, 99, 30);
  await step(5, (tx) => recordProgress(tx, ctx.queue, office, hall, { kind: 'walkthrough', on: day(5) }, clock.current));
  await lineInvoice(hall, 'final');

  // The turret room: signed three weeks ago; the first deposit invoice voided (credit note) and
  // billed again, part paid; the crown added by a change order priced from its surface (so the crew's
  // sheet lists it); the first coats done and their stage payment issued; a change order waiting for the client.
  const turret = await job({
    title: 'Turret room limewash',
    optionLabel: 'Two-coat limewash',
    systemName: 'Two-coat limewash',
    surfaceNames: ['Round walls', 'Turret ceiling'],
    daysAgo: { estimate: 30, sent: 28, accepted: 24, start: 14 },
  });
  const firstDeposit = await lineInvoice(turret, 'deposit');
  await issue(22, firstDeposit);
  await step(21, (tx) => voidInvoice(tx, ctx, office, firstDeposit, parse(invoiceVoid, { reason: VOID_REASON }).reason, clock.current));
  // Voiding puts the deposit line back to waiting for its trigger; the check the void asks for drafts it again.
  const deposit = await lineInvoice(turret, 'deposit');
  await issue(12, deposit);
  const crown = await changeOrder(
    turret,
    10,
    'Limewash the crown at the wall top',
    'Carry the two-coat limewash up onto the crown, with the same mineral primer first.',
    { surfaceNames: ['Crown at the wall top'], systemName: 'Two-coat limewash' },
  );
  await approve(9, crown);
  await pay(6, deposit, 'transfer', 'half', 'Bank transfer, first half');
  await markLayers(turret, 1, await stageLayer(turret), 5);
  await issue(2, await lineInvoice(turret, 'milestone'));
  await changeOrder(
    turret,
    1,
    'Limewash the window reveals',
    'Carry the limewash into the three window reveals, with the same mineral primer first.',
    '380.00',
  );

  // The reminders the daily job would have sent on the way, each on its day (recorded without e-mails:
  // the demo's history mails no one), so an overdue invoice shows its chasing.
  for (let daysAgo = 60; daysAgo >= 0; daysAgo--) {
    await step(daysAgo, (tx) => sendDueReminders(tx, ctx.queue, ctx.config, day(daysAgo), clock.current, { mail: false }));
  }
  return history;
}
