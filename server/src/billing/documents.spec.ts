import { formatMoney } from '@layerbook/domain';
import { binary, pdfTextOf as textOf } from '../testing/binary';
import { otherClientOf } from '../proposals/portal-fixtures';
import { joinAs } from '../proposals/proposal-fixtures';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { acceptedJob, insertInvoice, insertPayment, PROGRESS, TERMS, voidWithCreditNote } from './pdf/invoice-fixtures';
import { DRAFT_MARK } from './pdf/render-invoice';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-20T15:00:00Z'));
});
afterAll(() => t.stop());

const usd = (amount: string) => formatMoney(amount, 'USD', 'en-US');

/** One firm's job with a deposit invoice (part paid), a progress invoice (overdue), a draft, and a voided one with its credit note. */
async function billedJob(name: string) {
  const f = await acceptedJob(t, name);
  const deposit = await insertInvoice(t, f.firmId, f.jobId, {
    kind: 'deposit',
    status: 'part_paid',
    number: 1,
    issuedOn: '2026-12-01',
    dueOn: '2026-12-15',
    total: '1000.00',
    taxIncluded: '76.21',
    amountPaid: '400.00',
    lines: [{ label: 'Deposit on acceptance', amount: '1000.00' }],
  });
  await insertPayment(t, f.firmId, deposit, { method: 'cheque', amount: '400.00', receivedOn: '2026-12-04', reference: '1042' });
  const progress = await insertInvoice(t, f.firmId, f.jobId, {
    kind: 'progress',
    status: 'issued',
    number: 2,
    issuedOn: '2026-12-02',
    dueOn: '2026-12-16',
    periodEnd: '2026-12-20',
    subtotal: '2810.00',
    depositCredit: '300.00',
    total: '2510.00',
    taxIncluded: '191.29',
    progress: PROGRESS,
  });
  const draft = await insertInvoice(t, f.firmId, f.jobId, {
    kind: 'milestone',
    status: 'draft',
    total: '2000.00',
    lines: [{ label: 'Stage payment: base coats done', amount: '2000.00' }],
  });
  const voided = await insertInvoice(t, f.firmId, f.jobId, {
    kind: 'milestone',
    status: 'issued',
    number: 3,
    issuedOn: '2026-12-03',
    dueOn: '2026-12-17',
    total: '750.00',
    lines: [{ label: 'Stage payment', amount: '750.00' }],
  });
  const creditNote = await voidWithCreditNote(t, f.firmId, voided, 1, 'Billed twice by mistake');
  return { ...f, deposit, progress, draft, voided, creditNote };
}

