import type { TenantTx } from '@layerbook/db';
import { conflict, HttpError } from '../http/problem';
import { priceEstimate, type EstimateResult } from './estimates';

/** What a proposal is refused with while the estimate's saved numbers are not what its inputs give today. */
export const ESTIMATE_NUMBERS_CHANGED =
  "The estimate's numbers changed since it was saved (measurements, rates or the house's age). Open it, check the new figures and save it again.";

/**
 * A proposal carries the estimate's saved result: sizes, price, day plan and the safety cautions.
 * The measurements, the firm's estimating settings and the site's year built may have changed since
 * that save, and with them the numbers (a house found to be built before 1978 adds the lead-safe
 * caution). So the estimate is priced again from its saved inputs, on the path every save takes, and
 * a result that differs (or inputs that no longer price at all, e.g. a surface deleted) stops the
 * proposal with 409 `estimateId` until the office has looked at the new figures and saved them.
 * An estimate never priced has no result to compare: the proposal's own checks answer for it.
 */
export async function refuseNumbersChangedSinceSaved(tx: TenantTx, estimateId: string): Promise<void> {
  const { rows } = await tx.client.query<{ site_id: string; inputs: Parameters<typeof priceEstimate>[2]; result: EstimateResult | null }>(
    `select site_id, inputs, result from estimates where tenant_id = $1 and id = $2`,
    [tx.tenantId, estimateId],
  );
  const row = rows[0];
  if (!row?.result) return;
  let priced: EstimateResult;
  try {
    priced = (await priceEstimate(tx, row.site_id, row.inputs)).result;
  } catch (error) {
    if (error instanceof HttpError && error.status === 400) throw numbersChanged();
    throw error;
  }
  // jsonb compares by value, whatever the key order or number spelling
  const same = await tx.client.query<{ is_same: boolean }>(
    `select result = $3::jsonb as is_same from estimates where tenant_id = $1 and id = $2`,
    [tx.tenantId, estimateId, JSON.stringify(priced)],
  );
  if (!same.rows[0].is_same) throw numbersChanged();
}

function numbersChanged(): HttpError {
  return conflict(ESTIMATE_NUMBERS_CHANGED, [{ field: 'estimateId', message: ESTIMATE_NUMBERS_CHANGED }]);
}

/**
 * A draft keeps the result it was made from; the estimate saved since with other numbers would send
 * the client the old price. 409 naming the version, saying how to bring the draft up to date.
 */
export async function refuseDraftOlderThanEstimate(tx: TenantTx, versionId: string, version: number): Promise<void> {
  const { rows } = await tx.client.query<{ is_current: boolean }>(
    `select v.result is not distinct from e.result as is_current
       from proposal_versions v join estimates e on e.tenant_id = v.tenant_id and e.id = v.estimate_id
      where v.tenant_id = $1 and v.id = $2`,
    [tx.tenantId, versionId],
  );
  if (rows[0]?.is_current !== false) return;
  const message = `Version ${version} was made from the estimate's earlier numbers, and the estimate was saved with new ones since. Choose "Edit" on this draft and save it to bring in the current figures, then send it.`;
  throw conflict(message, [{ field: 'estimateId', message }]);
}
