import type { BillingSettings, BillingTerms, InvoiceDocument } from '@layerbook/contracts';
import type { SqlQuery, TenantTx } from '@layerbook/db';
import { termsText } from '@layerbook/domain';
import { documentWords } from './invoice-words';

interface AddressColumns {
  address_line1: string;
  address_line2: string;
  city: string;
  region: string;
  postal_code: string;
}

const addressLines = (r: AddressColumns): string[] =>
  [r.address_line1, r.address_line2, [r.city, [r.region, r.postal_code].filter(Boolean).join(' ')].filter(Boolean).join(', ')].filter(
    (l) => l.trim() !== '',
  );

interface DocumentRow {
  firm: AddressColumns & { name: string; phone: string; tax_id: string; logo_file_id: string | null; language: string; country: string };
  client: { name: string; email: string };
  site: AddressColumns & { label: string };
  job_title: string;
}

/** What an invoice prints is read from (the firm, client, site and job), without its where-clause. */
const DOCUMENT_ROWS = `select json_build_object('name', f.name, 'phone', f.phone, 'tax_id', f.tax_id, 'logo_file_id', f.logo_file_id, 'language', f.language,
              'country', f.country, 'address_line1', f.address_line1, 'address_line2', f.address_line2, 'city', f.city, 'region', f.region,
              'postal_code', f.postal_code) as firm,
            json_build_object('name', c.name, 'email', c.email) as client,
            json_build_object('label', s.label, 'address_line1', s.address_line1, 'address_line2', s.address_line2, 'city', s.city,
              'region', s.region, 'postal_code', s.postal_code) as site,
            j.title as job_title
       from jobs j join firms f on f.id = j.tenant_id
       join clients c on c.tenant_id = j.tenant_id and c.id = j.client_id
       join sites s on s.tenant_id = j.tenant_id and s.id = j.site_id`;

/** The firm, client, site and job rows an invoice prints (documentFrom makes the document from its row). */
export const documentRead = (tenantId: string, jobId: string): SqlQuery => ({
  name: 'invoice_document_rows',
  text: `${DOCUMENT_ROWS} where j.tenant_id = $1 and j.id = $2`,
  values: [tenantId, jobId],
});

/** documentRead through the invoice ($2) whose job it is. */
export const documentReadOfInvoice = (tenantId: string, invoiceId: string): SqlQuery => ({
  name: 'invoice_document_rows_of_invoice',
  text: `${DOCUMENT_ROWS} where j.tenant_id = $1 and j.id = (select job_id from invoices where tenant_id = $1 and id = $2)`,
  values: [tenantId, invoiceId],
});

/**
 * What an invoice prints, from the firm, client, site and job rows as they are now: frozen into
 * the invoice at issue (a draft shows what it would print today). One query.
 */
export async function invoiceDocument(
  tx: TenantTx,
  jobId: string,
  terms: BillingTerms,
  settings: BillingSettings,
): Promise<InvoiceDocument> {
  const read = documentRead(tx.tenantId, jobId);
  const { rows } = await tx.client.query<Record<string, unknown>>(read.text, [...read.values]);
  return documentFrom(rows[0], terms, settings);
}

/** The document from documentRead's row. */
export function documentFrom(row: Record<string, unknown>, terms: BillingTerms, settings: BillingSettings): InvoiceDocument {
  const r = row as unknown as DocumentRow;
  return {
    firm: {
      name: r.firm.name,
      addressLines: addressLines(r.firm),
      phone: r.firm.phone,
      taxId: r.firm.tax_id,
      logoFileId: r.firm.logo_file_id,
    },
    client: { name: r.client.name, email: r.client.email, addressLines: [] },
    site: { label: r.site.label, addressLines: addressLines(r.site) },
    jobTitle: r.job_title,
    termsText: termsText(terms.terms),
    depositCapName: terms.depositCapName,
    ...documentWords(terms),
    footer: settings.invoiceFooter,
    locale: `${r.firm.language}-${r.firm.country}`,
  };
}
