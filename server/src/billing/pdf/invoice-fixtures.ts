import type { BillingTerms, FirmSettings, InvoiceKind, InvoiceLine, InvoiceStatus, ProgressTable } from '@layerbook/contracts';
import { withTenant, type TenantTx } from '@layerbook/db';
import { DEFAULT_BILLING_SETTINGS } from '@layerbook/contracts';
import { pngImage } from '../../files/test-images';
import { sentProposal } from '../../proposals/portal-fixtures';
import type { TestServer } from '../../testing/harness';
import { invoiceDocument } from '../document';

/**
 * Test set-up for the billing document specs (no spec of its own): an accepted job (the portal
 * fixture's dining room, option A) for a firm with a tax number and a logo, the client signed in
 * to the portal, and invoices written straight into the tables as issuing would leave them.
 */
export async function acceptedJob(t: TestServer, firmName: string) {
  const p = await sentProposal(t, firmName);
  const accepted = await p.client.agent
    .post(`/api/portal/proposals/${p.version.id}/accept`)
    .set('x-csrf-token', p.client.csrf())
    .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });
  if (accepted.status !== 200) throw new Error(`not accepted: ${accepted.status} ${JSON.stringify(accepted.body)}`);
  const firm = (await p.agent.get('/api/firm')).body as FirmSettings;
  const { id: _id, slug: _slug, updatedAt: _u, logoUrl: _logo, ...profile } = firm;
  await p.agent
    .patch('/api/firm')
    .set('x-csrf-token', p.csrf())
    .send({ ...profile, taxId: 'EIN 98-7654321' });
  await p.agent
    .post('/api/firm/logo')
    .set('x-csrf-token', p.csrf())
    .attach('file', await pngImage(240, 90), { filename: 'logo.png' });
  const jobId = ((await p.agent.get('/api/jobs')).body as { items: Array<{ id: string }> }).items[0].id;
  return { ...p, jobId };
}

export const TERMS: BillingTerms = {
  depositCapName: 'California home improvement contracts: the lesser of $1,000 or 10 %',
  depositCap: '1000.00',
  terms: { kind: 'net', days: 14 },
  retainage: { workPercent: 10, storedPercent: 5, stopAtPercentComplete: null },
  depositCredit: 'prorata',
};

export interface InvoiceSpec {
  readonly kind: InvoiceKind;
  readonly status: InvoiceStatus;
  readonly number?: number;
  readonly issuedOn?: string;
  readonly dueOn?: string;
  readonly total: string;
  /** before the deposit credit (the total when there is none) */
  readonly subtotal?: string;
  readonly taxIncluded?: string;
  readonly depositCredit?: string;
  readonly amountPaid?: string;
  readonly amountCredited?: string;
  readonly lines?: readonly InvoiceLine[];
  readonly progress?: ProgressTable;
  readonly periodEnd?: string;
  readonly clientId?: string;
}

/** An invoice row as issuing (or drafting) leaves it; issued ones carry their frozen document. */
export async function insertInvoice(t: TestServer, firmId: string, jobId: string, spec: InvoiceSpec): Promise<string> {
  return withTenant(t.ctx.pool, firmId, async (tx) => {
    const job = (
      await tx.client.query<{ client_id: string; currency: string }>(
        `select client_id, currency from jobs where tenant_id = $1 and id = $2`,
        [tx.tenantId, jobId],
      )
    ).rows[0];
    const isDraft = spec.status === 'draft';
    const document = isDraft
      ? null
      : await invoiceDocument(tx, jobId, TERMS, { ...DEFAULT_BILLING_SETTINGS, invoiceFooter: 'Thank you: cheques to Kiln Lane.' });
    const subtotal = spec.subtotal ?? spec.total;
    const { rows } = await tx.client.query<{ id: string }>(
      `insert into invoices (tenant_id, job_id, client_id, kind, status, number, number_text, issued_on, due_on, period_end, currency,
         subtotal, deposit_credit, tax_included, total, amount_paid, amount_credited, lines, progress, document, origin)
       values ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12, $13, $14, $15, $16, $17, $18, $19, $20, 'office') returning id`,
      [
        tx.tenantId,
        jobId,
        spec.clientId ?? job.client_id,
        spec.kind,
        spec.status,
        spec.number ?? null,
        spec.number ? `INV-${String(spec.number).padStart(4, '0')}` : null,
        isDraft ? null : (spec.issuedOn ?? '2026-12-01'),
        isDraft ? null : (spec.dueOn ?? '2026-12-15'),
        spec.periodEnd ?? null,
        job.currency,
        subtotal,
        spec.depositCredit ?? '0',
        spec.taxIncluded ?? '0',
        spec.total,
        spec.amountPaid ?? '0',
        spec.amountCredited ?? '0',
        JSON.stringify(spec.lines ?? []),
        spec.progress ? JSON.stringify(spec.progress) : null,
        document ? JSON.stringify(document) : null,
      ],
    );
    return rows[0].id;
  });
}

