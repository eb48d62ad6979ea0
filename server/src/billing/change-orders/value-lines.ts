import type { TenantTx } from '@layerbook/db';
import { allocateByWeights, minorUnitDigits } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { conflict } from '../../http/problem';
import { billedWorkByLine, loadValueLines } from '../progress-invoice';

/**
 * Keeps the schedule of values adding up to the contract sum when a change order is approved. An
 * addition is its own line ("Change order #2: Hall ceiling"), as progress billing lists it. A
 * deduction comes off the lines no work has touched yet (nothing billed, nothing recorded, nothing
 * stored), in proportion to their values, so no recorded or billed figure moves; when those lines
 * cannot absorb it, the approval is refused (the firm then credits the client instead).
 */
export async function changeValueLines(
  tx: TenantTx,
  change: { id: string; jobId: string; label: string; amount: string; currency: string; isProgressBilled: boolean },
  now: Date,
): Promise<void> {
  const amount = new Decimal(change.amount);
  const untouchedRoom = amount.isNegative() ? await untouchedLines(tx, change.jobId) : null;
  // A job billed by its payment schedule never bills from these lines: keep the deduction as its own line if it must.
  const cannotSpread = untouchedRoom !== null && amount.negated().greaterThan(untouchedRoom.room);
  if (!amount.isNegative() || (cannotSpread && !change.isProgressBilled)) {
    await tx.client.query(
      `insert into job_value_lines (tenant_id, job_id, position, label, scheduled_value, change_order_id)
       values ($1, $2, (select coalesce(max(position), 0) + 1 from job_value_lines where tenant_id = $1 and job_id = $2), $3, $4, $5)`,
      [tx.tenantId, change.jobId, change.label, change.amount, change.id],
    );
    return;
  }
  const { untouched } = untouchedRoom!;
  const cut = amount.negated();
  if (cannotSpread) {
    throw conflict('This deduction is larger than the work not yet started on the schedule of values; ask the firm to credit it instead.');
  }
  const shares = allocateByWeights(
    cut,
    untouched.map((l) => new Decimal(l.scheduled_value)),
    minorUnitDigits(change.currency),
    'changeOrder',
  );
  for (const [i, line] of untouched.entries()) {
    await tx.client.query(
      `update job_value_lines set scheduled_value = scheduled_value - $3::numeric, updated_at = $4 where tenant_id = $1 and id = $2`,
      [tx.tenantId, line.id, shares[i].toFixed(2), now],
    );
  }
}

/** Whether a deduction fits in the value lines no work has touched, as changeValueLines spreads it on a progress-billed job. */
export async function deductionFitsUntouched(tx: TenantTx, jobId: string, amount: string): Promise<boolean> {
  const { room } = await untouchedLines(tx, jobId);
  return !new Decimal(amount).negated().greaterThan(room);
}

/** Value lines no work has touched: nothing billed, no percent recorded, nothing stored. */
async function untouchedLines(tx: TenantTx, jobId: string) {
  const billed = await billedWorkByLine(tx, jobId);
  const untouched = (await loadValueLines(tx, jobId)).filter(
    (l) =>
      new Decimal(l.percent_complete).isZero() &&
      new Decimal(l.stored_materials).isZero() &&
      (billed.get(l.id) ?? new Decimal(0)).isZero() &&
      new Decimal(l.scheduled_value).greaterThan(0),
  );
  return { untouched, room: untouched.reduce((sum, l) => sum.plus(l.scheduled_value), new Decimal(0)) };
}
