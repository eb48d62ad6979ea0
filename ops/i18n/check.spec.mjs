// `node --test ops/i18n/check.spec.mjs`: what the words check flags and what it lets through (npm test runs it before the check itself).
import assert from 'node:assert/strict';
import { mkdtempSync, mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { test } from 'node:test';
import { checkWordFiles, groupOf, scanTemplate, scanTypeScript } from './check.mjs';
import { ROOT } from './merge.mjs';

const texts = (html) => scanTemplate(html, 'x.html').texts.map((t) => t.text);
const keys = (html) => scanTemplate(html, 'x.html').keys.map((k) => k.key);

test('literal text a person reads is flagged', () => {
  assert.deepEqual(texts('<p>Hello</p>'), ['"Hello"']);
  assert.deepEqual(texts('<p>{{ n }} coats</p>'), ['"coats"']);
  assert.deepEqual(texts(`<p>{{ name ?? 'Nobody' }}</p>`), ['"Nobody"']);
  assert.deepEqual(texts(`<button [attr.aria-label]="open ? 'Close' : ('a.open' | translate)"></button>`), ['aria-label="Close"']);
  assert.deepEqual(texts('<img alt="A board"><input placeholder="Name" title="Hint">'), [
    'alt="A board"',
    'placeholder="Name"',
    'title="Hint"',
  ]);
  assert.deepEqual(texts('@if (x) { <p>One</p> } @else { <p>Two</p> }'), ['"One"', '"Two"']);
  assert.deepEqual(texts('@for (i of items; track i) { <li>{{ i }}</li> } @empty { <li>None</li> }'), ['"None"']);
  assert.deepEqual(texts('<ng-template><em>Later</em></ng-template>'), ['"Later"']);
});

test('keys, icons, symbols, compared strings and translate="no" pass', () => {
  assert.deepEqual(texts(`<h1>{{ 'a.title' | translate }}</h1>`), []);
  assert.deepEqual(texts('<mat-icon>delete</mat-icon>'), []);
  assert.deepEqual(texts('<span translate="no">Layerbook <b>Pro</b></span>'), []);
  assert.deepEqual(texts(`@if (status === 'draft') { <p>{{ n }} · {{ m }} &times; 2 — 100 %</p> }`), []);
  assert.deepEqual(texts(`<p>{{ key | translateOr: params : 'English as sent' }}</p>`), []);
  assert.deepEqual(texts('<img alt="">'), []);
});

test('keys handed to the translate pipe are collected, both sides of a condition too', () => {
  assert.deepEqual(keys(`<h1>{{ 'a.title' | translate }}</h1>`), ['a.title']);
  assert.deepEqual(keys(`<p [title]="(ok ? 'a.yes' : 'a.no') | translate: { n: 2 }"></p>`), ['a.yes', 'a.no']);
  assert.deepEqual(keys(`<button (click)="say('a.b')">{{ ('a.' + kind) | translate }}</button>`), []);
});

test('inline templates are read from decorators, with their lines, and key-shaped strings from TS', () => {
  const source =
    "@Component({\n  selector: 'x',\n  template: `\n    <p>Hello</p>\n  `,\n})\nclass X { t = 'lib.page.title'; u = './lib.routes'; }\n";
  const { templates, keys: found } = scanTypeScript(source, 'x.ts', new Set(['lib']));
  assert.equal(templates.length, 1);
  assert.deepEqual(scanTemplate(templates[0].source, 'x.ts', templates[0].firstLine).texts, [{ text: '"Hello"', line: 4 }]);
  assert.deepEqual(
    found.map((k) => k.key),
    ['lib.page.title'],
  );
});

test('word files: Spanish has exactly the English keys and params; required Spanish is reported missing', () => {
  const dir = mkdtempSync(path.join(tmpdir(), 'lb-words-'));
  const area = path.join(dir, 'area');
  mkdirSync(area);
  writeFileSync(path.join(area, 'en.json'), JSON.stringify({ a: { title: 'Hi {{name}}', gone: 'x' }, empty: '' }));
  assert.match(checkWordFiles(area, { needsSpanish: true }).join('\n'), /es\.json: missing/);
  assert.match(checkWordFiles(area, { needsSpanish: false }).join('\n'), /"empty" is not a non-empty string/);
  writeFileSync(path.join(area, 'es.json'), JSON.stringify({ a: { title: 'Hola {{nombre}}', extra: 'y' }, empty: 'z' }));
  const found = checkWordFiles(area, { needsSpanish: true }).join('\n');
  assert.match(found, /missing key "a\.gone"/);
  assert.match(found, /extra key "a\.extra"/);
  assert.match(found, /"a\.title" has params \{nombre\}, en\.json has \{name\}/);
});

test('findings are grouped by app and area', () => {
  const at = (p) => groupOf(path.join(ROOT, 'projects', p));
  assert.equal(at('admin/src/app/features/library/layer-card.html'), 'admin/library');
  assert.equal(at('admin/src/i18n/library/es.json'), 'admin/library');
  assert.equal(at('portal/src/app/core/layout/portal-shell.ts'), 'portal/core');
  assert.equal(at('shared/photos/photo-gallery.ts'), 'shared/photos');
});
