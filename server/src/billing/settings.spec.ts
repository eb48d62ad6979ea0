import { DEFAULT_BILLING_SETTINGS, type BillingSettings, type ProposalVersionView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import { firmWithPricedEstimate, joinAs } from '../proposals/proposal-fixtures';
import { startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

// California Business and Professions Code §7159: the lesser of $1,000 or 10 % of the contract price.
const california: BillingSettings = {
  ...DEFAULT_BILLING_SETTINGS,
  depositCap: { kind: 'lesserOf', amount: '1000.00', percent: 10 },
  depositCapName: 'California home improvement (lesser of $1,000 or 10 %)',
  terms: { kind: 'net', days: 30 },
  retainage: { workPercent: 10, storedPercent: 5, stopAtPercentComplete: 50 },
  invoicePrefix: 'PL',
  creditNotePrefix: 'PL-CN',
  invoiceFooter: 'Thank you.',
};

describe('firm billing settings', () => {
  it('office reads the defaults, the owner saves (audited), office cannot save, crew cannot read', async () => {
    const f = await firmWithPricedEstimate(t, 'Billing Settings Plaster');
    const first = await f.agent.get('/api/firm/billing');
    expect(first.status).toBe(200);
    expect(first.body).toEqual({ settings: DEFAULT_BILLING_SETTINGS, isDefault: true, currency: 'USD' });

    const saved = await f.agent.put('/api/firm/billing').set('x-csrf-token', f.csrf()).send(california);
    expect(saved.status).toBe(200);
    expect(saved.body).toEqual({ settings: california, isDefault: false, currency: 'USD' });
    const audit = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`select action from audit_log where tenant_id = $1 and action = 'firm.billing_settings_changed'`, [tx.tenantId]),
    );
    expect(audit.rowCount).toBe(1);

    const office = await joinAs(t, f, 'office');
    expect((await office.agent.get('/api/firm/billing')).body.settings).toEqual(california);
    expect((await office.agent.put('/api/firm/billing').set('x-csrf-token', office.csrf()).send(DEFAULT_BILLING_SETTINGS)).status).toBe(
      403,
    );
    const crew = await joinAs(t, f, 'crew');
    expect((await crew.agent.get('/api/firm/billing')).status).toBe(403);
    expect((await crew.agent.put('/api/firm/billing').set('x-csrf-token', crew.csrf()).send(DEFAULT_BILLING_SETTINGS)).status).toBe(403);
  });

  it('bad settings: 400 naming each field, nothing written', async () => {
    const f = await firmWithPricedEstimate(t, 'Billing Settings Checks');
    const bad = {
      ...DEFAULT_BILLING_SETTINGS,
      depositCap: { kind: 'share', percent: 140 },
      terms: { kind: 'net', days: 400 },
      retainage: { workPercent: -1, storedPercent: 5, stopAtPercentComplete: null },
      reminders: { ...DEFAULT_BILLING_SETTINGS.reminders, everyDaysAfter: 0 },
      invoicePrefix: 'INVOICE-NUMBER-',
      invoiceFooter: 'x'.repeat(1001),
      extra: 1,
    };
    const res = await f.agent.put('/api/firm/billing').set('x-csrf-token', f.csrf()).send(bad);
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toContain('application/problem+json');
    const fields = (res.body.errors as Array<{ field: string }>).map((e) => e.field).sort();
    expect(fields).toEqual(
      [
        'depositCap.percent',
        'terms.days',
        'retainage.workPercent',
        'reminders.everyDaysAfter',
        'invoicePrefix',
        'invoiceFooter',
        'extra',
      ].sort(),
    );
    expect((await f.agent.get('/api/firm/billing')).body.isDefault).toBe(true);

    // Two kinds of document never print one number: the credit notes' prefix differs from the
    // invoices' (in any case), and neither is the receipts'.
    const clashes = [
      [{ invoicePrefix: 'INV-', creditNotePrefix: ' inv- ' }, 'creditNotePrefix', 'Use a prefix other than the invoices’'],
      [{ invoicePrefix: '', creditNotePrefix: '' }, 'creditNotePrefix', 'Use a prefix other than the invoices’'],
      [{ invoicePrefix: 'rct-', creditNotePrefix: 'CN-' }, 'invoicePrefix', 'RCT- numbers the receipts'],
      [{ invoicePrefix: 'INV-', creditNotePrefix: 'RCT-' }, 'creditNotePrefix', 'RCT- numbers the receipts'],
    ] as const;
    for (const [prefixes, field, message] of clashes) {
      const clash = await f.agent
        .put('/api/firm/billing')
        .set('x-csrf-token', f.csrf())
        .send({ ...DEFAULT_BILLING_SETTINGS, ...prefixes });
      expect(clash.status).toBe(400);
      expect(clash.body.errors).toEqual([{ field, message: expect.stringContaining(message) }]);
    }
    // Reminders every week after the due date, but none of them, is a contradiction to resolve.
    const noneAfter = await f.agent
      .put('/api/firm/billing')
      .set('x-csrf-token', f.csrf())
      .send({ ...DEFAULT_BILLING_SETTINGS, reminders: { ...DEFAULT_BILLING_SETTINGS.reminders, everyDaysAfter: 7, maxAfter: 0 } });
    expect(noneAfter.status).toBe(400);
    expect(noneAfter.body.errors.map((e: { field: string }) => e.field)).toEqual(['reminders.maxAfter']);
    expect((await f.agent.get('/api/firm/billing')).body.isDefault).toBe(true);
    const plain = await f.agent
      .put('/api/firm/billing')
      .set('x-csrf-token', f.csrf())
      .send({ ...DEFAULT_BILLING_SETTINGS, invoicePrefix: '', creditNotePrefix: 'CR ' });
    expect(plain.status).toBe(200);
    // With reminders off the count is not asked for (settings saved before the rule still save).
    const off = {
      ...DEFAULT_BILLING_SETTINGS,
      reminders: { ...DEFAULT_BILLING_SETTINGS.reminders, isOn: false, everyDaysAfter: 7, maxAfter: 0 },
    };
    expect((await f.agent.put('/api/firm/billing').set('x-csrf-token', f.csrf()).send(off)).status).toBe(200);
    expect((await f.agent.put('/api/firm/billing').set('x-csrf-token', f.csrf()).send(DEFAULT_BILLING_SETTINGS)).status).toBe(200);
  });

  it("a new proposal's deposit keeps within the firm's saved cap (percent as a share, in decimal)", async () => {
    const f = await firmWithPricedEstimate(t, 'Billing Settings Cap');
    // 5 % of the contract: far below the proposal's 30 % deposit, so the deposit becomes the cap.
    const cap: BillingSettings = { ...DEFAULT_BILLING_SETTINGS, depositCap: { kind: 'share', percent: 5 }, depositCapName: 'Five percent' };
    expect((await f.agent.put('/api/firm/billing').set('x-csrf-token', f.csrf()).send(cap)).status).toBe(200);
    const made = await f.agent
      .post('/api/proposals')
      .set('x-csrf-token', f.csrf())
      .send({ estimateId: f.estimateId, expiresOn: '2026-12-31' });
    expect(made.status).toBe(201);
    const option = (made.body as ProposalVersionView).snapshot.options[0];
    const deposit = option.payments.find((p) => p.role === 'deposit')!;
    // rounded down: a cent more would be over 5 %
    const fivePercent = new Decimal(option.total).times('0.05').toDecimalPlaces(2, Decimal.ROUND_DOWN).toFixed(2);
    expect(option.isDepositCapped).toBe(true);
    expect(deposit.amount).toBe(fivePercent);
    // the rule is named where the client reads the schedule (snapshot → portal page and PDF)
    expect((made.body as ProposalVersionView).snapshot.depositRule).toBe('Five percent');
  });

  it('refuses a deposit limit finer than the currency (400 naming it, nothing written): no sen in yen', async () => {
    const f = await firmWithPricedEstimate(t, 'Billing Settings Yen');
    const {
      id: _id,
      slug: _slug,
      updatedAt: _u,
      logoUrl: _l,
      ...profile
    } = (await f.agent.get('/api/firm')).body as Record<string, unknown>;
    expect(
      (
        await f.agent
          .patch('/api/firm')
          .set('x-csrf-token', f.csrf())
          .send({ ...profile, currency: 'JPY' })
      ).status,
    ).toBe(200);
    for (const depositCap of [
      { kind: 'amount', amount: '100000.50' },
      { kind: 'lesserOf', amount: '100000.5', percent: 10 },
    ]) {
      const res = await f.agent
        .put('/api/firm/billing')
        .set('x-csrf-token', f.csrf())
        .send({ ...DEFAULT_BILLING_SETTINGS, depositCap, depositCapName: 'Deposit limit' });
      expect([res.status, res.body.errors]).toEqual([400, [{ field: 'depositCap.amount', message: 'Use whole amounts in JPY.' }]]);
    }
    expect((await f.agent.get('/api/firm/billing')).body.isDefault).toBe(true);
    const whole = await f.agent
      .put('/api/firm/billing')
      .set('x-csrf-token', f.csrf())
      .send({ ...DEFAULT_BILLING_SETTINGS, depositCap: { kind: 'amount', amount: '100000.00' }, depositCapName: 'Deposit limit' });
    expect(whole.status).toBe(200);
  });
});
