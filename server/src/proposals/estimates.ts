import type { EstimateContext, EstimateCreate, EstimateInputs } from '@layerbook/contracts';
import { assembleEstimateInput } from '@layerbook/contracts';
import { and, eq, estimates, TenantTx } from '@layerbook/db';
import { computeEstimate, DomainInputError, type EstimateResult } from '@layerbook/domain';
import { recordAudit } from '../audit/record';
import { badRequest, notFound } from '../http/problem';
import { loadEstimateContext } from './estimate-context';

export interface VariantResult {
  readonly id: string;
  readonly label: string;
  readonly result: EstimateResult;
}

export interface EstimateView {
  readonly id: string;
  readonly siteId: string;
  readonly clientId: string;
  readonly inquiryId: string | null;
  readonly title: string;
  readonly status: string;
  readonly inputs: EstimateInputs;
  /** the server's numbers, per option; null until the first save with a finish on some surface */
  readonly result: { variants: VariantResult[] } | null;
  readonly price: string | null;
  readonly computedAt: string | null;
  /** what the browser needs to recompute live with the same engine */
  readonly context: EstimateContext;
}

export function blankInputs(title: string, startDate: string): EstimateInputs {
  return {
    title,
    startDate,
    isOccupied: false,
    variants: [{ id: 'A', label: 'Option A', surfaces: [] as unknown as EstimateInputs['variants'][number]['surfaces'] }],
    addOns: [],
    equipment: [],
    subcontracts: [],
    sundries: [],
    discount: null,
    perAreaRates: {},
  };
}

export async function createEstimate(tx: TenantTx, actorUserId: string, input: EstimateCreate): Promise<string> {
  const context = await loadEstimateContext(tx, input.siteId);
  if (input.inquiryId) {
    const { rows } = await tx.client.query(`select 1 from inquiries where tenant_id = $1 and id = $2`, [tx.tenantId, input.inquiryId]);
    if (!rows.length) throw badRequest([{ field: 'inquiryId', message: 'Choose an inquiry of this firm.' }]);
  }
  const [row] = await tx.db
    .insert(estimates)
    .values({ tenantId: tx.tenantId, siteId: context.siteId, clientId: context.clientId, inquiryId: input.inquiryId, title: input.title, startDate: input.startDate, inputs: blankInputs(input.title, input.startDate) })
    .returning({ id: estimates.id });
  await recordAudit(tx, { actorUserId, actorKind: 'staff', action: 'estimate.created', entity: 'estimate', entityId: row!.id });
  return row!.id;
}

export async function getEstimate(tx: TenantTx, id: string): Promise<EstimateView> {
  const row = (await tx.db.select().from(estimates).where(and(eq(estimates.tenantId, tx.tenantId), eq(estimates.id, id))))[0];
  if (!row) throw notFound('estimate');
  const { siteId: _s, clientId: _c, ...context } = await loadEstimateContext(tx, row.siteId);
  return {
    id: row.id,
    siteId: row.siteId,
    clientId: row.clientId,
    inquiryId: row.inquiryId,
    title: row.title,
    status: row.status,
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
      if (!surfaceIds.has(s.surfaceId)) problems.push({ field: `variants.${i}.surfaces.${j}.surfaceId`, message: "Choose one of this site's measured surfaces." });
      if (!systemIds.has(s.finishSystemId)) problems.push({ field: `variants.${i}.surfaces.${j}.finishSystemId`, message: 'Choose a finish system from the library.' });
    }),
  );
  if (problems.length) throw badRequest(problems);
}

/**
 * Saves the office's choices and recomputes every option with the engine — the stored numbers are
 * the server's, whatever the browser showed. An engine refusal becomes a 400 naming its field.
 */
export async function saveEstimateInputs(tx: TenantTx, actorUserId: string, id: string, inputs: EstimateInputs): Promise<EstimateView> {
  const row = (await tx.db.select().from(estimates).where(and(eq(estimates.tenantId, tx.tenantId), eq(estimates.id, id))).for('update'))[0];
  if (!row) throw notFound('estimate');
  const context = await loadEstimateContext(tx, row.siteId);
  checkReferences(context, inputs);
  const variants: VariantResult[] = inputs.variants.map((v, i) => {
    try {
      return { id: v.id, label: v.label, result: computeEstimate(assembleEstimateInput(context, inputs, v.id)) };
    } catch (error) {
      if (error instanceof DomainInputError) throw badRequest([{ field: `variants.${i}.${error.field}`, message: error.message }], `Option "${v.label}" cannot be priced: ${error.message}`);
      throw error;
    }
  });
  // JSON keeps Decimals as strings (Decimal#toJSON), so the stored result has no floats for money.
  const result = JSON.parse(JSON.stringify({ variants })) as { variants: VariantResult[] };
  await tx.db
    .update(estimates)
    .set({ inputs, title: inputs.title, startDate: inputs.startDate, result, price: variants[0]!.result.price.price.toFixed(2), computedAt: new Date(), updatedAt: new Date() })
    .where(and(eq(estimates.tenantId, tx.tenantId), eq(estimates.id, id)));
  await recordAudit(tx, { actorUserId, actorKind: 'staff', action: 'estimate.saved', entity: 'estimate', entityId: id, data: { prices: variants.map((v) => ({ id: v.id, price: v.result.price.price.toFixed(2) })) } });
  return getEstimate(tx, id);
}

export async function listEstimates(tx: TenantTx, siteId?: string) {
  const { rows } = await tx.client.query(
    `select e.id, e.title, e.status, e.price::text as price, e.site_id, e.client_id, c.name as client_name, e.created_at, e.updated_at
       from estimates e join clients c on c.id = e.client_id
      where e.tenant_id = $1 ${siteId ? 'and e.site_id = $2' : ''} order by e.updated_at desc limit 200`,
    siteId ? [tx.tenantId, siteId] : [tx.tenantId],
  );
  return rows.map((r) => ({ id: r.id, title: r.title, status: r.status, price: r.price, siteId: r.site_id, clientId: r.client_id, clientName: r.client_name, updatedAt: r.updated_at.toISOString() }));
}
