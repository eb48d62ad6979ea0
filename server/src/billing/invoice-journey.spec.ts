import type { InvoiceDetail } from '@layerbook/contracts';
import { formatMoney } from '@layerbook/domain';
import { pdfText } from '../proposals/pdf/pdf-text';
import { signInByLink } from '../proposals/portal-fixtures';
import { newAgent, startTestServer, TestServer } from '../testing/harness';
import { linkIn } from '../testing/inbox';
import { billingJob } from './billing-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

const usd = (amount: string) => formatMoney(amount, 'USD', 'en-US');

describe('an invoice from issue to the client', () => {
  it('issued with send: the e-mail brings the client to it in the portal, with the same amount on screen and in the PDF; voided: the credit note follows', async () => {
    const f = await billingJob(t, 'Journey Lime Plaster');
    const started = await f.send('post', `/api/jobs/${f.jobId}/billing/start`);
    expect(started.status).toBe(200);
    const deposit = (await f.billing()).lines[0];
    const id = await f.lineDraft(deposit.id);
    const issued: InvoiceDetail = await f.issue(id, { send: true });
    expect(issued.sentAt).not.toBeNull();

    const subject = `Invoice ${issued.number} from Journey Lime Plaster: ${usd(deposit.amount)} due December 15, 2026`;
    const mail = await t.inbox.waitFor((m) => m.subject === subject);
    expect(JSON.stringify(mail.to)).toContain(f.clientEmail);
    const reader = await newAgent(t.app, 'portal');
    await signInByLink(reader, linkIn(mail));
    expect(new URL(linkIn(mail)).searchParams.get('next')).toBe(`/portal/invoices/${id}`);

    const list = await reader.agent.get('/api/portal/invoices');
    expect(list.body.items.map((i: { id: string; amountDue: string }) => [i.id, i.amountDue])).toEqual([[id, deposit.amount]]);
    const pdf = await reader.agent
      .get(`/api/portal/invoices/${id}/pdf`)
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(pdf.status).toBe(200);
    const text = pdfText(pdf.body as Buffer).replace(/\s+/g, ' ');
    expect(text).toContain(`Number: ${issued.number}`);
    expect(text).toContain(`Amount due ${usd(deposit.amount)}`);

    const voided = await f.send('post', `/api/invoices/${id}/void`, { reason: 'Wrong deposit amount' });
    expect(voided.status).toBe(200);
    const note = (voided.body as InvoiceDetail).creditNote!;
    const noteMail = await t.inbox.waitFor(
      (m) => m.subject === `Credit note ${note.number} from Journey Lime Plaster: invoice ${issued.number} is cancelled`,
    );
    expect(noteMail.text).toContain('Reason: Wrong deposit amount');
    const seen = await reader.agent.get(`/api/portal/invoices/${id}`);
    expect(seen.body).toMatchObject({ status: 'void', amountDue: '0.00', creditNote: { id: note.id, number: note.number } });
  });
});
