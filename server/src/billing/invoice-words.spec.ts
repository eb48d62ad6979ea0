import {
  DEFAULT_BILLING_SETTINGS,
  DEPOSIT_CAP_PRESETS,
  type InvoiceDetail,
  type InvoiceDocument,
  type JobBillingView,
  type PortalStatement,
  type ProgressTable,
} from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { formatMoney, paymentLabel } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { translator } from '../i18n/catalog';
import { binary, pdfTextOf as textOf } from '../testing/binary';
import { startTestServer, type TestServer } from '../testing/harness';
import { billingJob } from './billing-fixtures';
import {
  depositPresetOf,
  documentForReader,
  linesForReader,
  linesWithWords,
  progressForReader,
  progressWithWords,
  scheduleLineWords,
  systemText,
} from './invoice-words';
import { insertInvoice } from './pdf/invoice-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

const CALIFORNIA = DEPOSIT_CAP_PRESETS.find((p) => p.id === 'caHomeImprovement')!;
// Intl.NumberFormat with the CLDR data Node ships: Spanish in the firm's country (es-US).
const californiaEs = `Contratos de mejoras para el hogar en California (Bus. & Prof. Code §7159): lo que sea menor entre ${formatMoney('1000.00', 'USD', 'es-US')} y el 10 % del contrato`;
const NET_14_EN = 'Net 14 (due 14 days after the invoice date)';
const NET_14_ES = 'Pago a 14 días (vence 14 días después de la fecha de la factura)';

/** Just the document's words: the terms (net 14) and a deposit rule by its name. */
const depositRuleDocument = (name: string): InvoiceDocument => ({
  firm: { name: 'Firm', addressLines: [], phone: '', taxId: '', logoFileId: null },
  client: { name: 'Client', email: '', addressLines: [] },
  site: { label: '', addressLines: [] },
  jobTitle: 'Job',
  termsText: NET_14_EN,
  depositCapName: name,
  terms: { kind: 'net', days: 14 },
  depositRule: depositPresetOf(name, true),
  footer: '',
  locale: 'en-US',
});

/** A progress table with these value lines (the figures do not matter here). */
const progressTable = (labels: readonly string[]): ProgressTable => {
  const zero = '0.00';
  return {
    periodEnd: '2026-12-31',
    lines: labels.map((label, i) => ({
      valueLineId: `v${i}`,
      label,
      scheduledValue: zero,
      previousWork: zero,
      thisPeriodWork: zero,
      storedMaterials: zero,
      completedToDate: zero,
      percentComplete: '0',
      balanceToFinish: zero,
      retainage: zero,
    })),
    retainageRates: { workPercent: 0, storedPercent: 0, stopAtPercentComplete: null },
    summary: {
      originalContractSum: zero,
      changeOrders: zero,
      contractSumToDate: zero,
      completedToDate: zero,
      retainage: zero,
      earnedLessRetainage: zero,
      previouslyBilled: zero,
      dueThisPeriod: zero,
      balanceToFinishWithRetainage: zero,
    },
  };
};

