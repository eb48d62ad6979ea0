// Prints the metric overrides of a web font's local fallback (`Fraunces fallback`, `Source Sans 3 fallback`
// in projects/shared-styles/_layerbook.scss), so the fallback takes the room the web font will: nothing
// moves when the web font swaps in. Run by hand when a font changes:
//   node ops/build/fallback-metrics.mjs                  Fraunces 600 over Liberation Serif Bold
//   node ops/build/fallback-metrics.mjs <web> <local>    any pair (woff2/ttf paths; @fontsource/… resolves)
// e.g. `@fontsource/source-sans-3/files/source-sans-3-latin-400-normal.woff2
//       /usr/share/fonts/truetype/liberation/LiberationSans-Regular.ttf`.
//
// The serif fallback is Times New Roman Bold, or Liberation Serif Bold / Tinos Bold where it is missing
// (both drawn to Times New Roman's metrics; the first ships with Linux, so Lighthouse's Chromium has it);
// the sans one is Arial, or Liberation Sans / Arimo (drawn to Arial's).
// size-adjust scales the fallback so a line of English text is as wide as in the web font: the ratio of
// the two fonts' average advance over a-z, A-Z and the space, weighted by how often each occurs in
// English prose (the approach of Capsize / Next.js font fallbacks; common practice, no source beyond
// those tools). The ascent, descent and line gap are the web font's own (hhea, what Chromium reads),
// divided by size-adjust because the overrides apply to the scaled font.
import { createRequire } from 'node:module';
import * as fontkit from 'fontkit';

const require = createRequire(import.meta.url);
const open = (file) => fontkit.openSync(file.startsWith('@') ? require.resolve(file) : file);
const heading = open(process.argv[2] ?? '@fontsource/fraunces/files/fraunces-latin-600-normal.woff2');
const fallback = open(process.argv[3] ?? '/usr/share/fonts/truetype/liberation/LiberationSerif-Bold.ttf');

// Letter frequencies of English text in percent (Lewand, "Cryptological Mathematics", 2000), the space
// taken as one character in six; capitals weighted as a tenth of their small letter.
const FREQUENCY = {
  a: 8.167,
  b: 1.492,
  c: 2.782,
  d: 4.253,
  e: 12.702,
  f: 2.228,
  g: 2.015,
  h: 6.094,
  i: 6.966,
  j: 0.153,
  k: 0.772,
  l: 4.025,
  m: 2.406,
  n: 6.749,
  o: 7.507,
  p: 1.929,
  q: 0.095,
  r: 5.987,
  s: 6.327,
  t: 9.056,
  u: 2.758,
  v: 0.978,
  w: 2.36,
  x: 0.15,
  y: 1.974,
  z: 0.074,
};
function averageAdvance(font) {
  let sum = 0;
  let weights = 0;
  const add = (char, weight) => {
    sum += (font.glyphForCodePoint(char.codePointAt(0)).advanceWidth / font.unitsPerEm) * weight;
    weights += weight;
  };
  for (const [letter, weight] of Object.entries(FREQUENCY)) {
    add(letter, weight);
    add(letter.toUpperCase(), weight / 10);
  }
  add(' ', 100 / 5);
  return sum / weights;
}
const sizeAdjust = averageAdvance(heading) / averageAdvance(fallback);
const percent = (x) => `${(x * 100).toFixed(2)}%`;
const em = heading.unitsPerEm;
process.stdout.write(
  [
    `/* ${heading.familyName} ${heading.subfamilyName} over ${fallback.fullName}: upm ${em}, hhea ascent ${heading.ascent}, descent ${heading.descent}, line gap ${heading.lineGap} */`,
    `size-adjust: ${percent(sizeAdjust)};`,
    `ascent-override: ${percent(heading.ascent / em / sizeAdjust)};`,
    `descent-override: ${percent(Math.abs(heading.descent) / em / sizeAdjust)};`,
    `line-gap-override: ${percent(heading.lineGap / em / sizeAdjust)};`,
    '',
  ].join('\n'),
);
