import { CLIENT_LIMITS, type Language } from '@layerbook/contracts';
import { badRequest } from '../http/problem';

/** What a merge reads of each client. */
export interface MergedFields {
  readonly name: string;
  readonly email: string;
  readonly phone: string;
  readonly notes: string;
  readonly language: Language | null;
}

/** The heading of the duplicate's part of the notes, in the firm's language (the notes are the office's own). */
const FROM_MERGED: Readonly<Record<Language, { heading: string; email: string; phone: string }>> = {
  en: { heading: 'From the merged record "{{name}}":', email: 'E-mail', phone: 'Phone' },
  es: { heading: 'Del registro fusionado «{{name}}»:', email: 'Correo', phone: 'Teléfono' },
};

/**
 * What the kept client takes from the duplicate, so nothing only the duplicate knew is lost: each
 * blank field is filled from it, and its notes — with an e-mail or phone that differs from the kept
 * one's — are added below the kept notes under a heading naming the merged record. Nothing changes
 * when the duplicate knew nothing more. Refuses (400) notes that together would pass the limit, so
 * the kept client can still be saved from its form.
 */
export function fieldsFromDuplicate(
  kept: MergedFields,
  duplicate: MergedFields,
  firmLanguage: Language,
): { patch: Partial<Omit<MergedFields, 'name'>>; taken: Record<string, string> } {
  const patch: { -readonly [K in keyof MergedFields]?: MergedFields[K] } = {};
  if (!kept.email.trim() && duplicate.email.trim()) patch.email = duplicate.email;
  if (!kept.phone.trim() && duplicate.phone.trim()) patch.phone = duplicate.phone;
  if (kept.language === null && duplicate.language !== null) patch.language = duplicate.language;

  const words = FROM_MERGED[firmLanguage];
  const differs = (a: string, b: string) => a.trim() !== '' && b.trim() !== '' && a.trim().toLowerCase() !== b.trim().toLowerCase();
  const extra = [
    differs(kept.email, duplicate.email) ? `${words.email}: ${duplicate.email}` : '',
    differs(kept.phone, duplicate.phone) ? `${words.phone}: ${duplicate.phone}` : '',
    duplicate.notes.trim(),
  ].filter((line) => line !== '');
  if (extra.length > 0) {
    const block = [words.heading.replace('{{name}}', duplicate.name), ...extra].join('\n');
    const notes = kept.notes.trim() ? `${kept.notes.trimEnd()}\n\n${block}` : block;
    if (notes.length > CLIENT_LIMITS.notes) {
      throw badRequest([
        {
          field: 'intoClientId',
          message: `Together the two clients' notes pass ${CLIENT_LIMITS.notes} characters; shorten the notes of one of them first.`,
        },
      ]);
    }
    patch.notes = notes;
  }
  // The audit keeps what came from the duplicate (the notes as its own part, not the whole result).
  const taken: Record<string, string> = {};
  for (const key of ['email', 'phone', 'language'] as const) if (patch[key]) taken[key] = patch[key];
  if (patch.notes) taken['notes'] = extra.join('\n');
  return { patch, taken };
}
