// The icon names the apps use, read from the sources under projects/ (CommonJS, so the build step
// and the jest spec share it). The icon font is cut to exactly these (subset-icons.mjs).
//
// The collection rule:
//  1. Templates (.html files and `template:` strings in .ts): the text of every <mat-icon>, when it
//     is a bare name (`<mat-icon>add</mat-icon>`), every quoted name inside its `{{ … }}` binding
//     (`{{ done ? 'task_alt' : 'radio_button_unchecked' }}`; not one compared with, `kind === 'refund'`),
//     and `fontIcon="name"`.
//  2. TypeScript: every quoted name in the value given to anything whose name contains "icon"
//     (any case): a property (`icon: 'alarm'`, `icon: paid ? 'check' : 'alarm'`), a variable or a
//     class field (`const STATUS_ICONS = { draft: 'edit_note' }`, `stageIcons = STAGE_ICONS`).
//  3. A <mat-icon> binding that names no icon itself must read one through such a name (`{{ look.icon }}`,
//     `{{ stageIcons[stage] }}`): `unnamedBindings` lists those that do not, and the spec refuses them.
// A "name" is what a Material Symbols ligature can be: lower-case letters, digits and underscores.
const { readdirSync, readFileSync } = require('node:fs');
const { join, relative } = require('node:path');
const ts = require('typescript');

const NAME = /^[a-z0-9_]+$/;
const MAT_ICON = /<mat-icon\b([^>]*)>([\s\S]*?)<\/mat-icon\s*>/g;
const FONT_ICON_ATTRIBUTE = /\bfontIcon="([^"]*)"/g;
const QUOTED = /'([^'\\]*)'|"([^"\\]*)"/g;
// A quoted word compared with (`r.kind === 'refund' ? …`) is data, not an icon.
const COMPARED = /(?:'[^']*'|"[^"]*")\s*[!=]==?|[!=]==?\s*(?:'[^']*'|"[^"]*")/g;

/** Names found in one template's text. */
function fromTemplate(text, found, unnamed, where) {
  for (const [, attributes, content] of text.matchAll(MAT_ICON)) {
    for (const [, name] of attributes.matchAll(FONT_ICON_ATTRIBUTE)) add(found, name, where);
    const inner = content.trim();
    if (inner === '' && /fontIcon|svgIcon/.test(attributes)) continue;
    if (NAME.test(inner)) {
      add(found, inner, where);
      continue;
    }
    let quotedNames = 0;
    for (const [, single, double] of inner.replace(COMPARED, ' ').matchAll(QUOTED)) {
      const name = single ?? double;
      if (NAME.test(name)) {
        add(found, name, where);
        quotedNames += 1;
      }
    }
    if (quotedNames === 0 && !/icon/i.test(inner)) unnamed.push(`${where}: <mat-icon>${inner}</mat-icon>`);
  }
}

/** Names given to anything named *icon* in one TypeScript file, and the templates it holds. */
function fromTypeScript(text, found, unnamed, where) {
  const source = ts.createSourceFile(where, text, ts.ScriptTarget.Latest, true);
  const literalsUnder = (node) => {
    if (ts.isStringLiteral(node) || ts.isNoSubstitutionTemplateLiteral(node)) {
      if (NAME.test(node.text)) add(found, node.text, where);
      return;
    }
    ts.forEachChild(node, literalsUnder);
  };
  const visit = (node) => {
    const isNamedValue = ts.isPropertyAssignment(node) || ts.isVariableDeclaration(node) || ts.isPropertyDeclaration(node);
    if (isNamedValue && node.initializer && node.name && /icon/i.test(node.name.getText(source))) {
      literalsUnder(node.initializer);
    }
    if (ts.isPropertyAssignment(node) && node.name.getText(source) === 'template') {
      const template = node.initializer;
      if (ts.isNoSubstitutionTemplateLiteral(template) || ts.isStringLiteral(template)) {
        fromTemplate(template.text, found, unnamed, where);
      }
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
}

function add(found, name, where) {
  if (!found.has(name)) found.set(name, new Set());
  found.get(name).add(where);
}

function* sourceFiles(dir) {
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) {
      if (entry.name !== 'node_modules') yield* sourceFiles(path);
    } else if (/\.(?:ts|html)$/.test(entry.name) && !/\.spec\.ts$/.test(entry.name)) {
      yield path;
    }
  }
}

/**
 * Every icon name the apps under `projectsDir` use (name → files using it), and the <mat-icon>
 * bindings that follow no rule above. Specs are left out: what they render is not shipped.
 */
function collectIconNames(projectsDir) {
  const found = new Map();
  const unnamed = [];
  for (const path of sourceFiles(projectsDir)) {
    const where = relative(projectsDir, path);
    const text = readFileSync(path, 'utf8');
    if (path.endsWith('.html')) fromTemplate(text, found, unnamed, where);
    else fromTypeScript(text, found, unnamed, where);
  }
  return { names: new Map([...found].sort(([a], [b]) => a.localeCompare(b))), unnamedBindings: unnamed };
}

module.exports = { collectIconNames, fromTemplate, fromTypeScript };
