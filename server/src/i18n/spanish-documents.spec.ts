import type { ProposalSnapshot } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { formatMoney } from '@layerbook/domain';
import { insertInvoice, voidWithCreditNote } from '../billing/pdf/invoice-fixtures';
import { issuedInvoice } from '../payments/refund-fixtures';
import { binary, pdfTextOf as textOf } from '../testing/binary';
import { renderProposalPdf } from '../proposals/pdf/render-proposal';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, type TestServer, uniqueEmail } from '../testing/harness';
import { cautionIn } from './cautions';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-20T15:00:00Z'));
});
afterAll(() => t.stop());

// Intl.NumberFormat with the CLDR data Node ships: the reader's language with the firm's country.
const usdEs = (amount: string) => formatMoney(amount, 'USD', 'es-US');
const expectAll = (text: string, words: readonly string[]) => {
  for (const w of words) expect([w, text.includes(w)]).toEqual([w, true]);
};

/** An issued invoice (INV-0001, 250.00) whose client reads Spanish, paid 100.00 by cheque, with a voided INV and its credit note. */
async function spanishClientJob(name: string) {
  const f = await issuedInvoice(t, name, '250.00');
  const set = await f.agent.patch(`/api/clients/${f.clientId}`).set('x-csrf-token', f.csrf()).send({ language: 'es' });
  expect(set.status).toBe(200);
  const cheque = await f.payOffline('100.00', '1042', '2026-12-04');
  const voided = await insertInvoice(t, f.firmId, f.jobId, {
    kind: 'milestone',
    status: 'issued',
    number: 7,
    issuedOn: '2026-12-03',
    dueOn: '2026-12-17',
    total: '750.00',
    lines: [{ label: 'Stage payment', amount: '750.00' }],
  });
  const creditNote = await voidWithCreditNote(t, f.firmId, voided, 1, 'Facturado dos veces');
  return { ...f, cheque, creditNote };
}

describe('documents in the client’s language', () => {
  it('prints the invoice, credit note and receipt in Spanish with es-US numbers, dates and money, for the client and the office', async () => {
    const f = await spanishClientJob('Estuco Norte');
    const invoices = (await f.agent.get('/api/invoices')).body as { items: Array<{ id: string; number: string | null }> };
    const invoiceId = invoices.items.find((i) => i.number === 'INV-0001')!.id;

    const portal = textOf((await binary(f.client.agent, `/api/portal/invoices/${invoiceId}/pdf`)).body);
    const office = textOf((await binary(f.agent, `/api/invoices/${invoiceId}/pdf`)).body);
    for (const text of [portal, office]) {
      expectAll(text, [
        'FACTURA',
        'Número: INV-0001',
        'FACTURAR A',
        'TRABAJO EN',
        'Resumen',
        `Total de la factura ${usdEs('250.00')}`,
        `Pagado \u2212 ${usdEs('100.00')}`,
        `Importe a pagar ${usdEs('150.00')}`,
        'Regla del anticipo:',
        'página 1 de 1',
      ]);
      expect(text).not.toContain('Amount due');
      expect(text).not.toContain('BILL TO');
    }
    // Spanish long dates (CLDR es): "4 de diciembre de 2026".
    expect(portal).toMatch(/Fecha: \d{1,2} de [a-z]+ de 2026/);

    const note = textOf((await binary(f.client.agent, `/api/portal/credit-notes/${f.creditNote}/pdf`)).body);
    expectAll(note, [
      'NOTA DE CRÉDITO',
      'Número: CN-0001',
      'Factura: INV-0007',
      'Cancela por completo la factura INV-0007 (Pago por etapa) del 3 de diciembre de 2026',
      `Importe acreditado ${usdEs('750.00')}`,
      'Motivo: Facturado dos veces',
      'No debe nada por la factura INV-0007.',
    ]);

    const receipt = textOf((await binary(f.client.agent, `/api/portal/payments/${f.cheque}/receipt.pdf`)).body);
    expectAll(receipt, [
      'RECIBO',
      'Cheque 1042, recibido el 4 de diciembre de 2026, para la factura INV-0001 (Anticipo)',
      `Recibido ${usdEs('100.00')}`,
      'Gracias por su pago.',
    ]);
    expect(receipt).not.toContain('Thank you for your payment.');
    // Five PDFs drawn and read back by a child process each: more than the default 30 s on a loaded machine.
  }, 120_000);

  it('prints the proposal in Spanish — our words and every caution by its keys — and unchanged in English', async () => {
    const f = await spanishClientJob('Veladura Sur');
    const row = await withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const { rows } = await tx.client.query<{ snapshot: ProposalSnapshot; version: number; snapshot_hash: string }>(
        `select snapshot, version, snapshot_hash from proposal_versions where tenant_id = $1 order by created_at limit 1`,
        [tx.tenantId],
      );
      return rows[0];
    });
    const meta = { version: row.version, snapshotHash: row.snapshot_hash };
    const es = textOf(await renderProposalPdf(row.snapshot, { ...meta, language: 'es' }));
    // The letter-spaced headings (PROPUESTA, PREPARADA PARA) come out of text extraction one letter at a time.
    expectAll(es, ['Válida hasta:', 'Alcance del trabajo', 'Calendario y pagos', 'Notas de seguridad y cumplimiento']);
    expectAll(es, [`Versión ${row.version} · referencia ${row.snapshot_hash.slice(0, 12)}`, 'página 1 de']);
    // The standing line is always there, in Spanish; each caution the snapshot holds is printed with all its lines translated.
    expect(es).toContain('Siga los códigos locales, la hoja de datos de seguridad del producto');
    for (const c of row.snapshot.safety.cautions) {
      const words = cautionIn('es', c);
      expect(es).toContain(words.title);
      for (const b of words.bullets) expect(es).toContain(b.replace(/\s+/g, ' ').slice(0, 40));
    }
    const en = textOf(await renderProposalPdf(row.snapshot, meta));
    expectAll(en, ['Valid until:', 'Scope of work', 'Safety and compliance notes', row.snapshot.safety.standing.slice(0, 40)]);
  }, 120_000);
});

