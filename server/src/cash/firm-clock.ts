import type { TenantTx } from '@layerbook/db';
import { localDate } from '../firms/local-date';

export interface FirmClock {
  /** today in the firm's zone */
  today: string;
  currency: string;
  timeZone: string;
}

/** The firm's local date, currency and zone (one round trip). */
export async function firmClock(tx: TenantTx, now: Date): Promise<FirmClock> {
  const { rows } = await tx.client.query<{ currency: string; time_zone: string }>(`select currency, time_zone from firms where id = $1`, [
    tx.tenantId,
  ]);
  const firm = rows[0];
  return { today: localDate(firm.time_zone, now), currency: firm.currency, timeZone: firm.time_zone };
}
