/** The signed-in client's invoices, for the pages' httpResource reads and the PDF links. */
export const INVOICES_URL = '/api/portal/invoices';
export const invoiceUrl = (id: string) => `${INVOICES_URL}/${encodeURIComponent(id)}`;
export const invoicePdfUrl = (id: string) => `${invoiceUrl(id)}/pdf`;
export const creditNotePdfUrl = (id: string) => `/api/portal/credit-notes/${encodeURIComponent(id)}/pdf`;
export const statementUrl = (jobId: string) => `/api/portal/jobs/${encodeURIComponent(jobId)}/statement`;
