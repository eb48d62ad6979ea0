import { expect, request, type APIRequestContext, type APIResponse } from '@playwright/test';
import type { BillingSettings, BillingSettingsView, InvoiceDetail, JobBillingView } from '@layerbook/contracts/types';
import { E2E } from './env';
import { pathFrom, waitForMail } from './inbox';
import { DEMO, DEMO_PASSWORD } from './people';

interface Listed {
  readonly id: string;
  readonly name: string;
}

/** A signed-in staff API client (session cookie + CSRF token), as the admin app talks to the server. */
async function staffApi(email: string = DEMO.office): Promise<{ api: APIRequestContext; headers: () => Promise<Record<string, string>> }> {
  const api = await request.newContext({ baseURL: E2E.baseUrl });
  const csrf = async () => ((await (await api.get('/api/auth/session')).json()) as { csrfToken: string }).csrfToken;
  const signedIn = await api.post('/api/auth/signin', {
    data: { email, password: DEMO_PASSWORD },
    headers: { 'x-csrf-token': await csrf() },
  });
  expect(signedIn.status()).toBe(200);
  return { api, headers: async () => ({ 'x-csrf-token': await csrf() }) };
}

async function ok<T>(answer: Promise<APIResponse>): Promise<T> {
  const res = await answer;
  if (!res.ok()) throw new Error(`${res.url()}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/**
 * The office's proposal for the demo client's stair hall (limewash on two surfaces, one option "A"
 * labelled "Limewash"), made and sent through the API. Answers the version's id.
 */
export async function sentProposal(title: string): Promise<string> {
  const { api, headers } = await staffApi();
  const clients = await ok<{ items: Listed[] }>(api.get('/api/clients', { params: { q: 'Hattie Brambleton' } }));
  const client = await ok<{ sites: Array<{ id: string }> }>(api.get(`/api/clients/${clients.items[0].id}`));
  const siteId = client.sites[0].id;
  const takeoff = await ok<{ rooms: Array<{ surfaces: Listed[] }> }>(api.get(`/api/takeoff/sites/${siteId}`));
  const surfaces = takeoff.rooms.flatMap((r) => r.surfaces).filter((s) => ['Hall walls', 'Barrel vault'].includes(s.name));
  const systems = await ok<{ items: Listed[] }>(api.get('/api/library/systems'));
  const system = systems.items.find((s) => s.name === 'Two-coat limewash')!;
  const today = new Date().toISOString().slice(0, 10);
  const inDays = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10);

  const estimate = await ok<{ id: string }>(
    api.post('/api/estimates', { data: { siteId, inquiryId: null, title, startDate: today }, headers: await headers() }),
  );
  await ok(
    api.put(`/api/estimates/${estimate.id}/inputs`, {
      headers: await headers(),
      data: {
        title,
        startDate: today,
        isOccupied: true,
        variants: [{ id: 'A', label: 'Limewash', surfaces: surfaces.map((s) => ({ surfaceId: s.id, finishSystemId: system.id })) }],
        addOns: [],
        equipment: [],
        subcontracts: [],
        sundries: [],
        discount: null,
        perAreaRates: {},
      },
    }),
  );
  const version = await ok<{ id: string }>(
    api.post('/api/proposals', { data: { estimateId: estimate.id, expiresOn: inDays(20) }, headers: await headers() }),
  );
  await ok(api.post(`/api/proposals/${version.id}/send`, { data: {}, headers: await headers() }));
  await api.dispose();
  return version.id;
}

/**
 * The journey's data, made through the API as the office and the client would: a proposal sent and
 * accepted in the portal, billing started, and the deposit the queue drafts issued and e-mailed to
 * the client. Answers the deposit.
 */
export async function issuedDeposit(title: string): Promise<{ readonly id: string; readonly number: string }> {
  const versionId = await sentProposal(title);

  // The client accepts through the portal's API, signed in by the proposal e-mail's link.
  const mail = await waitForMail(DEMO.client, /sent you a proposal/, { text: `/portal/proposals/${versionId}` });
  const portal = await request.newContext({ baseURL: E2E.baseUrl });
  const portalCsrf = async () => ((await (await portal.get('/api/portal/session')).json()) as { csrfToken: string }).csrfToken;
  const token = new URL(pathFrom(mail), E2E.baseUrl).searchParams.get('token');
  await ok(portal.post('/api/portal/auth/redeem', { data: { token }, headers: { 'x-csrf-token': await portalCsrf() } }));
  await ok(
    portal.post(`/api/portal/proposals/${versionId}/accept`, {
      data: { variantId: 'A', signedName: 'Hattie Brambleton', consent: true },
      headers: { 'x-csrf-token': await portalCsrf() },
    }),
  );
  await portal.dispose();

  // The office starts billing; the deposit's trigger (acceptance) is met, so the queue drafts it.
  const { api, headers } = await staffApi();
  const jobs = await ok<{ items: Array<{ id: string; title: string }> }>(api.get('/api/jobs'));
  const jobId = jobs.items.find((j) => j.title === title)!.id;
  await ok<JobBillingView>(api.post(`/api/jobs/${jobId}/billing/start`, { data: {}, headers: await headers() }));
  let draftId: string | undefined;
  await expect
    .poll(
      async () => {
        const billing = await ok<JobBillingView>(api.get(`/api/jobs/${jobId}/billing`));
        draftId = billing.invoices.find((i) => i.kind === 'deposit' && i.status === 'draft')?.id;
        return Boolean(draftId);
      },
      { timeout: 45_000, intervals: [250, 500, 1000] },
    )
    .toBe(true);
  const issued = await ok<InvoiceDetail>(api.post(`/api/invoices/${draftId}/issue`, { data: { send: true }, headers: await headers() }));
  await api.dispose();
  return { id: issued.id, number: issued.number! };
}

/** The demo firm's deposit at acceptance (set by the owner): drafted for the office, or issued and e-mailed at once. */
export async function setDepositAtAcceptance(value: BillingSettings['depositAtAcceptance']): Promise<void> {
  const { api, headers } = await staffApi(DEMO.owner);
  const { settings: current } = await ok<BillingSettingsView>(api.get('/api/firm/billing'));
  const settings: BillingSettings = {
    depositCap: current.depositCap,
    depositCapName: current.depositCapName,
    terms: current.terms,
    retainage: current.retainage,
    depositCredit: current.depositCredit,
    depositAtAcceptance: value,
    reminders: current.reminders,
    invoicePrefix: current.invoicePrefix,
    creditNotePrefix: current.creditNotePrefix,
    invoiceFooter: current.invoiceFooter,
  };
  await ok(api.put('/api/firm/billing', { data: settings, headers: await headers() }));
  await api.dispose();
}
