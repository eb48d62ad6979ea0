// Checks the apps' words (run by `npm test` after the format check; DEVELOPERS.md "Words (i18n)"):
//  (a) every area folder has en.json; an es.json has exactly en's keys and {{params}}; portal and
//      shared areas must have es.json, admin areas too unless listed in ops/i18n/english-only.json;
//  (b) every key a template (`'x.y' | translate`) or TS (`instant('x.y')`, a literal 'area.x.y') uses
//      is in en;
//  (c) no template (html files, inline `template:` strings under projects/) shows literal text: text
//      with letters, and the attributes people read (aria-label, placeholder, title, alt, label,
//      matTooltip…). Exempt: <mat-icon> ligatures and anything inside an element marked with HTML's own
//      `translate="no"` (brand names, codes).
// Usage: `node ops/i18n/check.mjs [--all] [area-prefix…]` — e.g. `admin/library portal` checks only
// those areas; --all prints every finding instead of the first 12 per area. Exits 1 on any finding.
/* global console -- a command-line script prints its findings */
import {
  parseTemplate,
  BindingPipe,
  Conditional,
  Binary,
  Interpolation,
  LiteralPrimitive,
  ParenthesizedExpression,
} from '@angular/compiler';
import { RecursiveAstVisitor, TmplAstRecursiveVisitor, tmplAstVisitAll } from '@angular/compiler';
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';
import { APPS, ROOT, areaFolders, mergedWords, readWords } from './merge.mjs';

const READ_ATTRIBUTES = new Set([
  'aria-label',
  'aria-description',
  'aria-placeholder',
  'placeholder',
  'title',
  'alt',
  'label',
  'mattooltip',
]);
const LETTER = /\p{L}/u;
const PER_AREA = 12;

/** Leaf keys of a words object as dotted paths, with their text. */
export function leaves(words, prefix = '', out = new Map()) {
  for (const [key, value] of Object.entries(words)) {
    const at = prefix ? `${prefix}.${key}` : key;
    if (value !== null && typeof value === 'object' && !Array.isArray(value)) leaves(value, at, out);
    else out.set(at, value);
  }
  return out;
}

const params = (text) =>
  [...String(text).matchAll(/\{\{\s*([\w.]+)\s*\}\}/g)]
    .map((m) => m[1])
    .sort()
    .join(',');

/** (a) one area folder: en.json present, es.json (if any or required) with the same keys and params. */
export function checkWordFiles(dir, { needsSpanish }) {
  const found = [];
  const rel = (f) => path.relative(ROOT, path.join(dir, f));
  if (!existsSync(path.join(dir, 'en.json'))) return [`${rel('en.json')}: missing (every area has English words)`];
  const en = leaves(readWords(path.join(dir, 'en.json')));
  for (const [key, text] of en)
    if (typeof text !== 'string' || text.trim() === '') found.push(`${rel('en.json')}: "${key}" is not a non-empty string`);
  if (!existsSync(path.join(dir, 'es.json'))) {
    if (needsSpanish) found.push(`${rel('es.json')}: missing (crew or clients read this area; or list it in ops/i18n/english-only.json)`);
    return found;
  }
  const es = leaves(readWords(path.join(dir, 'es.json')));
  for (const key of en.keys()) if (!es.has(key)) found.push(`${rel('es.json')}: missing key "${key}"`);
  for (const [key, text] of es) {
    if (!en.has(key)) found.push(`${rel('es.json')}: extra key "${key}" (not in en.json)`);
    else if (typeof text !== 'string' || text.trim() === '') found.push(`${rel('es.json')}: "${key}" is not a non-empty string`);
    else if (params(text) !== params(en.get(key)))
      found.push(`${rel('es.json')}: "${key}" has params {${params(text)}}, en.json has {${params(en.get(key))}}`);
  }
  return found;
}

/** Literal strings an expression would show as they are (not compared, not translated). */
function shownLiterals(ast) {
  if (!ast) return [];
  if (ast.ast) return shownLiterals(ast.ast); // ASTWithSource
  if (ast instanceof LiteralPrimitive) return typeof ast.value === 'string' && LETTER.test(ast.value) ? [ast.value] : [];
  if (ast instanceof Interpolation) return [...ast.strings.filter((s) => LETTER.test(s)), ...ast.expressions.flatMap(shownLiterals)];
  if (ast instanceof Conditional) return [...shownLiterals(ast.trueExp), ...shownLiterals(ast.falseExp)];
  if (ast instanceof Binary && (ast.operation === '??' || ast.operation === '||'))
    return [...shownLiterals(ast.left), ...shownLiterals(ast.right)];
  if (ast instanceof ParenthesizedExpression) return shownLiterals(ast.expression);
  if (ast instanceof BindingPipe) return ast.name.startsWith('translate') ? [] : shownLiterals(ast.exp); // translate, translateOr
  return [];
}

