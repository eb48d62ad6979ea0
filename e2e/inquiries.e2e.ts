import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { expect, test } from '@playwright/test';
import { e2eEnv } from './support/global-setup';
import { waitForMail } from './support/inbox';

const root = path.resolve(__dirname, '..');
/** The demo firm's calendar date (America/New_York), as the follow-up field expects it (M/D/YYYY). */
const firmToday = new Intl.DateTimeFormat('en-US', {
  timeZone: 'America/New_York',
  year: 'numeric',
  month: 'numeric',
  day: 'numeric',
}).format(new Date());

// Journey (inquiries): a prospect asks through the public form; the owner works the inquiry.
test('a prospect submits the public form; the owner moves it with the keyboard, logs a note and a follow-up, and the reminder arrives', async ({
  page,
  browser,
}) => {
  const prospectEmail = `prospect.${Date.now()}@example.test`;
  const prospect = await browser.newContext();
  const form = await prospect.newPage();
  await form.goto('/portal/f/fernhollow/inquiry');
  await expect(form.getByRole('heading', { name: /Tell Fernhollow Plaster & Glaze about your project/ })).toBeVisible();
  // Type once the page is live: text typed in the instant hydration swaps the form in can be lost
  // (the no-script path is covered by the next test).
  await expect(form.locator('form[data-hydrated="true"]')).toBeVisible();
  await form.getByLabel('Your name').fill('Perpetua Langdale');
  await form.getByLabel('E-mail').fill(prospectEmail);
  await form.getByLabel('Address of the place to be finished').fill('9 Cinderford Way, Marrowby');
  await form.getByLabel('Year the building was built').fill('1912');
  await form.getByLabel('Which rooms and surfaces?').fill('Round sitting room with a turret ceiling');
  await form.getByLabel('How did you hear of us?').selectOption('showroom');
  await form.getByLabel('You may contact me about this inquiry.').check();
  await form.screenshot({ path: 'e2e/.artifacts/public-form.png', fullPage: true });
  await form.getByRole('button', { name: 'Send inquiry' }).click();
  await expect(form.getByRole('heading', { name: 'Thank you' })).toBeVisible();
  await waitForMail(prospectEmail, /received your inquiry/);
  await prospect.close();

  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('owner@fernhollow.example');
  await page.getByLabel('Password', { exact: true }).fill('limewash-demo-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/today$/);
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Inquiries' }).click();
  const newColumn = page.getByRole('region', { name: 'Stage: New' });
  await expect(newColumn.getByRole('link', { name: 'Perpetua Langdale' })).toBeVisible();
  await page.screenshot({ path: 'e2e/.artifacts/board.png', fullPage: true });

  // Move the card with the keyboard only.
  await newColumn.getByRole('button', { name: 'Move Perpetua Langdale' }).focus();
  await page.keyboard.press('Enter');
  const target = page.getByRole('menuitem', { name: 'Move to Site visit booked' });
  await expect(target).toBeVisible();
  for (let i = 0; i < 6 && !(await target.evaluate((el) => el === document.activeElement)); i++) await page.keyboard.press('ArrowDown');
  await page.keyboard.press('Enter');
  const visitColumn = page.getByRole('region', { name: 'Stage: Site visit booked' });
  await expect(visitColumn.getByRole('link', { name: 'Perpetua Langdale' })).toBeVisible();

  await visitColumn.getByRole('link', { name: 'Perpetua Langdale' }).click();
  await expect(page.getByRole('combobox', { name: 'Stage' })).toContainText('Site visit booked');
  await page.getByLabel('What happened').fill('Called: visit on Thursday at 10, bring the turret sample boards.');
  await page.getByRole('button', { name: 'Add to log' }).click();
  await expect(page.getByRole('list', { name: 'Activity log' })).toContainText('visit on Thursday');
  await page.getByLabel('Next follow-up').fill(firmToday);
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(page.getByRole('list', { name: 'Activity log' })).toContainText(/follow-up/i);
  await expect(page.getByRole('link', { name: 'Open the client record' })).toBeVisible();
  await page.screenshot({ path: 'e2e/.artifacts/inquiry-detail.png', fullPage: true });

  // The daily reminder job, triggered directly rather than waiting for its hour.
  execFileSync('node', ['server/dist/queue/cli.js', 'follow-ups'], { cwd: root, env: e2eEnv(), stdio: 'inherit' });
  const reminder = await waitForMail('owner@fernhollow.example', /Follow-ups for today/);
  expect(reminder.text).toContain('Perpetua Langdale');

  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Today' }).click();
  await expect(page.getByRole('region', { name: 'Due today' })).toContainText('Perpetua Langdale');
  await page.screenshot({ path: 'e2e/.artifacts/today.png', fullPage: true });
});

test('the public form keeps what the prospect typed and names each field when it refuses, without scripts', async ({ browser }) => {
  const context = await browser.newContext({ javaScriptEnabled: false });
  const form = await context.newPage();
  await form.goto('/portal/f/fernhollow/inquiry');
  await form.getByLabel('Your name').fill('Ambrose Tull');
  await form.getByLabel('E-mail').fill('not-an-address');
  await form.getByRole('button', { name: 'Send inquiry' }).click();
  await expect(form.getByRole('alert').first()).toContainText('Please check the fields marked below.');
  await expect(form.getByLabel('Your name')).toHaveValue('Ambrose Tull');
  await expect(form.getByText('Enter a valid e-mail address')).toBeVisible();
  await expect(form.getByText('Tick the box so we may contact you')).toBeVisible();
  await form.screenshot({ path: 'e2e/.artifacts/public-form-refused.png', fullPage: true });
  await context.close();
});

// Waking the form's lower parts once left their fields unstyled for a frame, now and then, and the
// page shifted on a phone (lbWakeTogether); a few loads catch it coming back.
test('the public form does not move while it wakes on a phone', async ({ browser }) => {
  for (let load = 0; load < 4; load++) {
    const context = await browser.newContext({ viewport: { width: 412, height: 823 }, isMobile: true, hasTouch: true });
    const form = await context.newPage();
    await form.addInitScript(() => {
      const shifts: string[] = [];
      (window as unknown as { shifts: string[] }).shifts = shifts;
      new PerformanceObserver((list) => {
        for (const entry of list.getEntries())
          shifts.push(`${Math.round(entry.startTime)} ms: ${(entry as unknown as { value: number }).value}`);
      }).observe({ type: 'layout-shift', buffered: true });
    });
    await form.goto('/portal/f/fernhollow/inquiry');
    await expect(form.locator('form[data-hydrated="true"]')).toBeVisible();
    // Both lower parts awake: their fields have lost the server's marker class.
    await expect(form.locator('.mat-input-server')).toHaveCount(0);
    await form.waitForTimeout(300);
    expect(await form.evaluate(() => (window as unknown as { shifts: string[] }).shifts)).toEqual([]);
    await context.close();
  }
});

// The form wakes in steps (its lower parts are dehydrated blocks that wake a task later): what a
// prospect types before the app is up, in either part, is still there once both are awake, and is sent.
test('the public form keeps what was typed before the app took over, in both of its parts', async ({ browser }) => {
  const context = await browser.newContext();
  const form = await context.newPage();
  let release!: () => void;
  const released = new Promise<void>((resolve) => (release = resolve));
  await form.route(/\/portal\/main-[^/]+\.js$/, async (route) => {
    await released;
    await route.continue();
  });
  // Not until "load": the page asks for its held script after the first paint, and when that comes
  // before the load event (a page answered at once), the load event waits for the script.
  await form.goto('/portal/f/fernhollow/inquiry', { waitUntil: 'domcontentloaded' });
  const email = `early.${Date.now()}@example.test`;
  await form.getByLabel('Your name').fill('Isolde Varne');
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Address of the place to be finished').fill('4 Quillon Row, Marrowby');
  await form.getByLabel('Year the building was built').fill('1931');
  await form.getByLabel('Which rooms and surfaces?').fill('Dining room walls, polished plaster');
  await form.getByLabel('How did you hear of us?').selectOption('showroom');
  await expect(form.locator('form[data-hydrated="true"]')).toHaveCount(0);
  release();
  await expect(form.locator('form[data-hydrated="true"]')).toBeVisible();
  // Typed into the lower part right after the page woke: kept whether or not that part is awake yet.
  await form.getByLabel('When would you like the work done?').fill('Before spring');
  await expect(form.getByLabel('Your name')).toHaveValue('Isolde Varne');
  await expect(form.getByLabel('Address of the place to be finished')).toHaveValue('4 Quillon Row, Marrowby');
  await expect(form.getByLabel('Which rooms and surfaces?')).toHaveValue('Dining room walls, polished plaster');
  await expect(form.getByLabel('How did you hear of us?')).toHaveValue('showroom');
  await expect(form.getByLabel('When would you like the work done?')).toHaveValue('Before spring');
  // The lower part is awake: no referral chosen, so its referrer field (always there without scripts) has gone.
  await expect(form.getByLabel('Who referred you?')).toHaveCount(0);
  await form.getByLabel('You may contact me about this inquiry.').check();
  await form.getByRole('button', { name: 'Send inquiry' }).click();
  await expect(form.getByRole('heading', { name: 'Thank you' })).toBeVisible();
  await waitForMail(email, /received your inquiry/);
  await context.close();
});
