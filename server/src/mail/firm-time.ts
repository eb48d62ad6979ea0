import type { Tx } from '@layerbook/db';

/**
 * A moment as the firm reads it: date and time in the firm's own time zone, with the zone's short
 * name ("December 1, 2026 at 9:15 PM EST"). E-mails never show UTC to people who live elsewhere.
 */
export function firmDateTime(at: Date, locale: string, timeZone: string): string {
  return new Intl.DateTimeFormat(locale, { dateStyle: 'long', timeStyle: 'short', timeZone })
    .format(at)
    .concat(' ', zoneName(at, locale, timeZone));
}

function zoneName(at: Date, locale: string, timeZone: string): string {
  const part = new Intl.DateTimeFormat(locale, { timeZone, timeZoneName: 'short' })
    .formatToParts(at)
    .find((p) => p.type === 'timeZoneName');
  return part?.value ?? timeZone;
}

/** The firm's time zone (Settings), read in the caller's firm transaction. */
export async function firmTimeZone(tx: Tx, tenantId: string): Promise<string> {
  const { rows } = await tx.client.query<{ time_zone: string }>(`select time_zone from firms where id = $1`, [tenantId]);
  return rows[0]?.time_zone ?? 'UTC';
}
