// Merges each app's words into one file per language for the build: `.i18n/<app>/<lang>.json`,
// copied by angular.json to `dist/<app>/browser/i18n/`. Sources, one folder per area (its keys sit
// under the area's name): `projects/<app>/src/i18n/<area>/<lang>.json` and, for both apps,
// `projects/shared/i18n/words/<area>/<lang>.json`. Run by ops/build.sh; `--check` only reads.
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
export const APPS = ['admin', 'portal'];
export const LANGUAGES = ['en', 'es'];

/** Area folders feeding one app: [{ area, dir }] — the app's own, then the shared ones. */
export function areaFolders(app) {
  const roots = [path.join(ROOT, 'projects', app, 'src', 'i18n'), path.join(ROOT, 'projects', 'shared', 'i18n', 'words')];
  const found = [];
  for (const root of roots) {
    if (!existsSync(root)) continue;
    for (const entry of readdirSync(root, { withFileTypes: true })) {
      if (entry.isDirectory()) found.push({ area: entry.name, dir: path.join(root, entry.name) });
    }
  }
  return found;
}

export function readWords(file) {
  try {
    return JSON.parse(readFileSync(file, 'utf8'));
  } catch (error) {
    throw new Error(`${path.relative(ROOT, file)}: ${error.message}`);
  }
}

/** One app's words for one language, keyed by area; an area missing a language simply has no words there. */
export function mergedWords(app, language) {
  const words = {};
  for (const { area, dir } of areaFolders(app)) {
    if (area in words) throw new Error(`Two i18n folders are both called "${area}" for ${app}: rename one.`);
    const file = path.join(dir, `${language}.json`);
    words[area] = existsSync(file) ? readWords(file) : {};
  }
  return words;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  for (const app of APPS) {
    const out = path.join(ROOT, '.i18n', app);
    mkdirSync(out, { recursive: true });
    for (const language of LANGUAGES) {
      writeFileSync(path.join(out, `${language}.json`), JSON.stringify(mergedWords(app, language)));
    }
  }
}
