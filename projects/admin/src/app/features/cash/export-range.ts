import { isDateYearAllowed } from '../../shared/forms/iso-date';

export const EXPORT_KINDS = [
  { kind: 'invoices', label: 'Invoices' },
  { kind: 'payments', label: 'Payments' },
  { kind: 'refunds', label: 'Refunds' },
  { kind: 'credit-notes', label: 'Credit notes' },
  { kind: 'clients', label: 'Clients' },
] as const;
export type ExportKind = (typeof EXPORT_KINDS)[number]['kind'];

/** The longest range one export covers; the API refuses longer ones the same way. */
export const EXPORT_MAX_YEARS = 5;

const ISO_DAY = /^(\d{4})-(\d{2})-(\d{2})$/;

/** What is wrong with a chosen range, in words beside the fields, or null when the files can be made. */
export function exportRangeProblem(from: string, to: string): { field: 'from' | 'to'; message: string } | null {
  const start = ISO_DAY.exec(from);
  if (!start || !isDateYearAllowed(Number(start[1]))) return { field: 'from', message: 'Choose the first day.' };
  const end = ISO_DAY.exec(to);
  if (!end || !isDateYearAllowed(Number(end[1]))) return { field: 'to', message: 'Choose the last day.' };
  if (from > to) return { field: 'to', message: 'The last day is before the first day.' };
  const limit = `${Number(start[1]) + EXPORT_MAX_YEARS}-${start[2]}-${start[3]}`;
  if (to >= limit) return { field: 'to', message: `One export covers at most ${EXPORT_MAX_YEARS} years.` };
  return null;
}

/** The address of one export: the browser downloads it as a file with the session's cookie. */
export function exportHref(kind: ExportKind, from: string, to: string): string {
  return `/api/cash/exports/${kind}.csv?${new URLSearchParams({ from, to }).toString()}`;
}

/** The range offered first: from the first of January of this year to today, as calendar days. */
export function defaultExportRange(today: string): { from: string; to: string } {
  return { from: `${today.slice(0, 4)}-01-01`, to: today };
}
