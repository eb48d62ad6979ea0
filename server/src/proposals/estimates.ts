import type {
  EstimateContext,
  EstimateCreate,
  EstimateInputs,
  EstimateListItem,
  EstimateOptionResult,
  EstimateSave,
  EstimateView,
  KeysetPage,
} from '@layerbook/contracts';
import { assembleEstimateInput } from '@layerbook/contracts';
import { and, clients, desc, eq, estimates, sql, TenantTx } from '@layerbook/db';
import { computeEstimate, DomainInputError, toResultJson } from '@layerbook/domain';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { badRequest, conflict, notFound } from '../http/problem';
import { decimalsMessage, fitsCurrency, MONEY_COLUMN_LIMIT } from '../billing/money';
import { decodeCursor, encodeCursor } from '../inquiries/cursor';
import { loadEstimateContext } from './estimate-context';

export function blankInputs(title: string, startDate: string): EstimateInputs {
  return {
    title,
    startDate,
    isOccupied: false,
    // An option with no surfaces yet: the first save must choose at least one (the schema says so).
    variants: [{ id: 'A', label: 'Option A', surfaces: [] }],
    addOns: [],
    equipment: [],
    subcontracts: [],
    sundries: [],
    discount: null,
    perAreaRates: {},
    internalNotes: '',
    clientNotes: '',
  };
}

const auditedBy = (actor: Actor) => ({ actorUserId: actor.userId, actorKind: actor.kind });

export async function createEstimate(tx: TenantTx, actor: Actor, input: EstimateCreate): Promise<string> {
  const context = await loadEstimateContext(tx, input.siteId);
  if (input.inquiryId) {
    const { rows } = await tx.client.query<{ client_id: string | null }>(
      `select client_id from inquiries where tenant_id = $1 and id = $2`,
      [tx.tenantId, input.inquiryId],
    );
    if (!rows.length) throw badRequest([{ field: 'inquiryId', message: 'Choose an inquiry of this firm.' }]);
    // Accepting the proposal marks its inquiry won: it must be this client's (or not filed under anyone yet).
    if (rows[0].client_id !== null && rows[0].client_id !== context.clientId)
      throw badRequest([{ field: 'inquiryId', message: "That inquiry is another client's. Choose one of this client's." }]);
  }
  const [row] = await tx.db
    .insert(estimates)
    .values({
      tenantId: tx.tenantId,
      siteId: context.siteId,
      clientId: context.clientId,
      inquiryId: input.inquiryId,
      title: input.title,
      startDate: input.startDate,
      inputs: blankInputs(input.title, input.startDate),
    })
    .returning({ id: estimates.id });
  await recordAudit(tx, { ...auditedBy(actor), action: 'estimate.created', entity: 'estimate', entityId: row.id });
  return row.id;
}

export async function getEstimate(tx: TenantTx, id: string): Promise<EstimateView> {
  const row = (
    await tx.db
      .select()
      .from(estimates)
      .where(and(eq(estimates.tenantId, tx.tenantId), eq(estimates.id, id)))
  )[0];
  if (!row) throw notFound('estimate');
  const { siteId: _s, clientId: _c, ...context } = await loadEstimateContext(tx, row.siteId);
  return {
    id: row.id,
    siteId: row.siteId,
    clientId: row.clientId,
    inquiryId: row.inquiryId,
    title: row.title,
    status: row.status,
    // jsonb comes back untyped; both were written by this module (inputs parsed by the contracts schema).
    inputs: row.inputs as EstimateInputs,
    result: (row.result as EstimateView['result']) ?? null,
    price: row.price,
    computedAt: row.computedAt?.toISOString() ?? null,
    context,
  };
}

/** Checks every reference names this site's surfaces and this firm's live finish systems. */
function checkReferences(context: EstimateContext, inputs: EstimateInputs): void {
  const surfaceIds = new Set(context.rooms.flatMap((r) => r.surfaces.map((s) => s.id)));
  const systemIds = new Set(context.finishSystems.map((f) => f.id));
  const problems: Array<{ field: string; message: string }> = [];
  inputs.variants.forEach((v, i) =>
    v.surfaces.forEach((s, j) => {
      if (!surfaceIds.has(s.surfaceId))
        problems.push({ field: `variants.${i}.surfaces.${j}.surfaceId`, message: "Choose one of this site's measured surfaces." });
      if (!systemIds.has(s.finishSystemId))
        problems.push({ field: `variants.${i}.surfaces.${j}.finishSystemId`, message: 'Choose a finish system from the library.' });
    }),
  );
  if (problems.length) throw badRequest(problems);
}

