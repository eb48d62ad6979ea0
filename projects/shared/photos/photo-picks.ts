import { toProblem } from '../errors/problem';
import type { KeyedWord } from '../forms/field-error-pipe';

/** Photos sent from one pick of the file chooser; more are refused with a word, not silently. */
export const PHOTOS_PER_PICK = 10;

export interface ScreenedPick {
  /** the files to send, in the order chosen */
  readonly accepted: readonly File[];
  /** one sentence per file left out, and one if the pick was too large: words keys (common.photoGallery.*) with params */
  readonly refusals: readonly KeyedWord[];
}

const megabytes = (bytes: number) => `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB`;

/**
 * The checks worth making before a phone on a site connection starts sending: how many, and how
 * large. The server still decides (it decodes every file).
 */
export function screenPick(files: readonly File[], maxBytes: number, perPick = PHOTOS_PER_PICK): ScreenedPick {
  const refusals: KeyedWord[] = [];
  if (files.length > perPick) refusals.push({ key: 'common.photoGallery.tooMany', params: { count: perPick } });
  const accepted = files.slice(0, perPick).filter((file) => {
    if (file.size <= maxBytes) return true;
    refusals.push({ key: 'common.photoGallery.tooLarge', params: { name: file.name, size: megabytes(maxBytes) } });
    return false;
  });
  return { accepted, refusals };
}

/** The thumbnail's width at the strip's height, so the layout does not jump as images arrive. */
export function thumbnailWidth(photo: { readonly width: number | null; readonly height: number | null }, height: number): number {
  return photo.width && photo.height ? Math.round((height * photo.width) / photo.height) : height;
}

/** Whole percent sent so far; null until the browser knows the total. */
export function uploadPercent(loaded: number, total: number | undefined): number | null {
  return total ? Math.min(100, Math.round((100 * loaded) / total)) : null;
}

/** The server's own words for a refused photo: the field message (it names `file`) before the summary. */
export function photoProblemText(error: unknown): string {
  const problem = toProblem(error);
  return problem.errors?.[0]?.message ?? problem.detail ?? problem.title;
}
