/** Text reduced to safe lower-case ASCII words joined by hyphens, for a Content-Disposition filename ('' when nothing is left). */
export function filenameSlug(text: string, maxLength = 60): string {
  return text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, maxLength)
    .replace(/-+$/, '');
}

/** `proposal-<title>-v<N>.pdf` (`-signed` before `.pdf` for the signed copy) with the title reduced to safe ASCII for a Content-Disposition header. */
export function proposalFilename(title: string, version: number, isSigned = false): string {
  return `proposal-${filenameSlug(title) || 'untitled'}-v${version}${isSigned ? '-signed' : ''}.pdf`;
}