describe('invoice and credit-note PDFs', () => {
  it('prints the firm, tax number, logo, client, site, dates, terms, lines, summary, deposit rule and footer', async () => {
    const f = await billedJob('Ledger Lime Plaster');
    const res = await binary(f.agent, `/api/invoices/${f.deposit}/pdf`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe('attachment; filename="invoice-inv-0001-dining-room-plaster.pdf"');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    // The logo is drawn as an image on the page.
    expect((res.body as Buffer).toString('latin1')).toContain('/Subtype /Image');
    const text = textOf(res.body);
    for (const words of [
      'Ledger Lime Plaster',
      '12 Kiln Lane',
      '+1 802 555 0142',
      'Tax number: EIN 98-7654321',
      'INVOICE',
      'Number: INV-0001',
      'Date: December 1, 2026',
      'Due: December 15, 2026',
      'Net 14 (due 14 days after the invoice date)',
      'Edwina Marl',
      '1 Round Row',
      'Dining room plaster',
      'Deposit on acceptance',
      `Invoice total ${usd('1000.00')}`,
      `Tax included in the total ${usd('76.21')}`,
      `Paid \u2212 ${usd('400.00')}`,
      `Amount due ${usd('600.00')}`,
      // the test's day is December 20: past the due date with money still due, the status says so as the lists do
      'Overdue',
      `Please pay ${usd('600.00')} now: it was due on December 15, 2026.`,
      `Deposit rule: ${TERMS.depositCapName}`,
      'Thank you: cheques to Kiln Lane.',
    ])
      expect([words, text.includes(words)]).toEqual([words, true]);
    expect(text).not.toContain('Part paid');
    expect(text).not.toContain(DRAFT_MARK);
  });

  it('prints a progress invoice with our own columns, every line, the deposit credit and the period summary', async () => {
    const f = await billedJob('Column Words Plaster');
    const text = textOf((await binary(f.agent, `/api/invoices/${f.progress}/pdf`)).body);
    // The deposit cap is the deposit's: not repeated on the invoices after it.
    expect(text).not.toContain('Deposit rule:');
    for (const column of [
      'Scheduled value',
      'Done before',
      'Done this period',
      'Stored on site',
      'Done to date',
      '%',
      'Left to do',
      'Retainage held',
    ])
      expect(text).toContain(column);
    expect(text).toContain('Progress invoice for work to December 20, 2026');
    expect(text).toContain('Walls: lime base coats');
    for (const amount of ['6000.00', '1500.00', '2700.00', '400.00', '4600.00', '1400.00', '440.00']) expect(text).toContain(usd(amount));
    expect(text).toContain('76.67 %');
    expect(text).toContain(`Contract sum to date ${usd('10000.00')}`);
    expect(text).toContain(`Due this period ${usd('2810.00')}`);
    expect(text).toContain(`Deposit credit \u2212 ${usd('300.00')}`);
    expect(text).toContain(`Amount due ${usd('2510.00')}`);
  });

  it('marks a draft "DRAFT — not an invoice" (office review) and prints the credit note with the voided number, reason and amount', async () => {
    const f = await billedJob('Draft Mark Plaster');
    const draft = await binary(f.agent, `/api/invoices/${f.draft}/pdf`);
    expect(draft.status).toBe(200);
    expect(draft.headers['content-disposition']).toBe('attachment; filename="invoice-draft-dining-room-plaster.pdf"');
    const draftText = textOf(draft.body);
    expect(draftText).toContain(DRAFT_MARK);
    expect(draftText).toContain('Stage payment: base coats done');
    expect(draftText).toContain(`Amount due ${usd('2000.00')}`);

    const note = await binary(f.agent, `/api/credit-notes/${f.creditNote}/pdf`);
    expect(note.status).toBe(200);
    expect(note.headers['content-disposition']).toBe('attachment; filename="credit-note-cn-0001-dining-room-plaster.pdf"');
    const noteText = textOf(note.body);
    for (const words of [
      'CREDIT NOTE',
      'Number: CN-0001',
      'For invoice: INV-0003',
      'Reason: Billed twice by mistake',
      `Amount credited ${usd('750.00')}`,
    ])
      expect(noteText).toContain(words);
    expect(textOf((await binary(f.agent, `/api/invoices/${f.voided}/pdf`)).body)).toContain('This invoice is void');
  });

  it('office reads, crew gets 403, another firm 404; the client gets only their own issued ones', async () => {
    const f = await billedJob('Who Reads Plaster');
    const office = await joinAs(t, f, 'office');
    expect((await binary(office.agent, `/api/invoices/${f.deposit}/pdf`)).status).toBe(200);
    const crew = await joinAs(t, f, 'crew');
    expect((await crew.agent.get(`/api/invoices/${f.deposit}/pdf`)).status).toBe(403);
    expect((await crew.agent.get(`/api/credit-notes/${f.creditNote}/pdf`)).status).toBe(403);
    const other = await signUpFirm(t.app, 'Elsewhere Plaster');
    expect((await other.agent.get(`/api/invoices/${f.deposit}/pdf`)).status).toBe(404);
    expect((await other.agent.get(`/api/credit-notes/${f.creditNote}/pdf`)).status).toBe(404);
    expect((await f.agent.get('/api/invoices/not-an-id/pdf')).status).toBe(400);

    const mine = await binary(f.client.agent, `/api/portal/invoices/${f.deposit}/pdf`);
    expect(mine.status).toBe(200);
    expect(textOf(mine.body)).toContain(`Amount due ${usd('600.00')}`);
    expect((await binary(f.client.agent, `/api/portal/credit-notes/${f.creditNote}/pdf`)).status).toBe(200);
    expect((await f.client.agent.get(`/api/portal/invoices/${f.draft}/pdf`)).status).toBe(404);
    const neighbour = await otherClientOf(t, f);
    expect((await neighbour.agent.get(`/api/portal/invoices/${f.deposit}/pdf`)).status).toBe(404);
    expect((await neighbour.agent.get(`/api/portal/credit-notes/${f.creditNote}/pdf`)).status).toBe(404);
    expect((await other.agent.get(`/api/portal/invoices/${f.deposit}/pdf`)).status).toBe(401);
  });
});

describe('the client’s invoices in the portal', () => {
  it('lists issued, part-paid and void invoices (never drafts) with amount due and overdue; opens one; 404 for another client', async () => {
    const f = await billedJob('Portal List Plaster');
    const list = await f.client.agent.get('/api/portal/invoices');
    expect(list.status).toBe(200);
    const items = list.body.items as Array<Record<string, unknown>>;
    expect(items.map((i) => [i.number, i.status, i.isOverdue, i.amountDue])).toEqual([
      ['INV-0003', 'void', false, '0.00'],
      ['INV-0002', 'issued', true, '2510.00'],
      ['INV-0001', 'part_paid', true, '600.00'],
    ]);
    expect(items.map((i) => i.id)).not.toContain(f.draft);
    expect(items[1]).toMatchObject({
      kind: 'progress',
      jobId: f.jobId,
      jobTitle: 'Dining room plaster',
      dueOn: '2026-12-16',
      total: '2510.00',
    });

    const one = await f.client.agent.get(`/api/portal/invoices/${f.progress}`);
    expect(one.status).toBe(200);
    expect(one.body).toMatchObject({
      number: 'INV-0002',
      depositCredit: '300.00',
      taxIncluded: '191.29',
      amountDue: '2510.00',
      canPayOnline: false,
      payOnlineReason: null,
      creditNote: null,
    });
    expect(one.body.progress.summary.dueThisPeriod).toBe('2810.00');
    expect(one.body.document.firm.taxId).toBe('EIN 98-7654321');
    const voided = await f.client.agent.get(`/api/portal/invoices/${f.voided}`);
    expect(voided.body.creditNote).toMatchObject({ id: f.creditNote, number: 'CN-0001', issuedOn: '2026-12-03', amount: '750.00' });

    expect((await f.client.agent.get(`/api/portal/invoices/${f.draft}`)).status).toBe(404);
    const neighbour = await otherClientOf(t, f);
    expect((await neighbour.agent.get('/api/portal/invoices')).body.items).toEqual([]);
    expect((await neighbour.agent.get(`/api/portal/invoices/${f.deposit}`)).status).toBe(404);
    expect((await neighbour.agent.get(`/api/portal/jobs/${f.jobId}/statement`)).status).toBe(404);
    expect((await f.client.agent.get('/api/portal/invoices/nope')).status).toBe(400);
    expect((await f.agent.get('/api/portal/invoices')).status).toBe(401);
  });

  it('gives a statement per job: invoices, the credit note and payments with the running balance (domain jobStatement)', async () => {
    const f = await billedJob('Statement Plaster');
    const res = await f.client.agent.get(`/api/portal/jobs/${f.jobId}/statement`);
    expect(res.status).toBe(200);
    expect(res.body.lines.map((l: Record<string, string>) => [l.on, l.text, l.charge, l.credit, l.balance])).toEqual([
      ['2026-12-01', 'INV-0001 Deposit', '1000.00', '0.00', '1000.00'],
      ['2026-12-02', 'INV-0002 Progress invoice', '2510.00', '0.00', '3510.00'],
      ['2026-12-03', 'INV-0003 Stage payment', '750.00', '0.00', '4260.00'],
      ['2026-12-03', 'CN-0001 for INV-0003', '0.00', '750.00', '3510.00'],
      ['2026-12-04', 'Payment by cheque 1042', '0.00', '400.00', '3110.00'],
    ]);
    expect(res.body).toMatchObject({
      invoiced: '4260.00',
      credited: '750.00',
      paid: '400.00',
      balanceDue: '3110.00',
      jobTitle: 'Dining room plaster',
    });
  });
});

describe('odd ids', () => {
  it('answer 400 or 404, never 5xx, on every document and portal route', async () => {
    const f = await acceptedJob(t, 'Odd Ids Plaster');
    const ids = ['nope', '%zz', '..', '00000000-0000-0000-0000-000000000000', 'a'.repeat(300), "1' or '1'='1"];
    for (const id of ids) {
      const segment = encodeURIComponent(id);
      for (const [agent, path] of [
        [f.agent, `/api/invoices/${segment}/pdf`],
        [f.agent, `/api/credit-notes/${segment}/pdf`],
        [f.client.agent, `/api/portal/invoices/${segment}`],
        [f.client.agent, `/api/portal/invoices/${segment}/pdf`],
        [f.client.agent, `/api/portal/credit-notes/${segment}/pdf`],
        [f.client.agent, `/api/portal/jobs/${segment}/statement`],
      ] as const) {
        const res = await agent.get(path);
        expect([path, [400, 404].includes(res.status)]).toEqual([path, true]);
      }
    }
  });
});
