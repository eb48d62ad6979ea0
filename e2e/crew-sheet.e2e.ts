import {
  expect,
  request,
  test,
  type APIRequestContext,
  type APIResponse,
  type Browser,
  type BrowserContext,
  type Page,
} from '@playwright/test';
import type { JobHistory } from '@layerbook/contracts/types';
import { E2E } from './support/env';
import { pathFrom, waitForMail } from './support/inbox';
import { DEMO, DEMO_PASSWORD, signIn } from './support/people';
import { PHONE, openLive } from './support/phone';

// Journey (jobs → the crew's sheet, on a phone, in Spanish): a crew member who reads Layerbook in
// Spanish opens the job sheet, scales a mix to the batch she is making, loses the signal, marks a
// layer done, gets the signal back, and the office sees that layer done once.

const SHOTS = '/tmp/lb/shots';
/** The demo's Spanish-reading crew member (server/src/seed/demo.ts). */
const LUCIA = 'lucia@fernhollow.example';
const TITLE = 'Round sitting room limewash, crew sheet';
const SYSTEM = 'Two-coat limewash';
const ROOM = 'Round sitting room';
const SURFACE = 'Round walls';
const LAYER = 'Mineral bonding primer';
const MIXED = 'Limewash, first coat';

interface Listed {
  readonly id: string;
  readonly name: string;
}

