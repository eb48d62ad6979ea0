import { execFile } from 'node:child_process';
import { statSync } from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import { fromTemplate, fromTypeScript } from './icon-names.cjs';

const ROOT = path.join(__dirname, '../..');
const CUT_FONT = path.join(ROOT, 'projects/shared-styles/fonts/material-symbols-cut.woff2');

function namesIn(kind: 'html' | 'ts', text: string): { names: string[]; unnamed: string[] } {
  const found = new Map<string, Set<string>>();
  const unnamed: string[] = [];
  (kind === 'html' ? fromTemplate : fromTypeScript)(text, found, unnamed, `fixture.${kind}`);
  return { names: [...found.keys()].sort(), unnamed };
}

describe('the icon names the apps use', () => {
  it('reads bare names, quoted names of a binding (not those compared with) and fontIcon from templates', () => {
    const html = `
      <mat-icon aria-hidden="true">add</mat-icon>
      <mat-icon aria-hidden="true">{{ done ? 'task_alt' : 'radio_button_unchecked' }}</mat-icon
      >
      <mat-icon>{{ r.kind === 'refund' ? 'undo' : 'payments' }}</mat-icon>
      <mat-icon fontIcon="home_pin"></mat-icon>
      <mat-icon>{{ look.icon }}</mat-icon>`;
    expect(namesIn('html', html)).toEqual({
      names: ['add', 'home_pin', 'payments', 'radio_button_unchecked', 'task_alt', 'undo'],
      unnamed: [],
    });
  });

  it('reads names given to anything named *icon* in TypeScript, and inline templates', () => {
    const ts = `
      const STATUS_ICONS = { draft: 'edit_note', sent: 'send' };
      const look = { word: 'Paid', icon: paid ? 'check' : 'alarm', key: 'billing.paid' };
      class Nav { readonly stageIcons = { new: 'fiber_new' }; label = 'menu_word'; }
      @Component({ template: '<mat-icon>lock</mat-icon>' })
      class Page {}`;
    expect(namesIn('ts', ts).names).toEqual(['alarm', 'check', 'edit_note', 'fiber_new', 'lock', 'send']);
  });

  it('names a binding that reads an icon through no *icon* name, so it cannot be missed', () => {
    expect(namesIn('html', '<mat-icon>{{ glyphFor(status) }}</mat-icon>').unnamed).toEqual([
      'fixture.html: <mat-icon>{{ glyphFor(status) }}</mat-icon>',
    ]);
  });

  it('finds each of them as a ligature of the cut icon font, which is a small part of the whole', async () => {
    // The check shapes every name used under projects/ with the committed cut (harfbuzz) and lists those
    // that do not come out as one glyph; `node ops/build/subset-icons.mjs` makes the cut again.
    const { stdout } = await promisify(execFile)('node', [path.join(ROOT, 'ops/build/subset-icons.mjs'), '--check'], { cwd: ROOT });
    const result = JSON.parse(stdout) as { names: string[]; missing: string[]; unnamedBindings: string[] };
    expect(result.missing).toEqual([]);
    expect(result.unnamedBindings).toEqual([]);
    // One of each kind: a bare name, a ternary's name, a navigation item's (TypeScript) and a map's.
    expect(result.names).toEqual(expect.arrayContaining(['add', 'task_alt', 'wb_sunny', 'fiber_new']));
    expect(statSync(CUT_FONT).size).toBeLessThan(40 * 1024);
  });
});