describe('the words the system writes into an invoice, in the reader’s language', () => {
  it('keys the English words exactly as they were written, and the catalog says them again word for word', () => {
    const en = translator('en');
    for (const role of ['deposit', 'milestone', 'final'] as const) {
      for (const trigger of [{ kind: 'acceptance' }, { kind: 'walkthrough' }, { kind: 'layerComplete', layerId: 'l1' }] as const) {
        const label = paymentLabel(role, trigger, 'Base coat');
        const words = scheduleLineWords(label, role, trigger)!;
        expect(en(words.key, words.params as Record<string, string>)).toBe(label);
      }
    }
    expect(depositPresetOf(CALIFORNIA.name, true)).toBe('caHomeImprovement');
    expect(depositPresetOf('No deposit limit', false)).toBe('none');
    expect(depositPresetOf('Our own rule: 20 % at most', true)).toBeUndefined();
    // The retainage release, a dated line and the default value line, as a Spanish client reads them (CLDR es long dates).
    const es = { language: 'es', locale: 'es-US' } as const;
    const dated = paymentLabel('final', { kind: 'date', date: '2026-12-10' });
    const lines = linesWithWords(
      [
        { label: 'Retainage released', amount: '10.00' },
        { label: dated, amount: '5.00' },
      ],
      { role: 'final', trigger: { kind: 'date', date: '2026-12-10' } },
    );
    expect(linesForReader(es, lines).map((l) => l.label)).toEqual([
      'Liberación de la retención',
      'Pago final con vencimiento el 10 de diciembre de 2026',
    ]);
    expect(linesForReader({ language: 'en', locale: 'en-US' }, lines).map((l) => l.label)).toEqual(['Retainage released', dated]);
    const table = progressWithWords(progressTable(['All the work', 'Dining room']));
    expect(progressForReader(es, table)!.lines.map((l) => l.label)).toEqual(['Todo el trabajo', 'Dining room']);

    // An English reader reads the stored words as issued ("$1,000", not the catalog's figures formatted again).
    const rule = depositRuleDocument(CALIFORNIA.name);
    expect(documentForReader({ language: 'en', locale: 'en-US' }, rule).depositCapName).toBe(CALIFORNIA.name);
    expect(documentForReader({ language: 'es', locale: 'es-US' }, rule).depositCapName).toBe(californiaEs);
    // A key the catalog does not have prints the stored text, never the key.
    expect(systemText({ language: 'es', locale: 'es-US' }, 'Deposit on acceptance', { key: 'invoiceWords.line.gone' })).toBe(
      'Deposit on acceptance',
    );
  });

  it('prints a Spanish client’s invoice, e-mail and portal page in Spanish; the office reads English; typed and older words stay as they are', async () => {
    const f = await billingJob(t, 'Estuco Palabras');
    expect((await f.send('patch', `/api/clients/${f.clientId}`, { language: 'es' })).status).toBe(200);
    const settings = { ...DEFAULT_BILLING_SETTINGS, depositCap: CALIFORNIA.rule, depositCapName: CALIFORNIA.name };
    expect((await f.send('put', '/api/firm/billing', settings)).status).toBe(200);
    // The final payment's label typed by the office: it prints as typed for every reader.
    const before = await f.billing();
    const typed = 'Last payment at hand-over of the keys';
    // The deposit within the California rule (the lesser of 1,000 and 10 % of this contract), the rest on the stage payment.
    const cap = Decimal.min(new Decimal(before.contractSum).times('0.1').toDecimalPlaces(2, Decimal.ROUND_DOWN), 1000);
    const over = new Decimal(before.lines[0].amount).minus(cap);
    const amountOf = (l: JobBillingView['lines'][number]) =>
      l.role === 'deposit' ? cap.toFixed(2) : l.role === 'milestone' ? over.plus(l.amount).toFixed(2) : l.amount;
    const edited = await f.send('put', `/api/jobs/${f.jobId}/billing/schedule`, {
      method: before.method,
      lines: before.lines.map((l) => ({
        id: l.id,
        label: l.role === 'final' ? typed : l.label,
        role: l.role,
        trigger: l.trigger,
        amount: amountOf(l),
      })),
    });
    expect(edited.status).toBe(200);
    const started = await f.send('post', `/api/jobs/${f.jobId}/billing/start`);
    expect(started.status).toBe(200);
    const lines = (started.body as JobBillingView).lines;
    const [deposit, stage, final] = [lines[0], lines.find((l) => l.role === 'milestone')!, lines.find((l) => l.role === 'final')!];
    const layer = stage.label.match(/^Progress payment when (.+) is finished on every surface$/)![1];

    const depositId = await f.lineDraft(deposit.id);
    await f.issue(depositId, { send: true });
    const stageId = await f.lineDraft(stage.id);
    // As a draft made before words were kept: issuing gives its label the key.
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(
        `update invoices set lines = (select jsonb_agg(l - 'words') from jsonb_array_elements(lines) l) where tenant_id = $1 and id = $2`,
        [tx.tenantId, stageId],
      ),
    );
    await f.issue(stageId);
    const finalId = await f.lineDraft(final.id);
    await f.issue(finalId);

    // The office keeps English: the stored words, as issued.
    const office = (await f.agent.get(`/api/invoices/${depositId}`)).body as InvoiceDetail;
    expect(office.lines[0].label).toBe('Deposit on acceptance');
    expect(office.document).toMatchObject({ termsText: NET_14_EN, depositCapName: CALIFORNIA.name });

    // The portal: the client's language (Spanish), the firm's layer name as the firm wrote it.
    const portal = async (id: string) => (await f.client.agent.get(`/api/portal/invoices/${id}`)).body as InvoiceDetail;
    const portalDeposit = await portal(depositId);
    expect(portalDeposit.lines[0].label).toBe('Anticipo al aceptar la propuesta');
    expect(portalDeposit.document).toMatchObject({ termsText: NET_14_ES, depositCapName: californiaEs });
    expect((await portal(stageId)).lines[0].label).toBe(`Pago de avance cuando la capa ${layer} esté terminada en todas las superficies`);
    expect((await portal(finalId)).lines[0].label).toBe(typed);

    // The PDF, for the client and for the office: printed in the client's language.
    for (const agent of [f.client.agent, f.agent]) {
      const prefix = agent === f.agent ? '/api' : '/api/portal';
      const text = textOf((await binary(agent, `${prefix}/invoices/${depositId}/pdf`)).body);
      expect(text).toContain('Anticipo al aceptar la propuesta');
      expect(text).toContain(`Condiciones: ${NET_14_ES}`);
      expect(text).toContain(`Regla del anticipo: ${californiaEs}`);
      expect(text).not.toContain('Deposit on acceptance');
      expect(text).not.toContain('Net 14');
    }
    expect(textOf((await binary(f.client.agent, `/api/portal/invoices/${finalId}/pdf`)).body)).toContain(typed);

    // The e-mail: the terms in Spanish.
    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(f.clientEmail) && String(m.text).includes('Condiciones:'));
    expect(mail.text).toContain(`Condiciones: ${NET_14_ES}.`);
    expect(mail.text).not.toContain('Net 14');

    // The statement names each invoice by its kind in Spanish too, and a payment by how it came (same day: invoices first).
    expect(
      (
        await f.send('post', `/api/invoices/${depositId}/payments`, {
          method: 'cheque',
          amount: '100.00',
          receivedOn: '2026-12-01',
          reference: '1042',
        })
      ).status,
    ).toBe(200);
    const statement = (await f.client.agent.get(`/api/portal/jobs/${f.jobId}/statement`)).body as PortalStatement;
    expect(statement.lines.map((l) => l.text)).toEqual([
      'INV-0001 Anticipo',
      'INV-0002 Pago por etapa',
      'INV-0003 Factura final',
      'Pago con cheque 1042',
    ]);

    // An invoice issued before words were kept has no keys: every reader reads the stored English.
    const older = await insertInvoice(t, f.firmId, f.jobId, {
      kind: 'milestone',
      status: 'issued',
      number: 40,
      issuedOn: '2026-11-20',
      dueOn: '2026-12-04',
      total: '100.00',
      lines: [{ label: 'Deposit on acceptance', amount: '100.00' }],
    });
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update invoices set document = document - 'terms' - 'depositRule' where tenant_id = $1 and id = $2`, [
        tx.tenantId,
        older,
      ]),
    );
    const old = await portal(older);
    expect(old.lines[0].label).toBe('Deposit on acceptance');
    expect(old.document.termsText).toMatch(/^Net 14/);
  }, 120_000);
});
