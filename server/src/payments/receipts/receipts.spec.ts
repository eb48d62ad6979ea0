import type { RefundView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { formatMoney } from '@layerbook/domain';
import { binary, pdfTextOf as textOf } from '../../testing/binary';
import { otherClientOf } from '../../proposals/portal-fixtures';
import { signUpFirm, startTestServer, type TestServer } from '../../testing/harness';
import { enqueueReceiptMail } from '../receipt-mail';
import { issuedInvoice } from '../refund-fixtures';
import { listPortalReceipts, loadPaymentReceipt } from './receipt-read';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-20T15:00:00Z'));
});
afterAll(() => t.stop());

const usd = (amount: string) => formatMoney(amount, 'USD', 'en-US');

/** The outbox row of one purpose key (the jobs role sends the outbox; the web role cannot read it). */
const outbox = async (firmId: string, key: string) => {
  const { rows } = await t.queue.boss
    .getDb()
    .executeSql(`select to_address, subject, text, from_name from mail_outbox where tenant_id = $1 and purpose_key = $2`, [firmId, key]);
  return rows as Array<{ to_address: string; subject: string; text: string; from_name: string }>;
};

/** INV-0001 for 250.00: a cheque of 100.00 (RCT-0001), 30.00 of it refunded (RCT-0002), then 200.00 by transfer (RCT-0003). */
async function receiptsJob(name: string) {
  const f = await issuedInvoice(t, name, '250.00');
  const cheque = await f.payOffline('100.00', '1042', '2026-12-04');
  const refund = await f.refund(cheque, {
    amount: '30.00',
    method: 'cheque',
    reference: '2001',
    refundedOn: '2026-12-18',
    reason: 'One wall left plain',
  });
  if (refund.status !== 201) throw new Error(`refund not recorded: ${refund.status} ${JSON.stringify(refund.body)}`);
  const transfer = await f.payDirect({ amount: '200.00', reference: 'TRF-88', receivedOn: '2026-12-12' });
  return { ...f, cheque, transfer: transfer.paymentId, refundId: (refund.body as RefundView).id };
}

