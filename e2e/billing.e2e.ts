import { readFile } from 'node:fs/promises';
import { PDFParse } from 'pdf-parse';
import { expect, request, test, type APIRequestContext, type Locator, type Page } from '@playwright/test';
import { E2E } from './support/env';
import { pathFrom, waitForMail } from './support/inbox';
import { DEMO, DEMO_PASSWORD, signIn } from './support/people';
import { openLive } from './support/phone';

const TITLE = 'Stair hall limewash, billed as it goes';
const SYSTEM = 'Two-coat limewash';
const SURFACES = ['Hall walls', 'Barrel vault'];
/** The proposal's stage payment waits for the middle layer of three: the first limewash coat. */
const FIRST_LAYERS = ['Mineral bonding primer', 'Limewash, first coat'];

interface Listed {
  readonly id: string;
  readonly name: string;
}

/** A signed-in API client (session cookie + CSRF token), as the apps talk to the server. */
async function apiAs(email: string, password: string): Promise<{ api: APIRequestContext; csrf: () => Promise<string> }> {
  const api = await request.newContext({ baseURL: E2E.baseUrl });
  const csrf = async () => ((await (await api.get('/api/auth/session')).json()) as { csrfToken: string }).csrfToken;
  const signedIn = await api.post('/api/auth/signin', { data: { email, password }, headers: { 'x-csrf-token': await csrf() } });
  expect(signedIn.status()).toBe(200);
  return { api, csrf };
}

