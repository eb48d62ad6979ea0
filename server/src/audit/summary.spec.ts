import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { AUDIT_KIND_RULES, AUDIT_KINDS, auditKindOf } from '@layerbook/contracts';
import { auditLink, auditSummary, fallbackSummary } from './summary';

/** Every action name a line mentioning `action` quotes in the server's code (specs aside). */
function recordedActions(): string[] {
  const found = new Set<string>();
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const file = path.join(dir, name);
      if (statSync(file).isDirectory()) walk(file);
      else if (name.endsWith('.ts') && !name.endsWith('.spec.ts')) {
        for (const line of readFileSync(file, 'utf8').split('\n')) {
          if (!/\baction\b|\baudit\(/.test(line)) continue;
          for (const m of line.matchAll(/'([a-z_]+\.[a-zA-Z_]+)'/g)) found.add(m[1]);
        }
      }
    }
  };
  walk(path.resolve(__dirname, '..'));
  return [...found].filter((a) => !a.endsWith('.ts') && !a.startsWith('audit_log'));
}

describe('audit kinds (common practice, no source: our own grouping)', () => {
  it('put every action the server records in exactly one kind', () => {
    const names = recordedActions();
    expect(names).toEqual(expect.arrayContaining(['invoice.issued', 'invoice.voided', 'invoice.refund_recorded', 'product.updated']));
    for (const name of [...names, 'takeoff.photo_added', 'jobs.photo_deleted', 'samples.photo_added', 'member.deactivated']) {
      const claimed = AUDIT_KINDS.filter(
        (kind) =>
          AUDIT_KIND_RULES[kind].exact.includes(name) ||
          (AUDIT_KINDS.every((k) => !AUDIT_KIND_RULES[k].exact.includes(name)) &&
            AUDIT_KIND_RULES[kind].prefixes.some((p) => name.startsWith(p))),
      );
      expect({ name, claimed: claimed.length }).toEqual({ name, claimed: 1 });
      expect({ name, kind: auditKindOf(name) }).toEqual({ name, kind: claimed[0] });
    }
  });

  it.each([
    ['staff.signedIn', 'signIns'],
    ['staff.secondFactorEnrolled', 'signIns'],
    ['firm.secondFactorRequired', 'signIns'],
    ['firm.estimating_settings_changed', 'library'],
    ['finish_system.archived', 'library'],
    ['proposal.accepted', 'estimates'],
    ['invoice.issued', 'invoices'],
    ['billing.started', 'invoices'],
    ['invoice.voided', 'voids'],
    ['credit_note.issued', 'voids'],
    ['invoice.payment_recorded', 'payments'],
    ['invoice.refund_failed', 'payments'],
    ['progress.marked', 'jobs'],
    ['inquiry.stage_changed', 'clients'],
    ['firm.exported', 'team'],
    ['invitation.sent', 'team'],
    ['something.new', null],
  ])('%s is in %s', (action, kind) => {
    expect(auditKindOf(action)).toBe(kind);
  });
});

describe('audit summaries', () => {
  it.each([
    [
      'invoice.issued',
      { number: 'INV-0007', total: '4200.00', dueOn: '2026-12-31' },
      'Issued invoice INV-0007 for 4200.00, due 2026-12-31',
    ],
    ['invoice.voided', { reason: 'Wrong client', creditNote: 'CN-0002' }, 'Voided an invoice (Wrong client); credit note CN-0002'],
    [
      'invoice.payment_recorded',
      { amount: '500.00', method: 'cheque', receipt: 'RCT-0003' },
      'Recorded a payment of 500.00 (cheque), receipt RCT-0003',
    ],
    ['product.updated', { changed: ['name', 'containers'] }, 'Changed a product: name, containers'],
    ['staff.signedIn', { secondFactor: true, secondFactorBy: 'app' }, 'Signed in with the second factor'],
    ['staff.signedIn', { secondFactor: true, secondFactorBy: 'recoveryCode' }, 'Signed in with a recovery code'],
    ['staff.signedIn', { secondFactor: false }, 'Signed in'],
    ['firm.secondFactorRequired', { required: false }, 'Made the second factor optional'],
    ['takeoff.photo_added', { originalName: 'wall.jpg' }, 'Added a photo (wall.jpg)'],
    ['firm.exported', { formatVersion: 1 }, "Downloaded all the firm's data"],
    ['finish_system.frozen', {}, 'Finish system frozen'],
  ])('%s reads "%s"', (action, data, text) => {
    expect(auditSummary(action, data)).toBe(text);
  });

  it('reads an unknown name in words', () => {
    expect(fallbackSummary('staff.secondFactorReset')).toBe('Staff second factor reset');
  });

  it('links a record to the page that shows it, or its parent', () => {
    const id = '5b0a3f7e-1c2d-4e5f-8a9b-0c1d2e3f4a5b';
    expect(auditLink('invoice', id, {})).toEqual({ area: 'invoice', id });
    expect(auditLink('credit_note', 'x', { invoiceId: id })).toEqual({ area: 'invoice', id });
    expect(auditLink('change_order', 'x', { jobId: id })).toEqual({ area: 'job', id });
    expect(auditLink('credit_note', 'x', { invoiceId: 'not an id' })).toBeNull();
    expect(auditLink('room', id, {})).toBeNull();
  });
});
