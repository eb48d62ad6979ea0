import type { ChangeOrderEngineDetail, ChangeOrderPricing, EstimateInputs, TaxMode } from '@layerbook/contracts';
import { assembleEstimateInput, toEngineSettings } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { computeEstimate, DomainInputError, measureText, minorUnitDigits, salesTax, toResultJson } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { getEstimatingSettings } from '../../firms/estimating';
import { badRequest } from '../../http/problem';
import { loadEstimateContext } from '../../proposals/estimate-context';
import { type ChangeOrderCrewPart, crewPartOf } from '../../jobs/sheet/change-order-work';
import { type JobWorkItem, workItemsOf } from '../work-items';
import { MONEY_COLUMN_LIMIT } from '../money';

/** What `change_orders.detail` holds: how it was priced, and the sums the client approved. */
export interface StoredDetail {
  /** the firm's tax mode when it was priced */
  readonly taxMode?: TaxMode;
  readonly surfaceIds?: readonly string[];
  readonly finishSystemId?: string;
  readonly engine?: ChangeOrderEngineDetail;
  /** engine pricing: the layers on each surface it adds, which become the job's work to mark when approved */
  readonly workItems?: readonly ChangeOrderWorkItem[];
  /** engine pricing: what the crew's job sheet shows of the added work once approved (no price) */
  readonly crew?: ChangeOrderCrewPart;
  /** frozen at approval */
  readonly contractSumBefore?: string;
  readonly contractSumAfter?: string;
}

export type ChangeOrderWorkItem = Pick<JobWorkItem, 'roomName' | 'surfaceId' | 'surfaceName' | 'layerId' | 'layerName' | 'layerOrder'>;

export interface PricedChangeOrder {
  readonly pricing: ChangeOrderPricing['kind'];
  readonly price: string;
  readonly tax: string;
  readonly amount: string;
  readonly detail: StoredDetail;
}

/** The job as pricing needs it. */
export interface PricingJob {
  readonly siteId: string;
  readonly estimateId: string;
  readonly currency: string;
  readonly startDate: string | null;
  /** the tax inside the contract sum as it stands */
  readonly contractTax: string;
}

/** The engine's option id for the one-variant input. */
const VARIANT = 'change-order';

/**
 * Prices a change order. A lump sum is the office's price, taxed by the firm's mode: on the whole
 * job, price × rate rounded to the currency; taxed on materials only (or not at all), a lump sum
 * has no materials line and carries no tax. A deduction's tax never takes off more than the contract's. Engine pricing runs the estimate engine on exactly the
 * chosen surfaces with the chosen finish — the same assembly and computation the estimates use.
 */
export async function priceChangeOrder(
  tx: TenantTx,
  job: PricingJob,
  pricing: ChangeOrderPricing,
  today: string,
): Promise<PricedChangeOrder> {
  const digits = minorUnitDigits(job.currency);
  if (pricing.kind === 'lumpSum') {
    const price = new Decimal(pricing.price);
    if (price.decimalPlaces() > digits)
      throw badRequest([{ field: 'pricing.price', message: `Use at most ${digits} decimals for ${job.currency}.` }]);
    const { settings, lengthUnit } = await getEstimatingSettings(tx);
    const rule = toEngineSettings(settings, lengthUnit, job.currency).tax;
    const { tax } = salesTax(rule, { materials: new Decimal(0), price }, job.currency);
    // A deduction gives back at most the tax the contract carries (none, when it was sold untaxed).
    const given = Decimal.max(tax, new Decimal(job.contractTax).negated());
    return money('lumpSum', price, given, digits, { taxMode: settings.tax.mode });
  }
  return priceWithEngine(tx, job, pricing, today, digits);
}