async function ok<T>(answer: Promise<import('@playwright/test').APIResponse>): Promise<T> {
  const res = await answer;
  if (!res.ok()) throw new Error(`${res.url()}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/**
 * The journey's data: the demo client signs a proposal for the stair hall (limewash on two surfaces),
 * made and sent by the office and accepted in the portal through the API, so the job is there and
 * its billing has not started. Answers the job's id.
 */
async function acceptedJob(): Promise<string> {
  const { api, csrf } = await apiAs(DEMO.office, DEMO_PASSWORD);
  const json = async () => ({ 'x-csrf-token': await csrf() });
  const clients = await ok<{ items: Listed[] }>(api.get('/api/clients', { params: { q: 'Hattie Brambleton' } }));
  const client = await ok<{ sites: Array<{ id: string }> }>(api.get(`/api/clients/${clients.items[0].id}`));
  const siteId = client.sites[0].id;
  const takeoff = await ok<{ rooms: Array<{ surfaces: Listed[] }> }>(api.get(`/api/takeoff/sites/${siteId}`));
  const surfaces = takeoff.rooms.flatMap((r) => r.surfaces).filter((s) => SURFACES.includes(s.name));
  const systems = await ok<{ items: Listed[] }>(api.get('/api/library/systems'));
  const system = systems.items.find((s) => s.name === SYSTEM)!;
  const today = new Date().toISOString().slice(0, 10);
  const inDays = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10);

  const estimate = await ok<{ id: string }>(
    api.post('/api/estimates', { data: { siteId, inquiryId: null, title: TITLE, startDate: today }, headers: await json() }),
  );
  await ok(
    api.put(`/api/estimates/${estimate.id}/inputs`, {
      headers: await json(),
      data: {
        title: TITLE,
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
    api.post('/api/proposals', { data: { estimateId: estimate.id, expiresOn: inDays(20) }, headers: await json() }),
  );
  await ok(api.post(`/api/proposals/${version.id}/send`, { data: {}, headers: await json() }));

  const mail = await waitForMail(DEMO.client, /sent you a proposal/, { text: `/portal/proposals/${version.id}` });
  const portal = await request.newContext({ baseURL: E2E.baseUrl });
  const portalCsrf = async () => ((await (await portal.get('/api/portal/session')).json()) as { csrfToken: string }).csrfToken;
  const token = new URL(pathFrom(mail), E2E.baseUrl).searchParams.get('token');
  await ok(portal.post('/api/portal/auth/redeem', { data: { token }, headers: { 'x-csrf-token': await portalCsrf() } }));
  await ok(
    portal.post(`/api/portal/proposals/${version.id}/accept`, {
      data: { variantId: 'A', signedName: 'Hattie Brambleton', consent: true },
      headers: { 'x-csrf-token': await portalCsrf() },
    }),
  );
  const jobs = await ok<{ items: Array<{ id: string; title: string }> }>(api.get('/api/jobs'));
  await portal.dispose();
  await api.dispose();
  return jobs.items.find((j) => j.title === TITLE)!.id;
}

let jobId: string;
test.beforeAll(async () => {
  jobId = await acceptedJob();
});

/** Opens the job page again until `ready` is visible: the queue drafts invoices a moment after the write that met their trigger. */
async function reloadUntil(page: Page, path: string, ready: () => Locator): Promise<void> {
  await expect(async () => {
    await openLive(page, path);
    await expect(ready()).toBeVisible({ timeout: 3_000 });
  }).toPass({ timeout: 45_000 });
}

/** Issues the draft invoice open on the page through the dialog; answers its new number. */
async function issueOpenDraft(page: Page): Promise<string> {
  await expect(page.getByRole('heading', { level: 1, name: 'Draft — not sent' })).toBeVisible();
  await page.getByRole('button', { name: 'Issue…' }).click();
  const dialog = page.getByRole('dialog', { name: 'Issue this invoice?' });
  await expect(dialog.getByLabel('Invoice date')).not.toHaveValue('');
  await dialog.getByRole('button', { name: 'Issue the invoice' }).click();
  const heading = page.getByRole('heading', { level: 1, name: /^INV-\d+$/ });
  await expect(heading).toBeVisible();
  return (await heading.textContent())!.trim();
}

// Journey (jobs → billing → portal): deposit billed at the start, the first layers marked done, the
// queue-drafted stage payment reviewed and issued; the client finds both invoices and downloads one.
test('the office bills the deposit, marks the first layers done and issues the drafted stage payment; the client downloads it', async ({
  page,
  browser,
}) => {
  const jobPath = `/jobs/${jobId}`;
  await signIn(page, DEMO.office);
  // The demo firm's own billing (server/src/seed/demo-billing.ts): Today's money and the invoice list.
  const money = page.getByRole('region', { name: 'Money' });
  await expect(money).toContainText('INV-0002');
  await money.screenshot({ path: 'e2e/.artifacts/billing-today.png' });
  // Loaded afresh (server-rendered, its panels woken by a tap), one tap on a money link goes there.
  await openLive(page, '/today');
  await money.getByRole('link', { name: 'All overdue invoices' }).click();
  await expect(page).toHaveURL(/\/billing\?filter=overdue$/);
  await openLive(page, '/billing');
  const list = page.getByRole('region', { name: 'Invoices' });
  await expect(list.getByRole('link', { name: 'INV-0001' })).toBeVisible();
  await list.screenshot({ path: 'e2e/.artifacts/billing-list.png' });
  await openLive(page, jobPath);
  await expect(page.getByRole('heading', { level: 1, name: TITLE })).toBeVisible();

  // Start billing: the schedule made at acceptance is confirmed; the deposit's trigger (acceptance) is met at once.
  await page.getByRole('button', { name: 'Start billing' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Start billing' }).click();
  const invoices = () => page.getByRole('table', { name: 'Invoices' });
  const depositRow = () => invoices().getByRole('row').filter({ hasText: 'Deposit' });
  await reloadUntil(page, jobPath, () => depositRow().getByText('Drafted when its trigger was met'));
  await page.screenshot({ path: 'e2e/.artifacts/billing-job-started.png', fullPage: true });
  await depositRow().getByRole('link', { name: 'Draft' }).click();
  const depositNumber = await issueOpenDraft(page);

  // The crew's work, marked by the office: the first two layers on both surfaces of the stair hall.
  await openLive(page, jobPath);
  for (const surface of SURFACES) {
    for (const layer of FIRST_LAYERS) {
      const item = page
        .getByRole('group', { name: `Stair hall · ${surface}` })
        .getByRole('listitem')
        .filter({ hasText: layer });
      await item.getByRole('button', { name: /^Mark done/ }).click();
      await expect(item.getByRole('button', { name: /^Reopen/ })).toBeVisible();
    }
  }
  // The stage payment waits for the first limewash coat on every surface: now met, the queue drafts it.
  const review = () => page.getByRole('link', { name: 'Review its draft invoice' });
  await reloadUntil(page, jobPath, review);
  await expect(page.getByText('Ready to bill').first()).toBeVisible();
  // The page scrolls inside its frame, so each section is photographed on its own.
  await page.getByRole('form', { name: 'Payment schedule' }).screenshot({ path: 'e2e/.artifacts/billing-ready-to-bill.png' });
  await page.getByRole('form', { name: 'Work done' }).screenshot({ path: 'e2e/.artifacts/billing-work-done.png' });
  await invoices().screenshot({ path: 'e2e/.artifacts/billing-job-invoices.png' });
  await review().click();
  await expect(page.getByText(/Limewash, first coat finished on both surfaces it covers/)).toBeVisible();
  await expect(page.getByRole('table', { name: 'What it bills' })).toContainText('Limewash, first coat');
  await page.screenshot({ path: 'e2e/.artifacts/billing-draft-review.png', fullPage: true });
  const stageNumber = await issueOpenDraft(page);
  await page.screenshot({ path: 'e2e/.artifacts/billing-issued.png', fullPage: true });

  // The client signs in to the portal by an e-mailed link and finds both invoices.
  const client = await browser.newContext({ acceptDownloads: true });
  const portal = await client.newPage();
  await portal.goto('/portal/sign-in');
  await portal.getByLabel('E-mail').fill(DEMO.client);
  await portal.getByRole('button', { name: 'E-mail me a sign-in link' }).click();
  await expect(portal.getByRole('status')).toContainText('Check your inbox');
  await portal.goto(pathFrom(await waitForMail(DEMO.client, /sign-in link/i)));
  await expect(portal.getByRole('heading', { name: 'Your projects' })).toBeVisible();
  await portal.getByRole('link', { name: 'Your invoices' }).click();
  await expect(portal.getByRole('heading', { level: 1, name: 'Your invoices' })).toBeVisible();
  const yours = portal.getByRole('region', { name: 'Your invoices' });
  for (const number of [depositNumber, stageNumber]) {
    await expect(yours.getByRole('row').filter({ has: portal.getByRole('link', { name: number, exact: true }) })).toContainText(TITLE);
  }
  await portal.screenshot({ path: 'e2e/.artifacts/billing-portal-invoices.png', fullPage: true });

  await yours.getByRole('link', { name: stageNumber, exact: true }).click();
  await expect(portal.getByRole('heading', { level: 1, name: `Invoice ${stageNumber}` })).toBeVisible();
  await expect(portal.getByRole('heading', { level: 2, name: 'Pay online' })).toBeVisible();
  await expect(portal.getByRole('button', { name: /^Pay .+ by card$/ })).toBeVisible();
  await portal.screenshot({ path: 'e2e/.artifacts/billing-portal-invoice.png', fullPage: true });
  const downloading = portal.waitForEvent('download');
  await portal.getByRole('link', { name: 'Download the PDF' }).click();
  const download = await downloading;
  const pdf = await readFile(await download.path());
  await download.saveAs('e2e/.artifacts/billing-invoice.pdf');
  expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  const parser = new PDFParse({ data: pdf });
  const { text } = await parser.getText();
  await parser.destroy();
  expect(text).toContain(`Number: ${stageNumber}`);
  expect(text).toContain(TITLE);
  await client.close();
});
