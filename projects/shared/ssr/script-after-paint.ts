/**
 * A rendered page is whole without its script: the text, links and the public form (a plain POST)
 * work before the app wakes up, and taps made meanwhile are replayed by Angular's event replay.
 * On a slow phone the app's script (~100 kB) shares the line with the page's stylesheet and fonts,
 * so asking for it at once delays the first paint. The build's `<script type="module">` for the
 * app's main file is therefore swapped for a small inline loader that asks for it once the browser
 * reports its first contentful paint:
 * - at once when the page is not on screen (a background tab paints nothing) or the browser cannot
 *   report paints;
 * - after the next frame when the browser has no paint timing;
 * - after 3 s at the latest.
 */
const MAIN_SCRIPT = /<script src="([^"]*\/main-[A-Za-z0-9]+\.js)" type="module" nonce="([^"]*)"><\/script>/;

/** The loader, as it runs in the browser: `src` and `nonce` are given as JSON strings. */
const LOADER = `(function(){var done=false;function go(){if(done)return;done=true;var s=document.createElement('script');s.type='module';s.src=SRC;s.nonce=NONCE;document.body.appendChild(s)}
var P=window.PerformanceObserver;if(document.visibilityState!=='visible'||!P){go();return}
setTimeout(go,3000);
if(!P.supportedEntryTypes||P.supportedEntryTypes.indexOf('paint')<0){requestAnimationFrame(function(){setTimeout(go,0)});return}
new P(function(list,observer){if(list.getEntriesByName('first-contentful-paint').length){observer.disconnect();go()}}).observe({type:'paint',buffered:true})})()`;

/** The page with its main script asked for after the first paint (unchanged when it has none). */
export function scriptAfterFirstPaint(html: string): string {
  return html.replace(MAIN_SCRIPT, (_tag, src: string, nonce: string) => `<script nonce="${nonce}">${scriptLoader(src, nonce)}</script>`);
}

/** The inline loader of one script (exported for its spec, which runs it against a stand-in browser). */
export function scriptLoader(src: string, nonce: string): string {
  return LOADER.replace('SRC', JSON.stringify(src)).replace('NONCE', JSON.stringify(nonce));
}