/** Keys handed to the translate pipe as literals (also both sides of `cond ? 'a.b' : 'a.c'`). */
class KeyCollector extends RecursiveAstVisitor {
  keys = [];
  visitPipe(ast, context) {
    if (ast.name === 'translate') this.keys.push(...literalStrings(ast.exp));
    return super.visitPipe(ast, context);
  }
}
function literalStrings(ast) {
  if (ast instanceof LiteralPrimitive) return typeof ast.value === 'string' ? [ast.value] : [];
  if (ast instanceof Conditional) return [...literalStrings(ast.trueExp), ...literalStrings(ast.falseExp)];
  if (ast instanceof ParenthesizedExpression) return literalStrings(ast.expression);
  return [];
}

/** Walks one parsed template: collects translate keys and literal text a person would read. */
class TemplateScan extends TmplAstRecursiveVisitor {
  keys = []; // { key, line }
  texts = []; // { text, line }
  quiet = 0; // inside <mat-icon> or translate="no"
  expr(ast, span) {
    if (!ast) return;
    const collector = new KeyCollector();
    (ast.ast ?? ast).visit(collector);
    for (const key of collector.keys) this.keys.push({ key, line: span.start.line });
  }
  shown(text, span, attribute) {
    const words = text.trim().replace(/\s+/g, ' ').slice(0, 60);
    if (!this.quiet && LETTER.test(text))
      this.texts.push({ text: attribute ? `${attribute}="${words}"` : `"${words}"`, line: span.start.line });
  }
  visitElement(el) {
    this.element(el, el.name, () => super.visitElement(el));
  }
  visitTemplate(t) {
    tmplAstVisitAll(this, t.templateAttrs ?? []);
    this.element(t, t.tagName ?? '', () => super.visitTemplate(t));
  }
  element(el, name, visitChildren) {
    const hushed = name === 'mat-icon' || el.attributes.some((a) => a.name === 'translate' && a.value === 'no');
    if (hushed) this.quiet++;
    visitChildren();
    if (hushed) this.quiet--;
  }
  visitText(text) {
    this.shown(text.value, text.sourceSpan);
  }
  visitBoundText(text) {
    this.expr(text.value, text.sourceSpan);
    for (const s of shownLiterals(text.value)) this.shown(s, text.sourceSpan);
  }
  visitTextAttribute(attr) {
    if (READ_ATTRIBUTES.has(attr.name.toLowerCase())) this.shown(attr.value, attr.sourceSpan, attr.name);
  }
  visitBoundAttribute(attr) {
    this.expr(attr.value, attr.sourceSpan);
    const name = attr.name.replace(/^attr\./, '');
    if (READ_ATTRIBUTES.has(name.toLowerCase())) for (const s of shownLiterals(attr.value)) this.shown(s, attr.sourceSpan, name);
  }
  visitBoundEvent(event) {
    this.expr(event.handler, event.sourceSpan);
  }
  visitIfBlockBranch(block) {
    this.expr(block.expression, block.sourceSpan);
    super.visitIfBlockBranch(block);
  }
  visitForLoopBlock(block) {
    this.expr(block.expression, block.sourceSpan);
    super.visitForLoopBlock(block);
  }
  visitSwitchBlock(block) {
    this.expr(block.expression, block.sourceSpan);
    super.visitSwitchBlock(block);
  }
  visitLetDeclaration(decl) {
    this.expr(decl.value, decl.sourceSpan);
  }
}

/** Parses one template; lines are 1-based and counted in its file (`firstLine` = where it starts). */
export function scanTemplate(source, file, firstLine = 1) {
  const parsed = parseTemplate(source, file, { preserveWhitespaces: false });
  const scan = new TemplateScan();
  tmplAstVisitAll(scan, parsed.nodes);
  const at = (line) => line + firstLine;
  return {
    errors: (parsed.errors ?? []).map((e) => ({ line: at(e.span.start.line), message: e.msg })),
    keys: scan.keys.map((k) => ({ ...k, line: at(k.line) })),
    texts: scan.texts.map((t) => ({ ...t, line: at(t.line) })),
  };
}

/** Inline `template:` strings of a TS file's decorators, and string literals that look like keys. */
export function scanTypeScript(source, file, areas) {
  const sf = ts.createSourceFile(file, source, ts.ScriptTarget.Latest, true);
  const templates = [];
  const keys = [];
  const keyLike = new RegExp(`^(${[...areas].join('|')})\\.[A-Za-z][\\w-]*(\\.[\\w-]+)*$`);
  const visit = (node) => {
    if (
      ts.isPropertyAssignment(node) &&
      node.name.getText(sf) === 'template' &&
      ts.isCallExpression(node.parent.parent) &&
      ts.isDecorator(node.parent.parent.parent)
    ) {
      const init = node.initializer;
      if (ts.isNoSubstitutionTemplateLiteral(init) || ts.isStringLiteral(init)) {
        templates.push({ source: init.text, firstLine: sf.getLineAndCharacterOfPosition(init.getStart(sf)).line + 1 });
        return;
      }
    }
    if ((ts.isStringLiteral(node) || ts.isNoSubstitutionTemplateLiteral(node)) && areas.size && keyLike.test(node.text)) {
      const line = sf.getLineAndCharacterOfPosition(node.getStart(sf)).line + 1;
      if (!ts.isImportDeclaration(node.parent) && !ts.isExportDeclaration(node.parent)) keys.push({ key: node.text, line, anyNode: true });
    }
    ts.forEachChild(node, visit);
  };
  visit(sf);
  return { templates, keys };
}