async function ok<T>(answer: Promise<APIResponse>): Promise<T> {
  const res = await answer;
  if (!res.ok()) throw new Error(`${res.url()}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/** A signed-in staff API client (session cookie + CSRF token), as the admin app talks to the server. */
async function staffApi(email: string): Promise<{ api: APIRequestContext; headers: () => Promise<Record<string, string>> }> {
  const api = await request.newContext({ baseURL: E2E.baseUrl });
  const csrf = async () => ((await (await api.get('/api/auth/session')).json()) as { csrfToken: string }).csrfToken;
  const signedIn = await api.post('/api/auth/signin', {
    data: { email, password: DEMO_PASSWORD },
    headers: { 'x-csrf-token': await csrf() },
  });
  expect(signedIn.status()).toBe(200);
  return { api, headers: async () => ({ 'x-csrf-token': await csrf() }) };
}

/**
 * The journey's own job: the office prices limewash on the round sitting room's walls for the demo
 * client, sends the proposal, and the client accepts it in the portal (all through the API), so the
 * crew's list has a scheduled job with no layer done. Answers the job's id.
 */
async function acceptedJob(): Promise<string> {
  const { api, headers } = await staffApi(DEMO.office);
  const clients = await ok<{ items: Listed[] }>(api.get('/api/clients', { params: { q: 'Hattie Brambleton' } }));
  const client = await ok<{ sites: Array<{ id: string }> }>(api.get(`/api/clients/${clients.items[0].id}`));
  const siteId = client.sites[0].id;
  const takeoff = await ok<{ rooms: Array<{ surfaces: Listed[] }> }>(api.get(`/api/takeoff/sites/${siteId}`));
  const surface = takeoff.rooms.flatMap((r) => r.surfaces).find((s) => s.name === SURFACE)!;
  const systems = await ok<{ items: Listed[] }>(api.get('/api/library/systems'));
  const system = systems.items.find((s) => s.name === SYSTEM)!;
  const today = new Date().toISOString().slice(0, 10);
  const inDays = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10);
  const estimate = await ok<{ id: string }>(
    api.post('/api/estimates', { data: { siteId, inquiryId: null, title: TITLE, startDate: today }, headers: await headers() }),
  );
  await ok(
    api.put(`/api/estimates/${estimate.id}/inputs`, {
      headers: await headers(),
      data: {
        title: TITLE,
        startDate: today,
        isOccupied: true,
        variants: [{ id: 'A', label: 'Limewash', surfaces: [{ surfaceId: surface.id, finishSystemId: system.id }] }],
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
  const mail = await waitForMail(DEMO.client, /./, { text: `/portal/proposals/${version.id}` });
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

/** The sheet's button for one layer on the journey's surface, by its accessible name (words from i18n/sheet/es.json). */
const layerButton = (page: Page, verb: 'Marcar terminada' | 'Reabrir') =>
  page.getByRole('button', { name: `${verb}: ${LAYER}, ${ROOM} · ${SURFACE}` });

/** Lucía's phone: a phone-sized context signed in as her, on her job sheet (opened from the menu as she would). */
async function openSheetOnPhone(page: Page, browser: Browser): Promise<{ phone: Page; context: BrowserContext }> {
  await signIn(page, LUCIA);
  const context = await browser.newContext({ viewport: PHONE, storageState: await page.context().storageState() });
  const phone = await context.newPage();
  // Her language comes from her own setting: the server renders Spanish, the browser keeps it.
  await openLive(phone, '/today');
  await expect(phone.locator('html')).toHaveAttribute('lang', 'es');
  await phone.getByRole('button', { name: 'Abrir el menú' }).click();
  await phone.getByRole('navigation', { name: 'Principal' }).getByRole('link', { name: 'Hojas de obra', exact: true }).click();
  await expect(phone.getByRole('heading', { level: 1, name: 'Hojas de obra' })).toBeVisible();
  await phone.getByRole('link', { name: new RegExp(TITLE) }).click();
  await expect(phone.getByRole('heading', { level: 1, name: TITLE })).toBeVisible();
  return { phone, context };
}

test('a Spanish-reading crew member scales a mix, marks a layer done without a signal, and the office sees it done once', async ({
  page,
  browser,
}) => {
  test.setTimeout(180_000);
  const { phone, context } = await openSheetOnPhone(page, browser);
  for (const part of ['Seguridad', 'Superficies', 'Acabados y mezclas', 'Plan del día']) {
    await expect(phone.getByRole('heading', { level: 2, name: part })).toBeVisible();
  }
  await phone.screenshot({ path: `${SHOTS}/crew-sheet-es.png`, fullPage: true });

  // Mix card: one gallon of the first limewash coat, thinned 30 % of the final mix. NIST Handbook 44,
  // Appendix C: 1 US gallon = 231 in³ = 3.785 411 784 L, so water 0.3 gal = 1.14 L, limewash 0.7 gal = 2.65 L.
  const card = phone.getByRole('group', { name: `Tarjeta de mezcla: ${MIXED}` });
  await card.getByLabel('Cantidad a mezclar').fill('1');
  await card.getByLabel('Unidad').selectOption({ label: 'galones' });
  await expect(card.getByRole('row', { name: /Agua/ })).toContainText(/1[.,]14 L/);
  await expect(card.getByRole('row', { name: /Limewash concentrate/ })).toContainText(/2[.,]65 L/);
  await card.screenshot({ path: `${SHOTS}/crew-sheet-mix-card-es.png` });

  // No signal: the mark is kept on the phone and the sheet says so.
  await context.setOffline(true);
  await expect(phone.getByRole('status').filter({ hasText: 'Sin conexión' })).toBeVisible();
  await layerButton(phone, 'Marcar terminada').click();
  const kept = phone.getByRole('status').filter({ hasText: 'Guardado en este teléfono — se enviará cuando haya conexión' });
  await expect(kept).toBeVisible();
  await phone.screenshot({ path: `${SHOTS}/crew-sheet-offline-es.png`, fullPage: true });

  // Signal back: the mark goes by itself, once.
  await context.setOffline(false);
  await expect(kept).toBeHidden({ timeout: 30_000 });
  await expect(layerButton(phone, 'Reabrir')).toBeVisible();
  await phone.reload();
  await expect(layerButton(phone, 'Reabrir')).toBeVisible();
  await phone.screenshot({ path: `${SHOTS}/crew-sheet-back-online-es.png`, fullPage: true });
  await context.close();

  // The office sees the layer done, recorded once (the mark's clientKey makes a resend count once).
  const { api } = await staffApi(DEMO.office);
  const history = await ok<JobHistory>(api.get(`/api/jobs/${jobId}/history`));
  const marks = history.items.filter((e) => e.text.startsWith(`${LAYER} done on ${ROOM} · ${SURFACE}`));
  expect(marks).toHaveLength(1);
  expect(marks[0]?.who).toBe('Lucía Ferrand');
  await api.dispose();
  const officeContext = await browser.newContext();
  const office = await officeContext.newPage();
  await signIn(office, DEMO.office);
  await openLive(office, `/jobs/${jobId}`);
  const entries = office
    .getByRole('list', { name: 'History' })
    .getByRole('listitem')
    .filter({ hasText: `${LAYER} done on ${ROOM} · ${SURFACE}` });
  await expect(entries).toHaveCount(1);
  await entries.first().scrollIntoViewIfNeeded();
  await office.screenshot({ path: `${SHOTS}/crew-sheet-office-history.png`, fullPage: true });
  await officeContext.close();
});

test('the job sheet, once opened, opens again on the phone without a signal', async ({ page, browser }) => {
  test.setTimeout(120_000);
  const { phone, context } = await openSheetOnPhone(page, browser);
  // The service worker takes the page on its next load; that load also keeps the sheet's answer for later.
  await phone.evaluate(() => navigator.serviceWorker.ready.then(() => true));
  await phone.reload();
  await expect(phone.getByRole('heading', { level: 1, name: TITLE })).toBeVisible();
  await context.setOffline(true);
  await phone.reload();
  await expect(phone.getByRole('heading', { level: 1, name: TITLE })).toBeVisible();
  await expect(phone.getByRole('status').filter({ hasText: 'Sin conexión' })).toBeVisible();
  await expect(phone.getByRole('group', { name: `Tarjeta de mezcla: ${MIXED}` })).toBeVisible();
  await phone.screenshot({ path: `${SHOTS}/crew-sheet-reopened-offline-es.png`, fullPage: true });
  await context.close();
});

test('the crew member reads the finish library and the sample boards in Spanish', async ({ page, browser }) => {
  await signIn(page, LUCIA);
  const context = await browser.newContext({ viewport: PHONE, storageState: await page.context().storageState() });
  const phone = await context.newPage();
  await openLive(phone, '/library');
  await expect(phone.getByRole('heading', { level: 1, name: 'Biblioteca de acabados' })).toBeVisible();
  const systems = phone.getByRole('table', { name: 'Sistemas de acabado' });
  await expect(systems.getByRole('columnheader', { name: 'Espera total' })).toBeVisible();
  await phone.screenshot({ path: `${SHOTS}/crew-library-es.png`, fullPage: true });
  await systems.getByRole('link', { name: SYSTEM }).click();
  await expect(phone.getByRole('heading', { level: 1, name: SYSTEM })).toBeVisible();
  await expect(phone.getByText('Puede leer este sistema de acabado; el dueño o la oficina lo cambian.')).toBeVisible();
  await expect(phone.getByRole('heading', { level: 2, name: `Capa 2: ${MIXED}` })).toBeVisible();
  await phone.screenshot({ path: `${SHOTS}/crew-library-system-es.png`, fullPage: true });
  await openLive(phone, '/library/products');
  await expect(phone.getByRole('table', { name: 'Productos' }).getByRole('cell', { name: 'Cal (pasta, lechada)' }).first()).toBeVisible();
  await phone.screenshot({ path: `${SHOTS}/crew-library-products-es.png`, fullPage: true });
  await openLive(phone, '/samples');
  await expect(phone.getByRole('heading', { level: 1, name: 'Tableros de muestra' })).toBeVisible();
  await phone.screenshot({ path: `${SHOTS}/crew-samples-es.png`, fullPage: true });
  await context.close();
});
