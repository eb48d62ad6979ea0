const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

/** The address of the firm's public inquiry form (served by the portal, works without scripts). */
export function inquiryFormUrl(origin: string, slug: string): string {
  return `${origin.replace(/\/+$/, '')}/portal/f/${encodeURIComponent(slug)}/inquiry`;
}

/**
 * A link to paste into the firm's own website. A plain link, not a frame: the form refuses to be
 * framed (its Content-Security-Policy says frame-ancestors 'none').
 */
export function inquiryFormSnippet(url: string, firmName: string): string {
  return (
    `<a href="${escapeHtml(url)}" target="_blank" rel="noopener" ` +
    `style="display:inline-block;padding:10px 18px;border-radius:6px;background:#6b4a2f;color:#fff;text-decoration:none">` +
    `Ask ${escapeHtml(firmName)} about your walls and ceilings</a>`
  );
}