/**
 * Checks every amount the office typed fits the firm's currency (no cents in yen: they would be
 * rounded away without a word), as the firm's settings and billing check theirs.
 */
function checkAmounts(inputs: EstimateInputs, currency: string): void {
  const typed: Array<[string, string]> = [
    ...(['equipment', 'subcontracts', 'sundries'] as const).flatMap((list) =>
      inputs[list].map((l, i): [string, string] => [`${list}.${i}.amount`, l.amount]),
    ),
    ...inputs.addOns.map((a, i): [string, string] => [`addOns.${i}.materialsCost`, a.materialsCost]),
    ...(inputs.discount?.kind === 'amount' ? [['discount.amount', inputs.discount.amount] as [string, string]] : []),
    ...Object.entries(inputs.perAreaRates).map(([id, rate]): [string, string] => [`perAreaRates.${id}`, rate]),
  ];
  const problems = typed
    .filter(([, amount]) => !fitsCurrency(amount, currency))
    .map(([field]) => ({ field, message: decimalsMessage(currency) }));
  if (problems.length) throw badRequest(problems);
}

/** Each option's price and its add-ons' must fit a money column; past it the save is refused, naming the option. */
function checkPricesFit(computed: ReadonlyArray<{ result: ReturnType<typeof computeEstimate> }>): void {
  const problems = computed.flatMap((v, i) =>
    [v.result.price.price, v.result.price.total, ...v.result.options.map((o) => o.price.total)].some((p) =>
      p.abs().greaterThanOrEqualTo(MONEY_COLUMN_LIMIT),
    )
      ? [{ field: `variants.${i}`, message: 'This option’s price is too large to record. Check the amounts and sizes.' }]
      : [],
  );
  if (problems.length) throw badRequest(problems);
}

/** What an accepted estimate answers to every write: the job holds its contract sum now. */
export const ACCEPTED_ESTIMATE_IS_READ_ONLY =
  'This estimate was accepted and is now read-only: its price is the job’s contract sum. Changes go through a change order.';

/** 409 when the estimate was accepted: every write to it, its options or its proposal versions stops here. */
export async function assertEstimateOpen(tx: TenantTx, estimateId: string): Promise<void> {
  const [row] = await tx.db
    .select({ status: estimates.status })
    .from(estimates)
    .where(and(eq(estimates.tenantId, tx.tenantId), eq(estimates.id, estimateId)));
  if (row?.status === 'accepted') throw conflict(ACCEPTED_ESTIMATE_IS_READ_ONLY);
}

/** The stored result of an estimate: each option's numbers and the unit its sizes are in. */
export type EstimateResult = NonNullable<EstimateView['result']>;

/**
 * Prices `inputs` for the site with the engine, from the site's measurements, the firm's estimating
 * settings and library as they are now: the one path every save and every proposal check takes.
 * An engine refusal becomes a 400 naming its field.
 */
export async function priceEstimate(
  tx: TenantTx,
  siteId: string,
  inputs: EstimateInputs,
): Promise<{ result: EstimateResult; prices: Array<{ id: string; price: string }> }> {
  const context = await loadEstimateContext(tx, siteId);
  checkReferences(context, inputs);
  checkAmounts(inputs, context.currency);
  const computed = inputs.variants.map((v, i) => {
    try {
      return { id: v.id, label: v.label, result: computeEstimate(assembleEstimateInput(context, inputs, v.id)) };
    } catch (error) {
      if (error instanceof DomainInputError)
        throw badRequest(
          [{ field: `variants.${i}.${error.field}`, message: error.message }],
          `Option "${v.label}" cannot be priced: ${error.message}`,
        );
      throw error;
    }
  });
  checkPricesFit(computed);
  const prices = computed.map((v) => ({ id: v.id, price: v.result.price.price.toFixed(2) }));
  // Stored as JSON with Decimals as strings, so the stored result has no floats for money.
  const variants: EstimateOptionResult[] = computed.map((v) => ({ id: v.id, label: v.label, result: toResultJson(v.result) }));
  return { result: { variants, lengthUnit: context.lengthUnit }, prices };
}

