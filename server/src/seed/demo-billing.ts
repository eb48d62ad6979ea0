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
import type { TenantTx } from '@layerbook/db';
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
 * Dates the rows a step made with the seed's clock: everything in the seed's one transaction would
 * otherwise share its start time, and lists are newest first. (The audit log and the insert-only
 * tables keep the moment of seeding.)
 */
async function stamp(tx: TenantTx, at: Date): Promise<void> {
  for (const table of ['jobs', 'invoices', 'change_orders'] as const) {
    await tx.client.query(`update ${table} set created_at = $2 where tenant_id = $1 and created_at = now()`, [tx.tenantId, at]);
  }
}

/** An estimate on the demo house, a proposal version sent to the demo client and accepted in the portal: the job. */
async function acceptedJob(
  tx: TenantTx,
  ctx: AppContext,
  clock: { current: Date },
  at: SeedClock['at'],
  people: DemoBillingPeople,
  plan: DemoJobPlan,
): Promise<{ jobId: string; versionId: string }> {
  const office: Actor = { kind: 'staff', userId: people.officeId, role: 'office' };
  const { rows: surfaces } = await tx.client.query<{ id: string; name: string }>(
    `select s.id, s.name from surfaces s join rooms r on r.id = s.room_id
      where s.tenant_id = $1 and r.site_id = $2 and s.name = any($3) order by r.position, s.position`,
    [tx.tenantId, people.siteId, plan.surfaceNames],
  );
  const { rows: systems } = await tx.client.query<{ id: string }>(`select id from finish_systems where tenant_id = $1 and name = $2`, [
    tx.tenantId,
    plan.systemName,
  ]);
  if (surfaces.length !== plan.surfaceNames.length || !systems[0]) throw new Error(`demo job "${plan.title}": surfaces or system missing`);

  clock.current = at(plan.daysAgo.estimate, 15);
  const firmTz = (await tx.client.query<{ time_zone: string }>(`select time_zone from firms where id = $1`, [tx.tenantId])).rows[0]
    .time_zone;
  const day = (d: Date) => localDate(firmTz, d);
  const startDate = day(at(plan.daysAgo.start));
  const estimateId = await createEstimate(
    tx,
    office,
    parse(estimateCreate, { siteId: people.siteId, inquiryId: null, title: plan.title, startDate }),
  );
  await saveEstimateInputs(
    tx,
    office,
    estimateId,
    parse(estimateInputs, {
      title: plan.title,
      startDate,
      isOccupied: true,
      variants: [{ id: 'A', label: plan.optionLabel, surfaces: surfaces.map((s) => ({ surfaceId: s.id, finishSystemId: systems[0].id })) }],
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
  clock.current = at(plan.daysAgo.sent, 16);
  const version = await createVersion(
    tx,
    people.officeId,
    parse(proposalCreate, { estimateId, expiresOn: day(at(plan.daysAgo.sent - 30)) }),
    clock.current,
  );
  await sendVersion(tx, ctx, people.officeId, version.id);

  clock.current = at(plan.daysAgo.accepted, 19);
  const { rows: portal } = await tx.client.query<{ id: string; name: string; email: string; firm_name: string }>(
    `select p.id, p.name, p.email, f.name as firm_name from portal_users p join firms f on f.id = p.tenant_id
      where p.tenant_id = $1 and p.client_id = $2`,
    [tx.tenantId, people.clientId],
  );
  const client: ClientPrincipal = {
    kind: 'client',
    id: portal[0].id,
    tenantId: tx.tenantId,
    name: portal[0].name,
    email: portal[0].email,
    firmName: portal[0].firm_name,
  };
  await acceptProposal(
    tx,
    ctx,
    client,
    version.id,
    () => parse(proposalAcceptance, { variantId: 'A', signedName: portal[0].name, consent: true }),
    { ip: '192.0.2.44', userAgent: 'Demo seed (the client signed in the portal)' },
  );
  await stamp(tx, clock.current);
  const { rows } = await tx.client.query<{ id: string }>(`select id from jobs where tenant_id = $1 and proposal_version_id = $2`, [
    tx.tenantId,
    version.id,
  ]);
  return { jobId: rows[0].id, versionId: version.id };
}

/** The two billed demo jobs, in the seed's transaction. */
export async function seedDemoBilling(tx: TenantTx, pool: Pool, people: DemoBillingPeople, now: Date): Promise<void> {
  const clock = { current: now };
  const at = (daysAgo: number, hour = 15) => {
    const d = new Date(now.getTime() - daysAgo * DAY);
    d.setUTCHours(hour, 0, 0, 0);
    return d;
  };
  const checks = new Set<string>();
  const ctx = seedContext(pool, clock, checks);
  const timeZone = (await tx.client.query<{ time_zone: string }>(`select time_zone from firms where id = $1`, [tx.tenantId])).rows[0]
    .time_zone;
  const day = (daysAgo: number) => localDate(timeZone, at(daysAgo));
  const office: Actor = { kind: 'staff', userId: people.officeId, role: 'office' };
  const crew: Actor = { kind: 'staff', userId: people.crewId, role: 'crew' };
  /** Moves the clock, does one step, then runs the billing checks it asked for (the queue's part). */
  const step = async <T>(daysAgo: number, work: () => Promise<T>): Promise<T> => {
    clock.current = at(daysAgo);
    const out = await work();
    for (const jobId of [...checks]) {
      checks.delete(jobId);
      await evaluateJobBilling(tx, jobId, localDate(timeZone, clock.current), SYSTEM_ACTOR);
    }
    await stamp(tx, clock.current);
    return out;
  };
  const lineInvoice = async (jobId: string, role: 'deposit' | 'milestone' | 'final') => {
    const { rows } = await tx.client.query<{ id: string }>(
      `select i.id from invoices i join payment_schedule_lines l on l.id = i.schedule_line_id
        where i.tenant_id = $1 and i.job_id = $2 and l.role = $3 and i.status <> 'void'`,
      [tx.tenantId, jobId, role],
    );
    if (!rows[0]) throw new Error(`demo seed: no ${role} invoice drafted on job ${jobId}`);
    return rows[0].id;
  };
  /** Marks the layers up to `throughOrder` (1 = the first layer) done on every surface, one surface a day from `daysAgo`. */
  const markLayers = async (jobId: string, fromOrder: number, throughOrder: number, daysAgo: number) => {
    const items = (await loadWorkItems(tx, jobId)).filter((i) => i.layerOrder >= fromOrder && i.layerOrder <= throughOrder);
    for (const [n, item] of items.entries()) {
      await step(daysAgo - Math.floor(n / 2), () =>
        recordProgress(
          tx,
          ctx.queue,
          crew,
          jobId,
          { kind: 'layerDone', workItemId: item.id, on: day(daysAgo - Math.floor(n / 2)) },
          clock.current,
        ),
      );
    }
  };
  const issue = (id: string, actor: Actor) => issueInvoice(tx, ctx, actor, id, parse(invoiceIssue, { send: true }), clock.current);
  const voidIt = (id: string, reason: string) => voidInvoice(tx, ctx, office, id, parse(invoiceVoid, { reason }).reason, clock.current);
  const pay = async (id: string, method: 'cheque' | 'transfer', share: 'all' | 'half', receivedOn: string, reference: string) => {
    const { rows } = await tx.client.query<{ due: string }>(
      `select (total - amount_paid - amount_credited)::text as due from invoices where tenant_id = $1 and id = $2`,
      [tx.tenantId, id],
    );
    const due = new Decimal(rows[0].due);
    const amount = (share === 'all' ? due : due.div(2)).toDecimalPlaces(2, Decimal.ROUND_DOWN).toFixed(2);
    await recordOfflinePayment(tx, office, id, parse(offlinePaymentCreate, { method, amount, receivedOn, reference }));
  };
  /** The order (1 = first) of the layer the job's stage payment waits for. */
  const stageLayer = async (jobId: string) => {
    const { rows } = await tx.client.query<{ layer_id: string }>(
      `select trigger->>'layerId' as layer_id from payment_schedule_lines where tenant_id = $1 and job_id = $2 and role = 'milestone'`,
      [tx.tenantId, jobId],
    );
    const item = (await loadWorkItems(tx, jobId)).find((i) => i.layerId === rows[0]?.layer_id);
    if (!item) throw new Error(`demo seed: job ${jobId} has no stage payment waiting for a layer`);
    return item.layerOrder;
  };
  const demoClient = async (): Promise<ClientPrincipal> => {
    const { rows } = await tx.client.query<{ id: string; name: string; email: string; firm_name: string }>(
      `select p.id, p.name, p.email, f.name as firm_name from portal_users p join firms f on f.id = p.tenant_id
        where p.tenant_id = $1 and p.client_id = $2`,
      [tx.tenantId, people.clientId],
    );
    return { kind: 'client', id: rows[0].id, tenantId: tx.tenantId, name: rows[0].name, email: rows[0].email, firmName: rows[0].firm_name };
  };
  const changeOrder = async (jobId: string, daysAgo: number, title: string, description: string, price: string) => {
    const made = await step(daysAgo, () =>
      createChangeOrder(
        tx,
        office,
        jobId,
        () => parse(changeOrderCreate, { title, description, pricing: { kind: 'lumpSum', price } }),
        clock.current,
      ),
    );
    await step(daysAgo, () => sendChangeOrder(tx, ctx, office, made.id));
    return made.id;
  };

  // The stair hall: signed ten weeks ago; deposit paid, the stage payment overdue, a change order
  // approved, the walkthrough held this week and its final invoice drafted by the queue for review.
  const hall = await acceptedJob(tx, ctx, clock, at, people, {
    title: 'Stair hall lime plaster',
    optionLabel: 'Layered lime, burnished and waxed',
    systemName: 'Layered lime plaster, burnished and waxed',
    surfaceNames: ['Hall walls', 'Barrel vault'],
    daysAgo: { estimate: 80, sent: 78, accepted: 74, start: 68 },
  });
  await step(72, () => startBilling(tx, ctx.queue, office, hall.jobId, clock.current));
  const hallDeposit = await lineInvoice(hall.jobId, 'deposit');
  await step(72, () => issue(hallDeposit, office));
  await step(64, () => pay(hallDeposit, 'cheque', 'all', day(64), 'Cheque 1184'));
  const hallLayer = await stageLayer(hall.jobId);
  await markLayers(hall.jobId, 1, hallLayer, 54);
  const hallStage = await lineInvoice(hall.jobId, 'milestone');
  await step(49, () => issue(hallStage, office));
  const niche = await changeOrder(
    hall.jobId,
    46,
    'Lime-plaster niche on the half landing',
    'Form and plaster a shallow arched niche in the landing wall, finished like the hall walls.',
    '640.00',
  );
  await step(43, async () =>
    decideChangeOrder(tx, ctx, await demoClient(), niche, () =>
      parse(changeOrderDecision, { decision: 'approve', signedName: 'Hattie Brambleton', consent: true }),
    ),
  );
  await markLayers(hall.jobId, hallLayer + 1, 99, 30);
  await step(5, () => recordProgress(tx, ctx.queue, office, hall.jobId, { kind: 'walkthrough', on: day(5) }, clock.current));
  await lineInvoice(hall.jobId, 'final');

  // The turret room: signed three weeks ago; the first deposit invoice voided (credit note) and
  // billed again, part paid; the first coats done and their stage payment issued; a change order
  // waiting for the client.
  const turret = await acceptedJob(tx, ctx, clock, at, people, {
    title: 'Turret room limewash',
    optionLabel: 'Two-coat limewash',
    systemName: 'Two-coat limewash',
    surfaceNames: ['Round walls', 'Turret ceiling'],
    daysAgo: { estimate: 30, sent: 28, accepted: 24, start: 14 },
  });
  await step(22, () => startBilling(tx, ctx.queue, office, turret.jobId, clock.current));
  const firstDeposit = await lineInvoice(turret.jobId, 'deposit');
  await step(22, () => issue(firstDeposit, office));
  await step(21, () => voidIt(firstDeposit, 'Issued before the colour was settled; billed again with the agreed colour.'));
  checks.add(turret.jobId);
  await step(20, () => Promise.resolve());
  const deposit = await lineInvoice(turret.jobId, 'deposit');
  await step(12, () => issue(deposit, office));
  await step(6, () => pay(deposit, 'transfer', 'half', day(6), 'Bank transfer, first half'));
  await markLayers(turret.jobId, 1, await stageLayer(turret.jobId), 5);
  const turretStage = await lineInvoice(turret.jobId, 'milestone');
  await step(2, () => issue(turretStage, office));
  await changeOrder(
    turret.jobId,
    1,
    'Limewash the window reveals',
    'Carry the limewash into the three window reveals, with the same mineral primer first.',
    '380.00',
  );
}
