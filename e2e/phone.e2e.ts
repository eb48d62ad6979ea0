import { expect, type Page, test } from '@playwright/test';
import { pathFrom, waitForMail } from './support/inbox';
import { DEMO, navLink, signIn } from './support/people';
import { PHONE, onPhone, openLive, openLiveOnPhone } from './support/phone';
import { pageProblems } from './support/phone-checks';

// Phone-sized journeys (390 × 844). Each page goes through axe-core's WCAG 2.1 A and AA rules and
// our own layout checks (support/phone-checks.ts): nothing running off the right edge outside a
// region that scrolls on its own, no label on the field above, no list marker beside a number.

const SHOTS = 'e2e/.artifacts/phone';
const CREW = 'crew@fernhollow.example';

/** Screenshot and check one page; problems are collected so one run reports every page. */
async function look(page: Page, name: string, found: Record<string, string[]>): Promise<void> {
  await page.screenshot({ path: `${SHOTS}/${name}.png`, fullPage: true });
  const problems = await pageProblems(page);
  if (problems.length > 0) found[name] = problems;
}

/** Paths of detail pages linked from the page, one per kind (ids replaced), so the walk stays short. */
async function detailLinks(page: Page): Promise<Map<string, string>> {
  const hrefs = await page.locator('main a[href^="/"]').evaluateAll((links) => links.map((a) => a.getAttribute('href') ?? ''));
  const out = new Map<string, string>();
  for (const href of hrefs) {
    const path = href.split(/[?#]/)[0];
    if (!/[0-9a-f]{8}-[0-9a-f]{4}-/.test(path) || path.startsWith('/api/') || path.startsWith('/portal/')) continue;
    const kind = path.replace(/[0-9a-f]{8}-[0-9a-f-]{27}/g, ':id');
    if (!out.has(kind)) out.set(kind, path);
  }
  return out;
}

async function finishWholeRoom(page: Page, room: string, system: string) {
  await page.getByRole('tabpanel').getByRole('group', { name: room }).getByLabel('Same finish for the whole room').click();
  await page.getByRole('option', { name: system }).click();
}

test('the owner opens every admin page on a phone: the navigation folds away and nothing runs off the screen', async ({
  page,
  browser,
}) => {
  test.setTimeout(240_000);
  await signIn(page, DEMO.owner);
  const { phone, context } = await onPhone(browser, page);
  const found: Record<string, string[]> = {};
  const lists = [
    '/today',
    '/inquiries',
    '/clients',
    '/estimates',
    '/jobs',
    '/billing',
    '/cash',
    '/samples',
    '/library',
    '/team',
    '/settings',
  ];
  const details = new Map<string, string>();
  for (const path of lists) {
    await openLiveOnPhone(phone, path);
    await phone.waitForLoadState('networkidle');
    await look(phone, path.slice(1), found);
    for (const [kind, href] of await detailLinks(phone)) if (!details.has(kind)) details.set(kind, href);
  }
  // One level further (a client's site takeoff, an estimate's proposals), each kind once.
  for (const [, href] of [...details]) {
    await openLiveOnPhone(phone, href);
    await phone.waitForLoadState('networkidle');
    for (const [kind, deeper] of await detailLinks(phone)) if (!details.has(kind)) details.set(kind, deeper);
  }
  for (const [kind, href] of details) {
    await openLiveOnPhone(phone, href);
    await phone.waitForLoadState('networkidle');
    await look(phone, kind.slice(1).replace(/[/:]+/g, '-'), found);
  }
  // The menu button opens the navigation over the page.
  await openLiveOnPhone(phone, '/today');
  await phone.getByRole('button', { name: 'Open navigation' }).click();
  await expect(navLink(phone, 'Clients')).toBeVisible();
  await look(phone, 'navigation-open', found);
  await context.close();
  expect(found).toEqual({});
});

test('before the app takes over, a phone sees the menu button and no side navigation', async ({ page, browser }) => {
  await signIn(page, DEMO.office);
  // Without scripts the page stays as the server rendered it, not knowing the screen's width.
  const context = await browser.newContext({
    viewport: PHONE,
    javaScriptEnabled: false,
    storageState: await page.context().storageState(),
  });
  const phone = await context.newPage();
  await phone.goto('/today');
  await expect(phone.getByRole('button', { name: 'Open navigation' })).toBeVisible();
  await expect(phone.getByRole('navigation', { name: 'Main' })).toBeHidden();
  await context.close();
});

// Journey (proposals → portal, on a phone): the e-mail's link opens the proposal; the client accepts it.
test('the client reads a proposal from the e-mail on a phone and accepts it; every portal page fits the screen', async ({
  page,
  browser,
}) => {
  test.setTimeout(180_000);
  await signIn(page, DEMO.office);
  await navLink(page, 'Estimates').click();
  await page.getByRole('link', { name: 'New estimate' }).click();
  await page.getByLabel('Client').fill('Hattie');
  await page.getByRole('option', { name: /Hattie Brambleton/ }).click();
  await page.getByLabel('Site').click();
  await page.getByRole('option').first().click();
  await page.getByLabel('Estimate title').fill('Stair hall on a phone');
  await page.getByRole('button', { name: 'Create estimate' }).click();
  await expect(page).toHaveURL(/\/estimates\/[0-9a-f-]+$/);
  await finishWholeRoom(page, 'Round sitting room', 'Layered lime plaster, burnished and waxed');
  await page.getByRole('button', { name: 'Add an option' }).click();
  await page.getByRole('tabpanel').getByLabel('Option name').fill('Option B: limewash');
  await finishWholeRoom(page, 'Round sitting room', 'Two-coat limewash');
  await page.getByRole('button', { name: 'Save estimate' }).click();
  await expect(page.getByText('All changes saved')).toBeVisible();
  const estimateUrl = page.url();
  const found: Record<string, string[]> = {};
  {
    const { phone: builder, context } = await onPhone(browser, page);
    await openLiveOnPhone(builder, new URL(estimateUrl).pathname);
    await builder.waitForLoadState('networkidle');
    await look(builder, 'estimate-builder', found);
    // A long label is not cut short beside its suffix ("Price per ft² for Antiqued um… USD").
    const rate = builder.getByLabel(/Price per ft² for Antiqued umber glaze/);
    await rate.scrollIntoViewIfNeeded();
    const label = builder.locator('mat-form-field', { has: rate }).locator('label').first();
    expect(await label.evaluate((el) => el.scrollWidth <= el.clientWidth + 1)).toBe(true);
    await context.close();
  }
  // A sample board shown to the client, so the portal's board page is walked too.
  await navLink(page, 'Sample boards').click();
  await page.getByRole('link', { name: 'New sample board' }).click();
  await page.getByLabel('Client').fill('Hattie');
  await page.getByRole('option', { name: /Hattie Brambleton/ }).click();
  await page.getByLabel('Finish system').click();
  await page.getByRole('option', { name: 'Two-coat limewash' }).click();
  await page.getByLabel('Label').fill('Stair hall limewash, round 1');
  await page.getByRole('button', { name: 'Make the board' }).click();
  await expect(page.getByRole('heading', { name: /Stair hall limewash/ })).toBeVisible();
  await page.getByRole('button', { name: 'Show to the client' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Show to the client' }).click();
  await expect(page.getByText('With the client').first()).toBeVisible();
  await page.goto(estimateUrl);
  await page.getByRole('link', { name: 'Proposals for this estimate' }).click();
  await page.getByRole('button', { name: 'Make a proposal' }).click();
  await page.getByRole('button', { name: 'Create version' }).click();
  const version = page.getByRole('article', { name: 'Version 1' });
  await version.getByRole('button', { name: 'Send to client' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Send', exact: true }).click();
  await expect(page.getByRole('status').filter({ hasText: /sent to/ })).toBeVisible();

  const mail = await waitForMail(DEMO.client, /sent you a proposal/, { text: 'Stair hall on a phone' });
  const client = await browser.newContext({ viewport: PHONE });
  const portal = await client.newPage();
  await openLive(portal, pathFrom(mail));
  await expect(portal).toHaveURL(/\/portal\/proposals\/[0-9a-f-]+$/);
  await expect(portal.getByRole('heading', { name: 'Stair hall on a phone' }).first()).toBeVisible();
  await look(portal, 'portal-proposal', found);

  await portal.getByRole('radio', { name: /Option B: limewash/ }).check();
  await portal.getByLabel('Your full name').fill('Hattie Brambleton');
  await portal.getByLabel('I accept this proposal and its terms.').check();
  await portal.getByRole('button', { name: 'Accept this proposal' }).click();
  const accepted = portal.getByRole('status').filter({ hasText: /Accepted by Hattie Brambleton/ });
  await expect(accepted).toBeVisible();
  // The status icon is drawn from the icon font (a ligature), not left as its name or a stray glyph.
  const icon = accepted.locator('mat-icon', { hasText: 'verified' });
  await expect(icon).toHaveText('verified');
  const box = await icon.boundingBox();
  expect(box && box.width >= 20 && box.width <= 28 && box.height >= 20).toBe(true);
  expect(await icon.evaluate((el) => getComputedStyle(el).fontFamily)).toContain('Material Symbols');
  await look(portal, 'portal-proposal-accepted', found);

  // On a phone each invoice is a card: its status is on screen, not in a table's column off to the side.
  await openLive(portal, '/portal/invoices');
  const firstInvoice = portal.getByRole('table').getByRole('row').nth(1);
  const state = (await firstInvoice.getByRole('cell').last().boundingBox())!;
  expect(state.x + state.width).toBeLessThanOrEqual(PHONE.width);
  for (const path of ['/portal/projects', '/portal/invoices', '/portal/boards']) {
    await openLive(portal, path);
    await portal.waitForLoadState('networkidle');
    await look(portal, path.slice(1).replace(/\//g, '-'), found);
  }
  await portal
    .getByRole('list', { name: 'Sample boards' })
    .getByRole('link', { name: /Stair hall limewash/ })
    .click();
  await expect(portal.getByRole('heading', { name: /Stair hall limewash/ })).toBeVisible();
  await look(portal, 'portal-board', found);
  // The finish steps carry their numbers in their words ("1. …"): the list adds no bullet or number of its own.
  const steps = portal.getByRole('region', { name: 'The finish' }).getByRole('listitem');
  await expect(steps.first()).toHaveText(/^1\. /);
  expect(await steps.first().evaluate((li) => getComputedStyle(li).listStyleType)).toBe('none');
  await client.close();

  const visitor = await browser.newContext({ viewport: PHONE });
  const publicPage = await visitor.newPage();
  for (const path of ['/portal/f/fernhollow/inquiry', '/portal/sign-in', '/sign-in', '/sign-up']) {
    await openLive(publicPage, path);
    await look(publicPage, `public${path.replace(/\//g, '-')}`, found);
  }
  await visitor.close();
  expect(found).toEqual({});
});

test("the crew's pages work on a phone: named controls, images with alt text, nothing off the screen", async ({ page, browser }) => {
  await signIn(page, CREW);
  const { phone, context } = await onPhone(browser, page);
  const found: Record<string, string[]> = {};
  await openLiveOnPhone(phone, '/today');
  await phone.getByRole('button', { name: 'Open navigation' }).click();
  const nav = phone.getByRole('navigation', { name: 'Main' });
  for (const name of ['Today', 'Job sheets', 'Sample boards', 'Finish library', 'Team']) await expect(navLink(phone, name)).toBeVisible();
  await expect(nav.getByRole('link')).toHaveCount(5);
  await phone.keyboard.press('Escape');
  for (const path of ['/today', '/sheets', '/samples', '/library', '/team']) {
    await openLiveOnPhone(phone, path);
    await phone.waitForLoadState('networkidle');
    await look(phone, `crew-${path.slice(1)}`, found);
    for (const [kind, href] of await detailLinks(phone)) {
      await openLiveOnPhone(phone, href);
      await phone.waitForLoadState('networkidle');
      await look(phone, `crew-${kind.slice(1).replace(/[/:]+/g, '-')}`, found);
      break;
    }
  }
  await context.close();
  expect(found).toEqual({});
});
