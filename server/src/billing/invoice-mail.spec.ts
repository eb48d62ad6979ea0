import { withTenant } from '@layerbook/db';
import { formatMoney } from '@layerbook/domain';
import { newAgent, startTestServer, TestServer } from '../testing/harness';
import { linkIn } from '../testing/inbox';
import { signInByLink } from '../proposals/portal-fixtures';
import { enqueueInvoiceMail, type InvoiceMailPurpose } from './invoice-mail';
import { acceptedJob, insertInvoice, voidWithCreditNote } from './pdf/invoice-fixtures';

let t: TestServer;
const NOW = new Date('2026-12-01T15:00:00Z');
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(NOW);
});
afterAll(() => t.stop());

const usd = (amount: string) => formatMoney(amount, 'USD', 'en-US');
const send = (firmId: string, invoiceId: string, purpose: InvoiceMailPurpose) =>
  withTenant(t.ctx.pool, firmId, (tx) => enqueueInvoiceMail(tx, t.ctx.queue, t.ctx.config, invoiceId, purpose, NOW));
/** The outbox rows for one purpose key (the web role cannot read the outbox; the jobs role sends it). */
const outbox = async (firmId: string, key: string) => {
  const { rows } = await t.queue.boss
    .getDb()
    .executeSql(`select subject, from_name from mail_outbox where tenant_id = $1 and purpose_key = $2`, [firmId, key]);
  return rows as Array<{ subject: string; from_name: string }>;
};

async function issuedInvoice(name: string) {
  const f = await acceptedJob(t, name);
  const invoiceId = await insertInvoice(t, f.firmId, f.jobId, {
    kind: 'deposit',
    status: 'issued',
    number: 7,
    issuedOn: '2026-12-01',
    dueOn: '2026-12-15',
    total: '1250.50',
    amountPaid: '250.50',
    lines: [{ label: 'Deposit', amount: '1250.50' }],
  });
  return { ...f, invoiceId };
}