describe('e-mails in the reader’s language', () => {
  it('sends a client reading Spanish their sign-in link in Spanish', async () => {
    const owner = await signUpFirm(t.app, 'Cal y Arena');
    const email = uniqueEmail('lectora');
    const made = await owner.agent
      .post('/api/clients')
      .set('x-csrf-token', owner.csrf())
      .send({ kind: 'homeowner', name: 'Lucía Lectora', email, language: 'es' });
    await withTenant(t.ctx.pool, owner.firmId, (tx) =>
      tx.client.query(`insert into portal_users (tenant_id, client_id, email, name) values ($1, $2, $3, 'Lucía Lectora')`, [
        tx.tenantId,
        (made.body as { id: string }).id,
        email,
      ]),
    );
    const c = await newAgent(t.app, 'portal');
    await c.agent.post('/api/portal/auth/link').set('x-csrf-token', c.csrf()).send({ email });
    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email));
    expect(mail.subject).toBe('Su enlace para entrar con Cal y Arena');
    expect(mail.text).toContain('Hola, Lucía Lectora:');
    expect(mail.text).toContain('Funciona una sola vez, dentro de 20 minutos.');
    expect(mail.html).toContain('<html lang="es">');
    expect(mail.html).toContain('Si el botón no funciona, copie esta dirección en su navegador:');
    expect(linkIn(mail)).toContain('/portal/sign-in/link?token=');
  });

  it('sends a member reading Spanish their password reset in Spanish, and an invitation in the firm’s language', async () => {
    const owner = await signUpFirm(t.app, 'Llana Fina');
    await owner.agent.patch('/api/auth/me/language').set('x-csrf-token', owner.csrf()).send({ language: 'es' });
    const guest = await newAgent(t.app);
    await guest.agent.post('/api/auth/password-reset').set('x-csrf-token', guest.csrf()).send({ email: owner.email });
    const reset = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(owner.email) && /contraseña/.test(m.subject ?? ''));
    expect(reset.subject).toBe('Restablezca su contraseña de Layerbook');
    expect(reset.text).toContain('Hola, Olive Owner:');
    expect(reset.text).toContain('dentro de 30 minutos');

    await withTenant(t.ctx.pool, owner.firmId, (tx) => tx.client.query(`update firms set language = 'es' where id = $1`, [tx.tenantId]));
    const invitee = uniqueEmail('cuadrilla');
    await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email: invitee, role: 'crew' });
    const invitation = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(invitee));
    expect(invitation.subject).toBe('Olive Owner le invitó a Llana Fina en Layerbook');
    expect(invitation.text).toContain('Olive Owner le invitó a unirse a Llana Fina como parte de la cuadrilla.');
    expect(invitation.text).toContain('Aceptar la invitación');
  });
});
