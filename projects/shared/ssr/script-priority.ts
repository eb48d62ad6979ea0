/**
 * A rendered page is whole without its scripts: they hydrate what is already drawn. Chromium fetches
 * module scripts (and `modulepreload`s) at high priority, so on a slow phone link they share the
 * bandwidth with the page's stylesheet and fonts and push the first paint back. `fetchpriority="low"`
 * lets the stylesheet and fonts go first; the scripts still load in parallel and run as before
 * (parser-inserted, so the page's load event still waits for them).
 * Plain string replaces of the tags as the Angular build and renderer write them (a regular
 * expression over a 300 kB page cost half a millisecond a render).
 */
const TAGS: ReadonlyArray<readonly [string, string]> = [
  ['<link rel="modulepreload" ', '<link rel="modulepreload" fetchpriority="low" '],
  ['" type="module" ', '" type="module" fetchpriority="low" '],
];

export function withLowPriorityScripts(html: string): string {
  let out = html;
  for (const [tag, lowered] of TAGS) out = out.replaceAll(tag, lowered);
  return out;
}