/** Voids an issued invoice as voiding would: its credit note (CN-<n>) and the invoice marked void. */
export async function voidWithCreditNote(
  t: TestServer,
  firmId: string,
  invoiceId: string,
  number: number,
  reason: string,
): Promise<string> {
  return withTenant(t.ctx.pool, firmId, async (tx: TenantTx) => {
    const inv = (
      await tx.client.query<{ total: string; currency: string; document: unknown }>(
        `update invoices set status = 'void', amount_credited = total, void_reason = $3 where tenant_id = $1 and id = $2
         returning total::text, currency, document`,
        [tx.tenantId, invoiceId, reason],
      )
    ).rows[0];
    const { rows } = await tx.client.query<{ id: string }>(
      `insert into credit_notes (tenant_id, invoice_id, number, number_text, issued_on, currency, amount, reason, document)
       values ($1, $2, $3, $4, '2026-12-03', $5, $6, $7, $8) returning id`,
      [
        tx.tenantId,
        invoiceId,
        number,
        `CN-${String(number).padStart(4, '0')}`,
        inv.currency,
        inv.total,
        reason,
        JSON.stringify(inv.document),
      ],
    );
    return rows[0].id;
  });
}

/** A payment received against an invoice (the invoice's amount_paid is set by the caller's spec). */
export async function insertPayment(
  t: TestServer,
  firmId: string,
  invoiceId: string,
  p: { method: 'cheque' | 'transfer' | 'cash'; amount: string; receivedOn: string; reference: string },
): Promise<void> {
  await withTenant(t.ctx.pool, firmId, (tx) =>
    tx.client.query(
      `insert into payments (tenant_id, invoice_id, client_id, method, amount, amount_applied, currency, received_on, reference)
       select i.tenant_id, i.id, i.client_id, $3, $4, $4, i.currency, $5, $6 from invoices i where i.tenant_id = $1 and i.id = $2`,
      [tx.tenantId, invoiceId, p.method, p.amount, p.receivedOn, p.reference],
    ),
  );
}

/** The progress worked example's shape: two value lines billed to the period's end with 10 % retainage. */
export const PROGRESS: ProgressTable = {
  periodEnd: '2026-12-20',
  retainageRates: { workPercent: 10, storedPercent: 5, stopAtPercentComplete: null },
  lines: [
    {
      valueLineId: 'a0000000-0000-4000-8000-000000000001',
      label: 'Walls: lime base coats',
      scheduledValue: '6000.00',
      previousWork: '1500.00',
      thisPeriodWork: '2700.00',
      storedMaterials: '400.00',
      completedToDate: '4600.00',
      percentComplete: '76.67',
      balanceToFinish: '1400.00',
      retainage: '440.00',
    },
    {
      valueLineId: 'a0000000-0000-4000-8000-000000000002',
      label: 'Walls: polished finish',
      scheduledValue: '4000.00',
      previousWork: '0.00',
      thisPeriodWork: '0.00',
      storedMaterials: '0.00',
      completedToDate: '0.00',
      percentComplete: '0',
      balanceToFinish: '4000.00',
      retainage: '0.00',
    },
  ],
  summary: {
    originalContractSum: '9500.00',
    changeOrders: '500.00',
    contractSumToDate: '10000.00',
    completedToDate: '4600.00',
    retainage: '440.00',
    earnedLessRetainage: '4160.00',
    previouslyBilled: '1350.00',
    dueThisPeriod: '2810.00',
    balanceToFinishWithRetainage: '5840.00',
  },
};
