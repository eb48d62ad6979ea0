import { describe, expect, it } from 'vitest';
import { scriptAfterFirstPaint, scriptLoader } from './script-after-paint';

const PAGE = `<!DOCTYPE html><html><head><title>Today</title></head><body><lb-root>…</lb-root>
<script nonce="abc">(event contract)</script><script src="/portal/main-WWV7NKZE.js" type="module" nonce="abc"></script>
<script id="ng-state" type="application/json">{}</script></body></html>`;

interface Appended {
  type: string;
  src: string;
  nonce: string;
}

/** A stand-in browser for the loader: what it appends, its timers and frames, and its paint observer. */
function standIn(options: { visibility?: string; paintTiming?: 'reported' | 'unknown' | 'none' }) {
  const appended: Appended[] = [];
  const timers: { ms: number; run: () => void }[] = [];
  const frames: (() => void)[] = [];
  let reportPaint: ((name: string) => void) | undefined;
  const document = {
    visibilityState: options.visibility ?? 'visible',
    createElement: () => ({ type: '', src: '', nonce: '' }),
    body: { appendChild: (element: Appended) => appended.push(element) },
  };
  class Observer {
    static supportedEntryTypes = options.paintTiming === 'unknown' ? ['navigation'] : ['paint', 'navigation'];
    constructor(private readonly callback: (list: unknown, observer: unknown) => void) {}
    observe(): void {
      reportPaint = (name) => this.callback({ getEntriesByName: (wanted: string) => (wanted === name ? [{ name }] : []) }, this);
    }
    disconnect(): void {
      reportPaint = undefined;
    }
  }
  const window = { PerformanceObserver: options.paintTiming === 'none' ? undefined : Observer };
  const setTimeout = (run: () => void, ms: number) => timers.push({ ms, run });
  const requestAnimationFrame = (run: () => void) => frames.push(run);
  // The loader's own text, as the page carries it, run against the stand-ins.
  // eslint-disable-next-line @typescript-eslint/no-implied-eval
  const run = new Function('document', 'window', 'setTimeout', 'requestAnimationFrame', scriptLoader('/portal/main-X.js', 'abc'));
  run(document, window, setTimeout, requestAnimationFrame);
  return {
    appended,
    paint: (name: string) => reportPaint?.(name),
    frame: () => frames.splice(0).forEach((f) => f()),
    timePasses: (ms: number) => timers.filter((t) => t.ms <= ms).forEach((t) => t.run()),
  };
}

describe('scriptAfterFirstPaint', () => {
  it('swaps the main module script for an inline loader carrying the same nonce', () => {
    const html = scriptAfterFirstPaint(PAGE);
    expect(html).not.toContain('<script src="/portal/main-WWV7NKZE.js"');
    expect(html).toContain(`<script nonce="abc">${scriptLoader('/portal/main-WWV7NKZE.js', 'abc')}</script>`);
    expect(html).toContain('<script nonce="abc">(event contract)</script>');
    expect(html).toContain('<script id="ng-state" type="application/json">{}</script>');
  });

  it("finds the admin app's script at the root as well", () => {
    const html = scriptAfterFirstPaint('<body><script src="/main-ABC123.js" type="module" nonce="n0"></script></body>');
    expect(html).toBe(`<body><script nonce="n0">${scriptLoader('/main-ABC123.js', 'n0')}</script></body>`);
  });

  it('leaves a page without the main script as it is', () => {
    const html = '<body><script src="/portal/chunk-ABC.js" type="module" nonce="n"></script></body>';
    expect(scriptAfterFirstPaint(html)).toBe(html);
  });
});

describe('the loader', () => {
  it('asks for the script, as a module with the nonce, once the first contentful paint is reported', () => {
    const browser = standIn({});
    browser.frame();
    browser.paint('first-paint');
    expect(browser.appended).toEqual([]);
    browser.paint('first-contentful-paint');
    expect(browser.appended).toEqual([{ type: 'module', src: '/portal/main-X.js', nonce: 'abc' }]);
  });

  it('asks only once, when the 3 s fallback also comes', () => {
    const browser = standIn({});
    browser.paint('first-contentful-paint');
    browser.timePasses(3000);
    expect(browser.appended).toHaveLength(1);
  });

  it('asks after 3 s when no paint is reported', () => {
    const browser = standIn({});
    browser.timePasses(2999);
    expect(browser.appended).toHaveLength(0);
    browser.timePasses(3000);
    expect(browser.appended).toHaveLength(1);
  });

  it('asks at once for a page that is not on screen, or in a browser without paint observers', () => {
    expect(standIn({ visibility: 'hidden' }).appended).toHaveLength(1);
    expect(standIn({ paintTiming: 'none' }).appended).toHaveLength(1);
  });

  it('asks after the next frame when the browser cannot report paints', () => {
    const browser = standIn({ paintTiming: 'unknown' });
    expect(browser.appended).toHaveLength(0);
    browser.frame();
    browser.timePasses(0);
    expect(browser.appended).toHaveLength(1);
  });
});