async function firmTimeZone(tx: TenantTx): Promise<string> {
  const { rows } = await tx.client.query<{ time_zone: string }>(`select time_zone from firms where id = $1`, [tx.tenantId]);
  return rows[0].time_zone;
}

/**
 * Optimistic concurrency: the save names the last save it started from (`computedAt` as loaded, null
 * before the first). Another save since means this one was typed over an older copy and would
 * silently undo it: 409 naming `computedAt`. A save that names none (an older client) is not checked.
 */
async function checkNotSavedSince(tx: TenantTx, savedAt: Date | null, expected: string | null | undefined): Promise<void> {
  if (expected === undefined || savedAt === null || savedAt.toISOString() === expected) return;
  const timeZone = await firmTimeZone(tx);
  const time = new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(savedAt);
  const message = `Someone else saved this estimate at ${time}, after you opened it. Reload to see their changes, then make yours again.`;
  throw conflict(message, [{ field: 'computedAt', message }]);
}

/**
 * Saves the office's choices and recomputes every option with the engine — the stored numbers are
 * the server's, whatever the browser showed. An engine refusal becomes a 400 naming its field.
 * An accepted estimate takes no change (409), so its total cannot drift from the job's contract sum.
 */
export async function saveEstimateInputs(tx: TenantTx, actor: Actor, id: string, save: EstimateSave, now: Date): Promise<EstimateView> {
  const { computedAt: expected, ...inputs } = save;
  const row = (
    await tx.db
      .select()
      .from(estimates)
      .where(and(eq(estimates.tenantId, tx.tenantId), eq(estimates.id, id)))
      .for('update')
  )[0];
  if (!row) throw notFound('estimate');
  if (row.status === 'accepted') throw conflict(ACCEPTED_ESTIMATE_IS_READ_ONLY);
  await checkNotSavedSince(tx, row.computedAt, expected);
  const { result, prices } = await priceEstimate(tx, row.siteId, inputs);
  await tx.db
    .update(estimates)
    .set({
      inputs,
      title: inputs.title,
      startDate: inputs.startDate,
      result,
      price: prices[0].price,
      computedAt: now,
      updatedAt: now,
    })
    .where(and(eq(estimates.tenantId, tx.tenantId), eq(estimates.id, id)));
  await recordAudit(tx, { ...auditedBy(actor), action: 'estimate.saved', entity: 'estimate', entityId: id, data: { prices } });
  return getEstimate(tx, id);
}

export interface EstimateListQuery {
  readonly siteId?: string;
  readonly after?: string;
  readonly limit: number;
}

/** Newest first, keyset over (created_at, id) — the index the table has — so a deep page costs the same as the first. */
export async function listEstimates(tx: TenantTx, q: EstimateListQuery): Promise<KeysetPage<EstimateListItem>> {
  const after = q.after ? decodeCursor(q.after, 'timestamptz') : null;
  const rows = await tx.db
    .select({
      id: estimates.id,
      title: estimates.title,
      status: estimates.status,
      price: estimates.price,
      siteId: estimates.siteId,
      clientId: estimates.clientId,
      clientName: clients.name,
      updatedAt: estimates.updatedAt,
      // the exact timestamp text, so the cursor loses no microseconds
      cursorAt: sql<string>`${estimates.createdAt}::text`,
    })
    .from(estimates)
    .innerJoin(clients, and(eq(clients.tenantId, estimates.tenantId), eq(clients.id, estimates.clientId)))
    .where(
      and(
        eq(estimates.tenantId, tx.tenantId),
        q.siteId ? eq(estimates.siteId, q.siteId) : undefined,
        after ? sql`(${estimates.createdAt}, ${estimates.id}) < (${after.sortValue}::timestamptz, ${after.id}::uuid)` : undefined,
      ),
    )
    .orderBy(desc(estimates.createdAt), desc(estimates.id))
    .limit(q.limit + 1);
  const page = rows.slice(0, q.limit);
  const last = page[page.length - 1];
  return {
    items: page.map(({ cursorAt: _c, updatedAt, ...r }) => ({ ...r, updatedAt: updatedAt.toISOString() })),
    nextCursor: rows.length > q.limit && last ? encodeCursor(last.cursorAt, last.id) : null,
  };
}
