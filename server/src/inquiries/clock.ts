import { eq, firms, TenantTx } from '@layerbook/db';
import { localDate } from '../firms/local-date';
import { notFound } from '../http/problem';

/** A firm's calendar at one instant: which day it is there, and the money its pipeline is in. */
export interface FirmClock {
  readonly timeZone: string;
  readonly currency: string;
  readonly today: string;
}

/** The clock of a signed-in staff member's firm, without a query. */
export function staffClock(staff: { timeZone: string; currency: string }, now: Date): FirmClock {
  return { timeZone: staff.timeZone, currency: staff.currency, today: localDate(staff.timeZone, now) };
}

export async function firmClock(tx: TenantTx, now: Date): Promise<FirmClock> {
  const firm = (await tx.db.select({ timeZone: firms.timeZone, currency: firms.currency }).from(firms).where(eq(firms.id, tx.tenantId)))[0];
  if (!firm) throw notFound('firm');
  return { ...firm, today: localDate(firm.timeZone, now) };
}