describe('receipt PDFs', () => {
  it('prints a payment receipt: the firm, the number, the client, the invoice and job, how it was paid, the credit kept and what is due', async () => {
    const f = await receiptsJob('Receipt Row Plaster');
    const res = await binary(f.agent, `/api/payments/${f.transfer}/receipt.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="receipt-rct-0003-[a-z0-9-]+\.pdf"$/);
    const text = textOf(res.body);
    for (const words of [
      'Receipt Row Plaster',
      'RECEIPT',
      'Receipt RCT-0003',
      'Edwina Marl',
      'INV-0001',
      'Bank transfer TRF-88, received December 12, 2026',
      `Received ${usd('200.00')}`,
      // 250.00 − (100.00 − 30.00) = 180.00 due when the transfer came: 180.00 applied, 200.00 − 180.00 = 20.00 kept as credit
      `Applied to INV-0001 ${usd('180.00')}`,
      `Kept as credit for Edwina Marl ${usd('20.00')}`,
      `Still due on INV-0001 as of December 20, 2026 ${usd('0.00')}`,
    ]) {
      expect(text).toContain(words);
    }
  });

  it('prints a refund receipt: what was given back, how, from which payment, and why', async () => {
    const f = await receiptsJob('Refund Print Glaze');
    const res = await binary(f.agent, `/api/payments/refunds/${f.refundId}/receipt.pdf`);
    expect(res.status).toBe(200);
    const text = textOf(res.body);
    for (const words of [
      'REFUND RECEIPT',
      'Refund RCT-0002',
      'Given back on December 18, 2026 by cheque 2001, from payment RCT-0001 of December 4, 2026',
      `Given back ${usd('30.00')}`,
      `Payment RCT-0001 received ${usd('100.00')}`,
      'Reason: One wall left plain',
    ]) {
      expect(text).toContain(words);
    }
  });

  it('prints what is still due in the invoice’s currency on the receipt of a payment taken in another', async () => {
    const f = await issuedInvoice(t, 'Euro Receipt Plaster', '250.00');
    const paid = await f.payDirect({ method: 'card', amount: '90.00', currency: 'EUR', processorSessionId: 'cs_test_eur_receipt' });
    const text = textOf((await binary(f.agent, `/api/payments/${paid.paymentId}/receipt.pdf`)).body);
    const eur = (amount: string) => formatMoney(amount, 'EUR', 'en-US');
    // all 90.00 EUR kept as credit (another currency than the invoice's); the invoice still asks its own 250.00 USD
    expect(text).toContain(`Received ${eur('90.00')}`);
    expect(text).toContain(`Kept as credit for Edwina Marl ${eur('90.00')}`);
    expect(text).toContain(`Still due on INV-0001 as of December 20, 2026 ${usd('250.00')}`);
  });

  it('says nothing is still due on the receipts of an invoice whose payments were all given back', async () => {
    const f = await issuedInvoice(t, 'Full Refund Print Plaster', '100.00');
    const cheque = await f.payOffline('100.00', '1042', '2026-12-10');
    const res = await f.refund(cheque, {
      amount: '100.00',
      method: 'cheque',
      reference: '2001',
      refundedOn: '2026-12-18',
      reason: 'Job called off',
    });
    expect(await f.money(cheque)).toMatchObject({ status: 'refunded' });
    for (const url of [`/api/payments/refunds/${(res.body as RefundView).id}/receipt.pdf`, `/api/payments/${cheque}/receipt.pdf`]) {
      const text = textOf((await binary(f.agent, url)).body);
      expect(text).toContain('INV-0001');
      expect(text).not.toContain('Still due');
    }
  });

  it('lets a client read only their own receipts, and no one another firm’s', async () => {
    const f = await receiptsJob('Own Receipts Lime');
    const mine = await withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const clientId = (await tx.client.query<{ client_id: string }>(`select client_id from payments where id = $1`, [f.cheque])).rows[0]
        .client_id;
      return loadPaymentReceipt(tx, f.cheque, { kind: 'client', clientId }, t.ctx.now());
    });
    expect(mine.number).toBe('RCT-0001');
    const neighbour = await otherClientOf(t, f);
    void neighbour;
    const theirs = await withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const other = (await tx.client.query<{ id: string }>(`select id from clients where name = 'Nell Neighbour'`)).rows[0].id;
      return loadPaymentReceipt(tx, f.cheque, { kind: 'client', clientId: other }, t.ctx.now()).catch((e: { status: number }) => e.status);
    });
    expect(theirs).toBe(404);
    const other = await signUpFirm(t.app, 'Someone Else Paints');
    expect((await other.agent.get(`/api/payments/${f.cheque}/receipt.pdf`)).status).toBe(404);
    expect((await other.agent.get(`/api/payments/refunds/${f.refundId}/receipt.pdf`)).status).toBe(404);
  });

  it('gives the signed-in client their own receipt PDFs in the portal, and another client a 404', async () => {
    const f = await receiptsJob('Portal Receipts Plaster');
    const payment = await binary(f.client.agent, `/api/portal/payments/${f.cheque}/receipt.pdf`);
    expect(payment.status).toBe(200);
    expect(textOf(payment.body)).toContain('Receipt RCT-0001');
    const refund = await binary(f.client.agent, `/api/portal/refunds/${f.refundId}/receipt.pdf`);
    expect(refund.status).toBe(200);
    expect(textOf(refund.body)).toContain('Refund RCT-0002');
    const neighbour = await otherClientOf(t, f);
    expect((await neighbour.agent.get(`/api/portal/payments/${f.cheque}/receipt.pdf`)).status).toBe(404);
    expect((await neighbour.agent.get(`/api/portal/refunds/${f.refundId}/receipt.pdf`)).status).toBe(404);
    // staff sessions do not open the portal's copies, nor a client the office's
    expect((await f.client.agent.get(`/api/payments/${f.cheque}/receipt.pdf`)).status).toBe(401);
  });

  it('lists an invoice’s receipts for the portal in number order, refunds beside payments', async () => {
    const f = await receiptsJob('Listed Receipts Co');
    const list = await withTenant(t.ctx.pool, f.firmId, (tx) => listPortalReceipts(tx, f.invoiceId));
    expect(list.map((r) => [r.number, r.kind, r.method, r.amount, r.on])).toEqual([
      ['RCT-0001', 'payment', 'cheque', '100.00', '2026-12-04'],
      ['RCT-0002', 'refund', 'cheque', '30.00', '2026-12-18'],
      ['RCT-0003', 'payment', 'transfer', '200.00', '2026-12-12'],
    ]);
  });
});

describe('receipt e-mails', () => {
  it('e-mails a refund’s receipt from the firm to the client with the portal link, once', async () => {
    const f = await receiptsJob('Mailed Receipt Plaster');
    const [mail] = await outbox(f.firmId, `receipt:refund:${f.refundId}`);
    expect(mail.subject).toBe('Receipt RCT-0002 — Mailed Receipt Plaster');
    expect(mail.from_name).toBe('Mailed Receipt Plaster');
    expect(mail.to_address).toBe(f.clientEmail.toLowerCase());
    expect(mail.text).toContain(
      `gave back ${usd('30.00')} by cheque 2001 on December 18, 2026, from your payment RCT-0001 on invoice INV-0001`,
    );
    expect(mail.text).toContain(`http://localhost:4300/portal/invoices/${f.invoiceId}`);
    const arrived = await t.inbox.waitFor((m) => m.subject === 'Receipt RCT-0002 — Mailed Receipt Plaster');
    expect(arrived.text).toContain('Reason: One wall left plain');

    await withTenant(t.ctx.pool, f.firmId, (tx) => enqueueReceiptMail(tx, t.ctx, { kind: 'refund', id: f.refundId }));
    expect(await outbox(f.firmId, `receipt:refund:${f.refundId}`)).toHaveLength(1);
  });

  it('e-mails the receipt of a cheque the office records', async () => {
    const f = await receiptsJob('Office Cheque Lime');
    const [mail] = await outbox(f.firmId, `receipt:payment:${f.cheque}`);
    expect(mail.subject).toBe('Receipt RCT-0001 — Office Cheque Lime');
    // 250.00 − 100.00 = 150.00 due right after the cheque; the mail is written then
    expect(mail.text).toContain(`received ${usd('100.00')} from you by cheque 1042 on December 4, 2026 for invoice INV-0001`);
    expect(mail.text).toContain(`${usd('150.00')} is still due on invoice INV-0001.`);
  });

  it('e-mails a payment’s receipt with the credit kept and what is still due', async () => {
    const f = await receiptsJob('Payment Mail Glaze');
    await withTenant(t.ctx.pool, f.firmId, (tx) => enqueueReceiptMail(tx, t.ctx, { kind: 'payment', id: f.transfer }));
    const [mail] = await outbox(f.firmId, `receipt:payment:${f.transfer}`);
    expect(mail.subject).toBe('Receipt RCT-0003 — Payment Mail Glaze');
    expect(mail.text).toContain(`received ${usd('200.00')} from you by bank transfer TRF-88 on December 12, 2026 for invoice INV-0001`);
    expect(mail.text).toContain(`${usd('20.00')} of it was more than the invoice asked and is kept as credit on your account.`);
    expect(mail.text).toContain('Nothing is due on invoice INV-0001 now.');
  });

  it('does not ask for the invoice’s amount in the receipt of a refund that gave back all that was paid', async () => {
    const f = await issuedInvoice(t, 'Full Refund Mail Plaster', '100.00');
    const cheque = await f.payOffline('100.00', '1042', '2026-12-10');
    const res = await f.refund(cheque, {
      amount: '100.00',
      method: 'cheque',
      reference: '2001',
      refundedOn: '2026-12-18',
      reason: 'Job called off',
    });
    const [mail] = await outbox(f.firmId, `receipt:refund:${(res.body as RefundView).id}`);
    expect(mail.text).toContain(
      `gave back ${usd('100.00')} by cheque 2001 on December 18, 2026, from your payment RCT-0001 on invoice INV-0001`,
    );
    expect(mail.text).not.toContain('still due');
    expect(mail.text).not.toContain('Nothing is due');
  });

  it("words a receipt in the client's language (Spanish), with money and dates for it", async () => {
    const f = await receiptsJob('Recibo Cal y Arena');
    expect((await f.agent.patch(`/api/clients/${f.clientId}`).set('x-csrf-token', f.csrf()).send({ language: 'es' })).status).toBe(200);
    await withTenant(t.ctx.pool, f.firmId, (tx) => enqueueReceiptMail(tx, t.ctx, { kind: 'payment', id: f.transfer }));
    const [mail] = await outbox(f.firmId, `receipt:payment:${f.transfer}`);
    // Intl (ICU) for es-US: the reference formatting of money and dates for a Spanish reader in the US
    const amount = formatMoney('200.00', 'USD', 'es-US');
    const on = new Intl.DateTimeFormat('es-US', { dateStyle: 'long', timeZone: 'UTC' }).format(new Date('2026-12-12T00:00:00Z'));
    expect(mail.subject).toBe('Recibo RCT-0003 — Recibo Cal y Arena');
    expect(mail.text).toContain(`recibió ${amount} de usted por transferencia bancaria TRF-88 el ${on} por la factura INV-0001`);
    expect(mail.text).toContain('queda como saldo a favor en su cuenta');
  });
});
