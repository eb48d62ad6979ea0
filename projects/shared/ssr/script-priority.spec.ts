import { describe, expect, it } from 'vitest';
import { withLowPriorityScripts } from './script-priority';

describe('withLowPriorityScripts', () => {
  it('lowers the module script and the preloads as Angular writes them, and nothing else', () => {
    const page = [
      '<link rel="stylesheet" href="/styles-A.css">',
      '<link rel="modulepreload" href="/chunk-B.js">',
      '<link rel="preload" href="/fonts/f.woff2" as="font">',
      '<script nonce="n">window.x = 1;</script>',
      '<p>type="module" as text</p>',
      '<script src="/main-C.js" type="module" nonce="n"></script>',
    ].join('');
    expect(withLowPriorityScripts(page)).toBe(
      [
        '<link rel="stylesheet" href="/styles-A.css">',
        '<link rel="modulepreload" fetchpriority="low" href="/chunk-B.js">',
        '<link rel="preload" href="/fonts/f.woff2" as="font">',
        '<script nonce="n">window.x = 1;</script>',
        '<p>type="module" as text</p>',
        '<script src="/main-C.js" type="module" fetchpriority="low" nonce="n"></script>',
      ].join(''),
    );
  });
});