describe('invoice e-mails', () => {
  it('sends the issued invoice from the firm with its amount, due date and a sign-in link that opens it in the portal, once', async () => {
    const f = await issuedInvoice('Mail Room Plaster');
    await send(f.firmId, f.invoiceId, { kind: 'issued' });
    await send(f.firmId, f.invoiceId, { kind: 'issued' });
    const subject = `Invoice INV-0007 from Mail Room Plaster: ${usd('1000.00')} due December 15, 2026`;
    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(f.clientEmail) && m.subject === subject);
    expect(mail.text).toContain(`Amount due: ${usd('1000.00')}, by December 15, 2026. Terms: Net 14`);
    expect(mail.html).toContain(usd('1000.00'));
    const link = linkIn(mail);
    expect(link).toMatch(new RegExp(`^http://localhost:4300/portal/sign-in/link\\?token=[\\w-]+&next=/portal/invoices/${f.invoiceId}$`));
    expect(await outbox(f.firmId, `invoice:${f.invoiceId}:issued`)).toEqual([{ subject, from_name: 'Mail Room Plaster' }]);

    const reader = await newAgent(t.app, 'portal');
    await signInByLink(reader, link);
    const opened = await reader.agent.get(`/api/portal/invoices/${f.invoiceId}`);
    expect(opened.status).toBe(200);
    expect(opened.body.amountDue).toBe('1000.00');
  });

  it('words each reminder step by its own, and the credit note with its number, reason and amount', async () => {
    const f = await issuedInvoice('Reminder Words Plaster');
    const firm = 'Reminder Words Plaster';
    for (const step of ['before:3', 'due', 'after:7']) await send(f.firmId, f.invoiceId, { kind: 'reminder', step });
    expect((await outbox(f.firmId, `invoice:${f.invoiceId}:reminder:before:3`))[0].subject).toBe(
      `Reminder: invoice INV-0007 from ${firm} is due December 15, 2026`,
    );
    expect((await outbox(f.firmId, `invoice:${f.invoiceId}:reminder:due`))[0].subject).toBe(
      `Invoice INV-0007 from ${firm} is due today: ${usd('1000.00')}`,
    );
    const late = await t.inbox.waitFor((m) => (m.subject ?? '').startsWith(`Invoice INV-0007 from ${firm} was due December 15, 2026`));
    expect(late.subject).toBe(`Invoice INV-0007 from ${firm} was due December 15, 2026: ${usd('1000.00')} still open`);
    expect(late.text).toContain(`/portal/invoices/${f.invoiceId}`);

    const voided = await insertInvoice(t, f.firmId, f.jobId, {
      kind: 'milestone',
      status: 'issued',
      number: 8,
      total: '640.00',
      lines: [{ label: 'Stage payment', amount: '640.00' }],
    });
    const creditNoteId = await voidWithCreditNote(t, f.firmId, voided, 2, 'Billed before the work was done');
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update invoices set voided_at = $3 where tenant_id = $1 and id = $2`, [tx.tenantId, voided, NOW]),
    );
    await send(f.firmId, voided, { kind: 'creditNote', creditNoteId });
    const note = await t.inbox.waitFor((m) => m.subject === `Credit note CN-0002 from ${firm}: invoice INV-0008 is cancelled`);
    expect(note.text).toContain(`with credit note CN-0002 for ${usd('640.00')}`);
    expect(note.text).toContain('Reason: Billed before the work was done');
    // The firm's own zone (America/New_York by default): 15:00 UTC is 10:00 AM EST.
    expect(note.text).toContain('December 1, 2026 at 10:00 AM EST');
  });

  it('refuses to send an issued invoice to a client with no e-mail (400 naming client.email), and skips a reminder quietly', async () => {
    const f = await issuedInvoice('No Address Plaster');
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update clients set email = '' where tenant_id = $1 and id = $2`, [tx.tenantId, f.clientId]),
    );
    const other = await insertInvoice(t, f.firmId, f.jobId, { kind: 'final', status: 'issued', number: 9, total: '10.00' });
    await expect(send(f.firmId, other, { kind: 'issued' })).rejects.toMatchObject({
      status: 400,
      errors: [{ field: 'client.email', message: expect.any(String) }],
    });
    await send(f.firmId, other, { kind: 'reminder', step: 'due' });
    expect(await outbox(f.firmId, `invoice:${other}:reminder:due`)).toEqual([]);
  });

  it("words the issued invoice and a reminder in the client's language (Spanish), with money and dates for it", async () => {
    const f = await issuedInvoice('Casa Cal Estucos');
    const patched = await f.agent.patch(`/api/clients/${f.clientId}`).set('x-csrf-token', f.csrf()).send({ language: 'es' });
    expect(patched.status).toBe(200);
    await send(f.firmId, f.invoiceId, { kind: 'issued' });
    await send(f.firmId, f.invoiceId, { kind: 'reminder', step: 'due' });
    // Intl (ICU) for es-US: the reference formatting of money and dates for a Spanish reader in the US
    const amount = formatMoney('1000.00', 'USD', 'es-US');
    const dueOn = new Intl.DateTimeFormat('es-US', { dateStyle: 'long', timeZone: 'UTC' }).format(new Date('2026-12-15T00:00:00Z'));
    const issued = await t.inbox.waitFor(
      (m) => JSON.stringify(m.to).includes(f.clientEmail) && (m.subject ?? '').startsWith('Factura INV-0007'),
    );
    expect(issued.subject).toBe(`Factura INV-0007 de Casa Cal Estucos: ${amount} con vencimiento el ${dueOn}`);
    expect(issued.text).toContain('le ha enviado la factura INV-0007 (Anticipo)');
    expect(issued.text).toContain(`Importe a pagar: ${amount}, a más tardar el ${dueOn}.`);
    expect(issued.html).toContain('lang="es"');
    const reminder = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(f.clientEmail) && (m.subject ?? '').includes('vence hoy'));
    expect(reminder.text).toContain('Su factura vence hoy');
    expect(reminder.text).not.toContain('Hello');
  });
});
