import { expect, test } from '@playwright/test';
import { linkFrom, waitForMail } from './support/inbox';

// Journey (team): the owner invites an office manager, who joins from the e-mailed link.
test('owner invites an office manager who sets a password and signs in', async ({ page, browser }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('owner@fernhollow.example');
  await page.getByLabel('Password', { exact: true }).fill('limewash-demo-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/today$/);
  await expect(page.getByTestId('firm-name')).toHaveText('Fernhollow Plaster & Glaze');
  await page.screenshot({ path: 'e2e/.artifacts/shell.png', fullPage: true });

  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Team' }).click();
  await expect(page.getByRole('heading', { name: 'Invite a person' })).toBeVisible();
  const email = `office.${Date.now()}@fernhollow.example`;
  await page.getByLabel('E-mail').fill(email);
  await page.getByRole('combobox', { name: 'Role', exact: true }).click();
  await page.getByRole('option', { name: /^Office/ }).click();
  await page.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByText(email, { exact: true })).toBeVisible();
  await page.screenshot({ path: 'e2e/.artifacts/team.png', fullPage: true });

  const mail = await waitForMail(email, /invited you/);
  const invited = await browser.newContext();
  const office = await invited.newPage();
  await office.goto(linkFrom(mail));
  await expect(office.getByTestId('invitation-firm')).toContainText('Fernhollow Plaster & Glaze');
  await office.getByLabel('Name').fill('Ines Ledger');
  await office.getByLabel('Password', { exact: true }).fill('beeswax-and-lime-2026');
  await office.getByRole('button', { name: 'Join the team' }).click();
  await expect(office).toHaveURL(/\/today$/);

  await office.getByRole('button', { name: 'Ines Ledger' }).click();
  await office.getByRole('menuitem', { name: 'Sign out' }).click();
  await expect(office).toHaveURL(/\/sign-in/);
  await office.getByLabel('E-mail').fill(email);
  await office.getByLabel('Password', { exact: true }).fill('beeswax-and-lime-2026');
  await office.getByRole('button', { name: 'Sign in' }).click();
  await expect(office).toHaveURL(/\/today$/);
  await expect(office.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Billing' })).toBeVisible();
  await invited.close();
});

test('the portal sign-in page is server-rendered: its content is in the HTML before any script runs', async ({ request, page }) => {
  const res = await request.get('/portal/sign-in');
  expect(res.status()).toBe(200);
  const html = await res.text();
  expect(html).toContain('Sign in to see your projects');
  expect(html).toContain('E-mail me a sign-in link');
  const csp = res.headers()['content-security-policy'] ?? '';
  const nonce = csp.match(/'nonce-([^']+)'/)?.[1];
  expect(nonce).toBeTruthy();
  expect(html).toContain(`nonce="${nonce}"`);
  expect(html).not.toContain('__LB_CSP_NONCE__');

  await page.goto('/portal/sign-in');
  await page.screenshot({ path: 'e2e/.artifacts/portal-sign-in.png', fullPage: true });
});

test('a client signs in to the portal with the e-mailed one-time link', async ({ page }) => {
  await page.goto('/portal/sign-in');
  await page.getByLabel('E-mail').fill('hattie@brambleton.example');
  await page.getByRole('button', { name: 'E-mail me a sign-in link' }).click();
  await expect(page.getByRole('status')).toContainText('Check your inbox');
  const mail = await waitForMail('hattie@brambleton.example', /sign-in link/i);
  await page.goto(linkFrom(mail).replace('http://localhost:4310', ''));
  await expect(page.getByRole('heading', { name: 'Your projects' })).toBeVisible();
});
