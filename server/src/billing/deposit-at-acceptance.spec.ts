import {
  DEFAULT_BILLING_SETTINGS,
  type EstimateInputs,
  type EstimateView,
  type BillingSettings,
  type BillingSettingsView,
  type InvoiceDetail,
  type JobBillingView,
  type JobSummary,
  type PortalProposalAccepted,
} from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { formatMoney } from '@layerbook/domain';
import { makeAndSend, sentProposal } from '../proposals/portal-fixtures';
import { startTestServer, type TestServer } from '../testing/harness';
import { billingQueueSettled } from './progress-fixtures';
import { ISSUED_AT_ACCEPTANCE } from './deposit-at-acceptance';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Proposal = Awaited<ReturnType<typeof sentProposal>>;

async function saveSettings(p: Proposal, settings: Partial<BillingSettings>) {
  const res = await p.agent
    .put('/api/firm/billing')
    .set('x-csrf-token', p.csrf())
    .send({ ...DEFAULT_BILLING_SETTINGS, ...settings });
  if (res.status !== 200) throw new Error(`settings not saved: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as BillingSettingsView;
}

async function accept(p: Proposal) {
  const res = await p.client.agent
    .post(`/api/portal/proposals/${p.version.id}/accept`)
    .set('x-csrf-token', p.client.csrf())
    .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });
  expect(res.status).toBe(200);
  const job = ((await p.agent.get('/api/jobs')).body as { items: JobSummary[] }).items[0];
  const billing = (await p.agent.get(`/api/jobs/${job.id}/billing`)).body as JobBillingView;
  return { answer: res.body as PortalProposalAccepted, jobId: job.id, billing };
}

const depositOf = (p: Proposal) => p.version.snapshot.options.find((o) => o.id === 'A')!.payments.find((x) => x.role === 'deposit')!;

const auditActions = (p: Proposal, jobId: string) =>
  withTenant(t.ctx.pool, p.firmId, async (tx) => {
    const { rows } = await tx.client.query<{ action: string; actor_kind: string; data: Record<string, unknown> }>(
      `select action, actor_kind, data from audit_log where tenant_id = $1 and entity_id = $2 order by created_at, id`,
      [tx.tenantId, jobId],
    );
    return rows;
  });

describe('deposit at acceptance (firm billing setting)', () => {
  it('is "draft" until the owner chooses; a PUT without it keeps today’s behaviour, an unknown choice is 400 naming it', async () => {
    const p = await sentProposal(t, 'Setting Plaster', { signIn: false });
    expect(((await p.agent.get('/api/firm/billing')).body as BillingSettingsView).settings.depositAtAcceptance).toBe('draft');
    expect((await saveSettings(p, { depositAtAcceptance: 'issueAndSend' })).settings.depositAtAcceptance).toBe('issueAndSend');

    const { depositAtAcceptance: _left, ...older } = DEFAULT_BILLING_SETTINGS;
    const withoutIt = await p.agent.put('/api/firm/billing').set('x-csrf-token', p.csrf()).send(older);
    expect(withoutIt.status).toBe(200);
    expect((withoutIt.body as BillingSettingsView).settings.depositAtAcceptance).toBe('draft');

    const wrong = await p.agent
      .put('/api/firm/billing')
      .set('x-csrf-token', p.csrf())
      .send({ ...DEFAULT_BILLING_SETTINGS, depositAtAcceptance: 'sometimes' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.errors).toEqual([
      { field: 'depositAtAcceptance', message: 'Choose whether the deposit is drafted or issued and e-mailed at acceptance.' },
    ]);
  });

  it('"draft": the acceptance answers no invoice, billing waits for the office and nothing is drafted yet', async () => {
    const p = await sentProposal(t, 'Draft Deposit Plaster');
    const { answer, jobId, billing } = await accept(p);
    expect(answer.status).toBe('accepted');
    expect(answer.depositInvoiceId).toBeNull();
    expect(billing.billingStartedAt).toBeNull();
    expect(billing.invoices).toEqual([]);
    expect(billing.lines.find((l) => l.role === 'deposit')?.status).toBe('draft');
    expect((await auditActions(p, jobId)).map((a) => a.action)).not.toContain('billing.started');
  });

  it('"issueAndSend": the deposit is issued with its number and e-mailed in the acceptance, and the client can open it at once', async () => {
    const p = await sentProposal(t, 'Issue Deposit Plaster');
    await saveSettings(p, { depositAtAcceptance: 'issueAndSend' });
    const deposit = depositOf(p);
    const { answer, jobId, billing } = await accept(p);
    expect(answer.status).toBe('accepted');
    expect(answer.depositInvoiceId).toEqual(expect.any(String));
    const id = answer.depositInvoiceId!;

    // Billing started on the schedule as signed; the deposit line is invoiced by this invoice, the others wait for their triggers.
    expect(billing.billingStartedAt).toBe('2026-12-01T15:00:00.000Z');
    expect(billing.lines.map((l) => [l.role, l.status, l.invoiceId])).toEqual(
      billing.lines.map((l) => (l.role === 'deposit' ? ['deposit', 'invoiced', id] : [l.role, 'scheduled', null])),
    );

    const invoice = (await p.agent.get(`/api/invoices/${id}`)).body as InvoiceDetail;
    expect(invoice).toMatchObject({
      kind: 'deposit',
      status: 'issued',
      number: 'INV-0001',
      issuedOn: '2026-12-01',
      dueOn: '2026-12-15', // the firm's terms: net 14
      total: deposit.amount,
      amountDue: deposit.amount,
      origin: 'queue',
      triggerText: ISSUED_AT_ACCEPTANCE,
      sentAt: '2026-12-01T15:00:00.000Z',
    });

    // The client reads it in the portal straight away, and has it by e-mail from the firm.
    const opened = await p.client.agent.get(`/api/portal/invoices/${id}`);
    expect(opened.status).toBe(200);
    expect(opened.body.amountDue).toBe(deposit.amount);
    const mail = await t.inbox.waitFor(
      (m) => JSON.stringify(m.to).includes(p.clientEmail) && (m.subject ?? '').startsWith('Invoice INV-0001 from Issue Deposit Plaster'),
    );
    expect(mail.subject).toBe(
      `Invoice INV-0001 from Issue Deposit Plaster: ${formatMoney(deposit.amount, 'USD', 'en-US')} due December 15, 2026`,
    );

    // Who did what: the client accepted, the firm's setting started billing and issued (no person).
    const trail = await auditActions(p, jobId);
    expect(trail.filter((a) => a.action === 'billing.started').map((a) => a.actor_kind)).toEqual(['system']);

    // The queue's check after billing started drafts nothing more for the deposit.
    await billingQueueSettled(t, [p.firmId]);
    const after = (await p.agent.get(`/api/jobs/${jobId}/billing`)).body as JobBillingView;
    expect(after.invoices.map((i) => [i.kind, i.status, i.number])).toEqual([['deposit', 'issued', 'INV-0001']]);
  }, 120_000);

  it('"issueAndSend" with a deposit above the firm’s limit: the acceptance goes through and the deposit is left for the office', async () => {
    const p = await sentProposal(t, 'Capped Deposit Plaster');
    await saveSettings(p, {
      depositAtAcceptance: 'issueAndSend',
      depositCap: { kind: 'amount', amount: '1.00' },
      depositCapName: 'At most 1.00',
    });
    const { answer, jobId, billing } = await accept(p);
    expect(answer.status).toBe('accepted');
    expect(answer.depositInvoiceId).toBeNull();
    expect(billing.billingStartedAt).toBeNull();
    expect(billing.invoices).toEqual([]);
    const trail = await auditActions(p, jobId);
    // Both rows are written in the acceptance's transaction, at one instant: compare them as a set.
    expect(trail.map((a) => a.action).sort()).toEqual(['billing.deposit_left_for_office', 'job.created']);
    expect(trail.find((a) => a.action === 'billing.deposit_left_for_office')?.data['reason']).toBe(
      'Fix the schedule before billing starts.',
    );
    // Nothing numbered: the office's first invoice is still INV-0001.
    const counters = await withTenant(
      t.ctx.pool,
      p.firmId,
      async (tx) => (await tx.client.query(`select series from document_counters where tenant_id = $1`, [tx.tenantId])).rows,
    );
    expect(counters).toEqual([]);
  });

  it('two acceptances at once in one firm: each deposit is issued once, numbered INV-0001 and INV-0002', async () => {
    const p = await sentProposal(t, 'Twin Deposit Plaster');
    await saveSettings(p, { depositAtAcceptance: 'issueAndSend' });
    // A second proposal for the same client: another estimate with option B's work, sent.
    const first = (await p.agent.get(`/api/estimates/${p.estimateId}`)).body as EstimateView;
    const made = (
      await p.agent
        .post('/api/estimates')
        .set('x-csrf-token', p.csrf())
        .send({ siteId: first.siteId, title: 'Hall limewash', startDate: '2026-12-14' })
    ).body as EstimateView;
    const inputs: EstimateInputs = {
      ...first.inputs,
      title: 'Hall limewash',
      startDate: '2026-12-14',
      variants: [first.inputs.variants[1]],
    };
    expect((await p.agent.put(`/api/estimates/${made.id}/inputs`).set('x-csrf-token', p.csrf()).send(inputs)).status).toBe(200);
    const second = await makeAndSend(t, { ...p, estimateId: made.id });

    const answers = await Promise.all(
      [
        { id: p.version.id, variantId: 'A' },
        { id: second.id, variantId: second.snapshot.options[0].id },
      ].map(({ id, variantId }) =>
        p.client.agent
          .post(`/api/portal/proposals/${id}/accept`)
          .set('x-csrf-token', p.client.csrf())
          .send({ variantId, signedName: 'Edwina Marl', consent: true }),
      ),
    );
    expect(answers.map((a) => a.status)).toEqual([200, 200]);
    const ids = answers.map((a) => (a.body as PortalProposalAccepted).depositInvoiceId);
    expect(new Set(ids).size).toBe(2);
    const numbers = await Promise.all(ids.map(async (id) => ((await p.agent.get(`/api/invoices/${id!}`)).body as InvoiceDetail).number));
    expect(numbers.sort()).toEqual(['INV-0001', 'INV-0002']);
    await billingQueueSettled(t, [p.firmId]);
    const deposits = await withTenant(
      t.ctx.pool,
      p.firmId,
      async (tx) =>
        (
          await tx.client.query<{ status: string; n: number }>(
            `select status, count(*)::int as n from invoices where tenant_id = $1 and kind = 'deposit' group by status`,
            [tx.tenantId],
          )
        ).rows,
    );
    expect(deposits).toEqual([{ status: 'issued', n: 2 }]);
  }, 120_000);
});
