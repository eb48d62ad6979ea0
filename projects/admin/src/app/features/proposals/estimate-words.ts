import { ESTIMATE_STATUS_LABELS, MULTIPLIER_LABELS, type EstimateStatus, type MultiplierName } from '@layerbook/contracts/types';
import { outlineFinish, roundedNumber, waitText, type FinishLayer } from '@layerbook/domain';
import { dateTimeFormat, numberFormat } from '../../../../../shared/i18n/format/intl-cache';

export const statusWord = (status: EstimateStatus): string => ESTIMATE_STATUS_LABELS[status];

/** Said once a save comes back: the stored figures, in the office's words (not the machine's). */
export const SAVED_WORDS = 'Saved — these are the figures on record.';

/** Why the builder opens read-only (the API answers 409 to any change), or null while it can change. */
export function readOnlyReason(status: EstimateStatus): string | null {
  return status === 'accepted'
    ? 'The client accepted this estimate, so it is read-only: its price is the job’s contract sum. Changes go through a change order.'
    : null;
}

/** "ceiling ×1.25 · dome or vault ×1.5", or "no extra time"; the names are the library's. */
export function multiplierChain(chain: ReadonlyArray<{ name: MultiplierName; factor: number }>): string {
  if (chain.length === 0) return 'no extra time';
  return chain.map((step) => `${MULTIPLIER_LABELS[step.name].toLowerCase()} ×${roundedNumber(step.factor, 3)}`).join(' · ');
}

/** A finish system summed up as the library sums it up: "3 layers · waits 100 h (4 days 4 h)". */
export function finishOutlineText(layers: readonly FinishLayer[]): string {
  const outline = outlineFinish(layers);
  const count = `${outline.layerCount} ${outline.layerCount === 1 ? 'layer' : 'layers'}`;
  return outline.totalWaitHours === 0 ? `${count} · no waits` : `${count} · waits ${waitText(outline.totalWaitHours)}`;
}

/** Ratios come as decimal strings ("0.5385"); Intl reads them exactly. */
export function percentText(ratio: string, locale: string): string {
  return numberFormat(locale, { style: 'percent', maximumFractionDigits: 1 }).format(ratio as unknown as number);
}

/** Hour of the day (8.5) as clock time in the viewer's locale ("8:30 AM"). */
export function clockText(hourOfDay: number, locale: string): string {
  const minutes = Math.round(hourOfDay * 60);
  const date = new Date(Date.UTC(2000, 0, 1, 0, minutes));
  return dateTimeFormat(locale, { hour: 'numeric', minute: '2-digit', timeZone: 'UTC' }).format(date);
}

/** "Tue, Jun 10, 8:00 AM" for a calendar date and an hour of that day. */
export function dayAndClock(isoDate: string, hourOfDay: number, locale: string): string {
  const day = dateTimeFormat(locale, { weekday: 'short', month: 'short', day: 'numeric', timeZone: 'UTC' }).format(
    new Date(`${isoDate}T00:00:00Z`),
  );
  return `${day}, ${clockText(hourOfDay, locale)}`;
}

/** "Tuesday, Jun 10". */
export function dayWords(isoDate: string, locale: string): string {
  return dateTimeFormat(locale, { weekday: 'long', month: 'short', day: 'numeric', timeZone: 'UTC' }).format(
    new Date(`${isoDate}T00:00:00Z`),
  );
}
