import type { InvoiceDetail, JobBillingView } from '@layerbook/contracts';
import { acceptedJob } from './change-orders/change-order-fixtures';
import type { TestServer } from '../testing/harness';

/**
 * Test set-up for the billing-core specs (no spec of its own): an accepted job (deposit, stage
 * payment, final), with helpers to read its billing and to draft, issue, pay and void through the API.
 */
export async function billingJob(t: TestServer, firmName: string) {
  const f = await acceptedJob(t, firmName);
  const send = (method: 'post' | 'put' | 'patch' | 'delete', url: string, body: object = {}) =>
    f.agent[method](url).set('x-csrf-token', f.csrf()).send(body);
  const billing = async (jobId = f.jobId) => {
    const res = await f.agent.get(`/api/jobs/${jobId}/billing`);
    if (res.status !== 200) throw new Error(`billing not read: ${res.status} ${JSON.stringify(res.body)}`);
    return res.body as JobBillingView;
  };
  /** The live invoice of a schedule line: drafted here, or already by the queue (a met trigger). */
  const lineDraft = async (lineId: string, jobId = f.jobId): Promise<string> => {
    const made = await send('post', `/api/jobs/${jobId}/invoices`, { kind: 'line', scheduleLineId: lineId });
    if (made.status === 201) return (made.body as InvoiceDetail).id;
    const line = (await billing(jobId)).lines.find((l) => l.id === lineId);
    if (made.status === 409 && line?.invoiceId) return line.invoiceId;
    throw new Error(`line not drafted: ${made.status} ${JSON.stringify(made.body)}`);
  };
  const issue = async (invoiceId: string, body: object = { send: false }) => {
    const res = await send('post', `/api/invoices/${invoiceId}/issue`, body);
    if (res.status !== 200) throw new Error(`not issued: ${res.status} ${JSON.stringify(res.body)}`);
    return res.body as InvoiceDetail;
  };
  return { ...f, send, billing, lineDraft, issue };
}
