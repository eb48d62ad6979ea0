/** `proposal-<title>-v<N>.pdf` (`-signed` before `.pdf` for the signed copy) with the title reduced to safe ASCII for a Content-Disposition header. */
export function proposalFilename(title: string, version: number, isSigned = false): string {
  const slug = title
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/, '');
  return `proposal-${slug || 'untitled'}-v${version}${isSigned ? '-signed' : ''}.pdf`;
}