async function priceWithEngine(
  tx: TenantTx,
  job: PricingJob,
  pricing: Extract<ChangeOrderPricing, { kind: 'engine' }>,
  today: string,
  digits: number,
): Promise<PricedChangeOrder> {
  const loaded = await loadEstimateContext(tx, job.siteId);
  // The firm's minimum charge is the least a job is worth taking on; work added to a job under way
  // is priced for itself (common practice, no source).
  const context = { ...loaded, settings: { ...loaded.settings, minimumCharge: null } };
  const onSite = new Set(context.rooms.flatMap((r) => r.surfaces.map((s) => s.id)));
  const problems: Array<{ field: string; message: string }> = [];
  pricing.surfaceIds.forEach((id, i) => {
    if (!onSite.has(id)) problems.push({ field: `pricing.surfaceIds.${i}`, message: "Choose one of this site's measured surfaces." });
    else if (pricing.surfaceIds.indexOf(id) !== i)
      problems.push({ field: `pricing.surfaceIds.${i}`, message: 'This surface is chosen twice.' });
  });
  const system = context.finishSystems.find((f) => f.id === pricing.finishSystemId);
  if (!system) problems.push({ field: 'pricing.finishSystemId', message: 'Choose a finish system from the library.' });
  if (problems.length || !system) throw badRequest(problems);

  const isOccupied = (
    await tx.client.query<{ is_occupied: boolean | null }>(
      `select (inputs->>'isOccupied')::boolean as is_occupied from estimates where tenant_id = $1 and id = $2`,
      [tx.tenantId, job.estimateId],
    )
  ).rows[0]?.is_occupied;
  const inputs = changeOrderInputs(pricing, job.startDate ?? today, isOccupied === true);
  let result;
  try {
    result = computeEstimate(assembleEstimateInput(context, inputs, VARIANT));
  } catch (error) {
    if (error instanceof DomainInputError)
      throw badRequest([{ field: 'pricing', message: error.message }], `These surfaces cannot be priced: ${error.message}`);
    throw error;
  }
  const roomOf = new Map(context.rooms.map((r) => [r.id, r.name]));
  const engine: ChangeOrderEngineDetail = {
    finishName: system.name,
    surfaces: result.surfaces.map((s) => ({
      room: roomOf.get(s.roomId) ?? '',
      surface: s.name,
      quantity: measureText(s.measure, context.lengthUnit),
    })),
    labourHours: new Decimal(result.labour.totalCrewHours).toFixed(2),
    workingDays: result.schedule.workingDays,
  };
  return money('engine', result.price.price, result.price.tax, digits, {
    taxMode: context.settings.tax.mode,
    surfaceIds: pricing.surfaceIds,
    finishSystemId: pricing.finishSystemId,
    engine,
    crew: crewPartOf(toResultJson(result), context, system),
    workItems: workItemsOf(result.surfaces, null, roomOf).map(({ roomName, surfaceId, surfaceName, layerId, layerName, layerOrder }) => ({
      roomName,
      surfaceId,
      surfaceName,
      layerId,
      layerName,
      layerOrder,
    })),
  });
}

/** One option with just the chosen surfaces under the chosen finish, and no extra cost lines. */
export function changeOrderInputs(
  pricing: Extract<ChangeOrderPricing, { kind: 'engine' }>,
  startDate: string,
  isOccupied: boolean,
): EstimateInputs {
  return {
    title: 'Change order',
    startDate,
    isOccupied,
    variants: [
      {
        id: VARIANT,
        label: 'Change order',
        surfaces: pricing.surfaceIds.map((surfaceId) => ({ surfaceId, finishSystemId: pricing.finishSystemId })),
      },
    ],
    addOns: [],
    equipment: [],
    subcontracts: [],
    sundries: [],
    discount: null,
    perAreaRates: {},
  };
}

function money(kind: ChangeOrderPricing['kind'], price: Decimal, tax: Decimal, digits: number, detail: StoredDetail): PricedChangeOrder {
  if (price.plus(tax).abs().greaterThanOrEqualTo(MONEY_COLUMN_LIMIT))
    throw badRequest([{ field: kind === 'lumpSum' ? 'pricing.price' : 'pricing', message: 'The amount with its tax is too large.' }]);
  return { pricing: kind, price: price.toFixed(digits), tax: tax.toFixed(digits), amount: price.plus(tax).toFixed(digits), detail };
}
