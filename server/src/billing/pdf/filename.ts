import { filenameSlug } from '../../proposals/pdf/filename';

/** `invoice-inv-0007-<job>.pdf`, `invoice-draft-<job>.pdf` for a draft: safe ASCII for a Content-Disposition header. */
export function invoiceFilename(number: string | null, jobTitle: string): string {
  return ['invoice', filenameSlug(number ?? 'draft', 20) || 'draft', filenameSlug(jobTitle)].filter(Boolean).join('-') + '.pdf';
}

/** `credit-note-cn-0002-<job>.pdf` */
export function creditNoteFilename(number: string, jobTitle: string): string {
  return ['credit-note', filenameSlug(number, 20), filenameSlug(jobTitle)].filter(Boolean).join('-') + '.pdf';
}
