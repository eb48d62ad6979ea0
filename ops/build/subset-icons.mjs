// Cuts the Material Symbols icon font (@fontsource, ~325 kB, ~3,800 icons) to the icons the apps use
// (icon-names.cjs says how they are found) and writes it beside the global styles, where both apps'
// @font-face points (projects/shared-styles/_layerbook.scss). Run by ops/build.sh before `ng build`;
// the file is committed, so a plain `ng build` / `ng serve` has it too. Ligatures keep working: the cut
// keeps the letters, digits and underscore, each used icon's glyph, and the ligature rules joining them.
//
//   node ops/build/subset-icons.mjs          write the cut font (only when it changes)
//   node ops/build/subset-icons.mjs --check  check every name used is a ligature of the committed cut;
//                                            prints JSON { names, missing, unknown }, exits 1 when not
import { createRequire } from 'node:module';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import subsetFont from 'subset-font';
import fontverter from 'fontverter';
import * as hb from 'harfbuzzjs';

const require = createRequire(import.meta.url);
const { collectIconNames } = require('./icon-names.cjs');

const ROOT = join(dirname(fileURLToPath(import.meta.url)), '../..');
const FULL_FONT = require.resolve('@fontsource/material-symbols-outlined/files/material-symbols-outlined-latin-400-normal.woff2');
export const CUT_FONT = join(ROOT, 'projects/shared-styles/fonts/material-symbols-cut.woff2');
/** What a ligature is typed with: the names' own characters. */
const LETTERS = 'abcdefghijklmnopqrstuvwxyz0123456789_';

/** Shapes a name with a font: the glyph id when it is one ligature, else null. */
function ligatureOf(font, name) {
  const buffer = new hb.Buffer();
  buffer.addText(name);
  buffer.guessSegmentProperties();
  hb.shape(font, buffer);
  const glyphs = buffer.getGlyphInfos();
  return glyphs.length === 1 && glyphs[0].codepoint !== 0 ? glyphs[0].codepoint : null;
}

async function openFont(woff2) {
  const sfnt = await fontverter.convert(woff2, 'truetype');
  const face = new hb.Face(new hb.Blob(sfnt));
  return { face, font: new hb.Font(face) };
}

/** Each icon's private-use code point (the font maps one to every icon glyph), by glyph id. */
function codePointsByGlyph({ face, font }) {
  const byGlyph = new Map();
  for (const codePoint of face.collectUnicodes()) {
    if (codePoint < 0xe000) continue;
    const glyph = font.nominalGlyph(codePoint);
    if (glyph !== undefined && !byGlyph.has(glyph)) byGlyph.set(glyph, codePoint);
  }
  return byGlyph;
}

async function cut(names) {
  const full = readFileSync(FULL_FONT);
  const opened = await openFont(full);
  const byGlyph = codePointsByGlyph(opened);
  const unknown = [];
  let text = LETTERS;
  for (const name of names) {
    const glyph = ligatureOf(opened.font, name);
    const codePoint = glyph === null ? undefined : byGlyph.get(glyph);
    if (codePoint === undefined) unknown.push(name);
    else text += String.fromCodePoint(codePoint);
  }
  if (unknown.length > 0) return { unknown };
  // No layout closure: only the glyphs asked for (the letters and the used icons) stay, and with them
  // the ligature rules whose every glyph stayed; with closure, every ligature of those letters would.
  const font = await subsetFont(full, text, { targetFormat: 'woff2', noLayoutClosure: true });
  return { unknown, font };
}

async function check(names) {
  if (!existsSync(CUT_FONT)) return { missing: [...names], unknown: [] };
  const opened = await openFont(readFileSync(CUT_FONT));
  return { missing: names.filter((name) => ligatureOf(opened.font, name) === null), unknown: [] };
}

const { names: used, unnamedBindings } = collectIconNames(join(ROOT, 'projects'));
const names = [...used.keys()];
const where = (name) => [...used.get(name)].join(', ');
if (process.argv.includes('--check')) {
  const { missing } = await check(names);
  process.stdout.write(`${JSON.stringify({ names, missing, unnamedBindings })}\n`);
  process.exitCode = missing.length === 0 && unnamedBindings.length === 0 ? 0 : 1;
} else {
  const { unknown, font } = await cut(names);
  if (unknown.length > 0) {
    process.stderr.write(`Not Material Symbols icons: ${unknown.map((name) => `${name} (${where(name)})`).join('; ')}\n`);
    process.exit(1);
  }
  const before = existsSync(CUT_FONT) ? readFileSync(CUT_FONT) : null;
  if (!before || !before.equals(font)) writeFileSync(CUT_FONT, font);
  const kB = (n) => `${(n / 1024).toFixed(1)} kB`;
  process.stdout.write(`Icon font cut to ${names.length} icons: ${kB(font.length)} (whole: ${kB(readFileSync(FULL_FONT).length)}).\n`);
}
