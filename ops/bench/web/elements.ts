/**
 * The LCP element and the layout shifts of one page load, seen by the page itself (PerformanceObserver),
 * for when Lighthouse cannot name them: Lighthouse 12.2.3's trace-elements step fails on newer
 * Chromium traces ("Dependency RootCauses failed … frame_sequence"), which leaves its
 * largest-contentful-paint-element and layout-shifts audits empty. The load is throttled the way
 * Lighthouse's applied ("devtools") mobile setting does — its Moto G Power screen, 562.5 ms request
 * latency, 1.47 Mbps down, a 4× slower CPU — so fonts arrive late enough to shift what they would on a phone.
 */

/** What the page records; runs in the browser before any of its own scripts. */
const OBSERVER = `(() => {
  const seen = { lcp: null, shifts: [] };
  window.__lbSeen = seen;
  const name = (n) => {
    if (!n) return 'none';
    if (!n.tagName) return n.nodeName.toLowerCase() + (n.textContent ? ' "' + n.textContent.trim().slice(0, 50) + '"' : '');
    let s = n.tagName.toLowerCase() + (n.id ? '#' + n.id : '');
    const cls = [...n.classList].slice(0, 3);
    if (cls.length) s += '.' + cls.join('.');
    const text = (n.textContent || '').trim().replace(/\\s+/g, ' ').slice(0, 50);
    return s + (text ? ' "' + text + '"' : '');
  };
  new PerformanceObserver((list) => {
    for (const e of list.getEntries()) seen.lcp = { time: e.startTime, element: name(e.element), url: e.url || '' };
  }).observe({ type: 'largest-contentful-paint', buffered: true });
  new PerformanceObserver((list) => {
    for (const e of list.getEntries()) {
      if (!e.hadRecentInput) seen.shifts.push({ value: e.value, time: e.startTime, sources: e.sources.map((s) => name(s.node)) });
    }
  }).observe({ type: 'layout-shift', buffered: true });
})();`;

interface Seen {
  lcp: { time: number; element: string; url: string } | null;
  shifts: Array<{ value: number; time: number; sources: string[] }>;
  fonts: Array<{ name: string; end: number }>;
}

export interface PageElements {
  /** the sum of the load's shifts (no session windows: an upper bound of its CLS) */
  shiftTotal: number;
  lcpElement: string;
  clsCulprits: string[];
}

/** One throttled load of `url` in a fresh browser: its LCP element and each layout shift with the font that came in just before it. */
export async function observeElements(chromium: string, flags: string[], url: string, cookie?: string): Promise<PageElements> {
  const { default: puppeteer } = await import('puppeteer-core');
  const browser = await puppeteer.launch({ executablePath: chromium, args: flags, headless: true });
  try {
    const page = await browser.newPage();
    await page.setViewport({ width: 412, height: 823, deviceScaleFactor: 1.75, isMobile: true, hasTouch: true });
    if (cookie) await page.setExtraHTTPHeaders({ Cookie: cookie });
    const cdp = await page.createCDPSession();
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 562.5,
      downloadThroughput: (1474.56 * 1024) / 8,
      uploadThroughput: (675 * 1024) / 8,
    });
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
    await page.evaluateOnNewDocument(OBSERVER);
    await page.goto(url, { waitUntil: 'load', timeout: 120_000 });
    await new Promise((r) => setTimeout(r, 3000)); // late fonts and hydration
    const seen = await page.evaluate(`({
      ...window.__lbSeen,
      fonts: performance.getEntriesByType('resource').filter((r) => r.initiatorType === 'css' && /\\.woff2?$/.test(r.name))
        .map((r) => ({ name: r.name.split('/').pop(), end: r.responseEnd })),
    })`);
    return describeSeen(seen as Seen);
  } finally {
    await browser.close();
  }
}

function describeSeen(seen: Seen): PageElements {
  const s = (ms: number) => `${(ms / 1000).toFixed(2)} s`;
  const lcpElement = seen.lcp ? `${seen.lcp.element}${seen.lcp.url ? ` (${seen.lcp.url})` : ''} at ${s(seen.lcp.time)}` : 'none seen';
  const clsCulprits = [...seen.shifts]
    .sort((a, b) => b.value - a.value)
    .slice(0, 5)
    .map((shift) => {
      const font = [...seen.fonts].filter((f) => f.end <= shift.time).sort((a, b) => b.end - a.end)[0];
      const after = font && shift.time - font.end < 500 ? ` — ${Math.round(shift.time - font.end)} ms after font ${font.name} arrived` : '';
      return `${shift.value.toFixed(3)} at ${s(shift.time)}: ${shift.sources.join(', ') || 'no source named'}${after}`;
    });
  return { shiftTotal: seen.shifts.reduce((sum, shift) => sum + shift.value, 0), lcpElement, clsCulprits };
}
