import { expect, type Page, test } from '@playwright/test';
import { pathFrom, waitForMail } from './support/inbox';
import { newFirm, signIn, signOut, signUp } from './support/people';
import { onPhone } from './support/phone';

const NEW_PASSWORD = 'burnished-wax-at-dusk';

async function trySignIn(page: Page, email: string, password: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

// Journey (auth): a forgotten password is replaced through the e-mailed link; only the new one works.
// The owner of a firm of their own, so the demo accounts the other journeys sign in with keep their password.
test('an owner resets a forgotten password by e-mail, signs in with the new one, and the old one no longer works', async ({
  page,
  browser,
}) => {
  const firm = newFirm('Saltmarsh Fresco Works', 'Dorcas Velliquette', 'first-password-of-lime');
  await signUp(page, firm);
  await signOut(page, firm.name);

  await page.getByRole('link', { name: 'Forgot your password?' }).click();
  await expect(page.getByRole('heading', { name: 'Reset your password' })).toBeVisible();
  await page.getByLabel('E-mail').fill(firm.email);
  await page.getByRole('button', { name: 'Send reset link' }).click();
  await expect(page.getByRole('status')).toContainText(`If ${firm.email} belongs to a Layerbook account`);

  const mail = await waitForMail(firm.email, /Reset your Layerbook password/);
  const resetPath = pathFrom(mail);
  expect(resetPath).toMatch(/^\/reset-password\?/);
  await page.goto(resetPath);
  await expect(page.getByRole('heading', { name: 'Choose a new password' })).toBeVisible();
  await page.getByLabel('New password').fill(NEW_PASSWORD);
  await page.getByRole('button', { name: 'Save new password' }).click();
  await expect(page).toHaveURL(/\/today$/);
  await signOut(page, firm.name);

  // The old password is refused, in words that do not say which half was wrong.
  await trySignIn(page, firm.email, firm.password);
  await expect(page.getByRole('alert')).toContainText('E-mail or password is not right.');
  await expect(page).toHaveURL(/\/sign-in/);

  await signIn(page, firm.email, NEW_PASSWORD);
  await expect(page.getByRole('banner')).toContainText(firm.firmName);
  await signOut(page, firm.name);

  // The link works once.
  await page.goto(resetPath);
  await page.getByLabel('New password').fill('a-third-password-tried');
  await page.getByRole('button', { name: 'Save new password' }).click();
  await expect(page.getByRole('alert')).toContainText('This reset link was already used or a newer one was sent. Ask for a new one.');
  await expect(page.getByRole('link', { name: 'Send me a new reset link' })).toBeVisible();
  await expect(page).toHaveURL(/\/reset-password/);

  const { phone, context } = await onPhone(browser, page);
  await phone.goto('/forgot-password');
  await expect(phone.getByRole('button', { name: 'Send reset link' })).toBeEnabled();
  await phone.screenshot({ path: 'e2e/.artifacts/phone-forgot-password.png' });
  await phone.goto(resetPath);
  await expect(phone.getByRole('button', { name: 'Save new password' })).toBeEnabled();
  await phone.screenshot({ path: 'e2e/.artifacts/phone-reset-password.png' });
  await context.close();
});