function* filesUnder(dir, test) {
  if (!existsSync(dir)) return;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) {
      if (entry.name !== 'node_modules') yield* filesUnder(full, test);
    } else if (test(entry.name)) yield full;
  }
}

/** Which findings group a file belongs to: admin/library, portal/billing, shared/ui, admin/core… */
export function groupOf(file) {
  const rel = path.relative(path.join(ROOT, 'projects'), file).split(path.sep);
  if (rel[0] === 'shared') return `shared/${rel[1]}`;
  if (rel[3] === 'features') return `${rel[0]}/${rel[4]}`;
  if (rel[2] === 'i18n') return `${rel[0]}/${rel[3]}`;
  return `${rel[0]}/${rel[3] && !rel[3].includes('.') ? rel[3] : 'app'}`;
}

function has(words, key, anyNode) {
  let at = words;
  for (const part of key.split('.')) {
    if (at === null || typeof at !== 'object' || !(part in at)) return false;
    at = at[part];
  }
  return anyNode || typeof at === 'string';
}

export function runChecks() {
  const findings = []; // { group, where, message }
  const englishOnly = new Set(JSON.parse(readFileSync(path.join(ROOT, 'ops/i18n/english-only.json'), 'utf8')).admin);
  const seen = new Set();
  for (const app of APPS) {
    for (const { area, dir } of areaFolders(app)) {
      if (seen.has(dir)) continue;
      seen.add(dir);
      const shared = dir.includes(`${path.sep}shared${path.sep}`);
      const needsSpanish = shared || app === 'portal' || !englishOnly.has(area);
      for (const message of checkWordFiles(dir, { needsSpanish }))
        findings.push({ group: shared ? `shared/${area}` : `${app}/${area}`, message });
    }
  }
  const words = Object.fromEntries(APPS.map((app) => [app, mergedWords(app, 'en')]));
  const appsOf = (file) => {
    const top = path.relative(path.join(ROOT, 'projects'), file).split(path.sep)[0];
    return APPS.includes(top) ? [top] : APPS;
  };
  const record = (file, result) => {
    const where = (line) => `${path.relative(ROOT, file)}:${line}`;
    const group = groupOf(file);
    for (const e of result.errors ?? []) findings.push({ group, message: `${where(e.line)}: template does not parse: ${e.message}` });
    for (const t of result.texts ?? []) findings.push({ group, message: `${where(t.line)}: literal text ${t.text} (use a key)` });
    for (const k of result.keys ?? []) {
      for (const app of appsOf(file)) {
        if (!has(words[app], k.key, k.anyNode))
          findings.push({ group, message: `${where(k.line)}: key "${k.key}" is not in ${app}'s English words` });
      }
    }
  };
  const projects = path.join(ROOT, 'projects');
  for (const file of filesUnder(projects, (n) => n.endsWith('.html') && !/^index(\.csr)?\.html$/.test(n))) {
    record(file, scanTemplate(readFileSync(file, 'utf8'), file));
  }
  for (const file of filesUnder(projects, (n) => n.endsWith('.ts') && !n.endsWith('.spec.ts') && !n.endsWith('.d.ts'))) {
    const areas = new Set(appsOf(file).flatMap((app) => Object.keys(words[app])));
    const { templates, keys } = scanTypeScript(readFileSync(file, 'utf8'), file, areas);
    record(file, { keys });
    for (const t of templates) record(file, scanTemplate(t.source, file, t.firstLine));
  }
  return findings;
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(ROOT, 'ops/i18n/check.mjs')) {
  const args = process.argv.slice(2);
  const all = args.includes('--all');
  const only = args.filter((a) => !a.startsWith('--'));
  const findings = runChecks().filter((f) => !only.length || only.some((p) => f.group.startsWith(p)));
  const groups = new Map();
  for (const f of findings) groups.set(f.group, [...(groups.get(f.group) ?? []), f.message]);
  for (const [group, messages] of [...groups].sort()) {
    console.log(`\n${group}`);
    for (const m of all ? messages : messages.slice(0, PER_AREA)) console.log(`  ${m}`);
    if (!all && messages.length > PER_AREA) console.log(`  … ${messages.length - PER_AREA} more (node ops/i18n/check.mjs --all ${group})`);
  }
  if (findings.length) {
    console.log('\nWords (i18n) findings per area:');
    for (const [group, messages] of [...groups].sort()) console.log(`  ${group.padEnd(22)} ${messages.length}`);
    console.log(
      `${findings.length} finding(s): move the text into the area's en.json (verbatim), add the key, or write the es.json words.`,
    );
    process.exit(1);
  }
  console.log('Words (i18n): every key in both languages where needed, every used key exists, no literal text in templates.');
}
