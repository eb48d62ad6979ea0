import { expect, type Page } from '@playwright/test';
import { pathFrom, waitForMail } from './inbox';

/** The demo firm's shared password (server/src/seed/demo.ts). */
export const DEMO_PASSWORD = 'limewash-demo-2026';

export const DEMO = {
  owner: 'owner@fernhollow.example',
  office: 'office@fernhollow.example',
  client: 'hattie@brambleton.example',
} as const;

/** Signs a member of staff in through the sign-in page and waits for the Today page. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/today$/);
}

/** Signs out through the account menu (the button carries the person's name). */
export async function signOut(page: Page, personName: string): Promise<void> {
  await page.getByRole('button', { name: personName }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in/);
}

export interface NewFirm {
  readonly firmName: string;
  readonly name: string;
  readonly email: string;
  readonly password: string;
}

/**
 * A firm of its own for journeys that change firm-wide things (settings, the owner's password),
 * so the demo firm the other journeys rely on stays as seeded.
 */
export function newFirm(firmName: string, name: string, password: string): NewFirm {
  const slug = firmName
    .toLowerCase()
    .replace(/[^a-z]+/g, '-')
    .replace(/^-|-$/g, '');
  return { firmName, name, email: `owner.${Date.now()}@${slug}.example`, password };
}

/**
 * Starts a new firm through the sign-up page, follows the confirmation link e-mailed to the owner,
 * and opens the firm; its owner lands signed in on Today.
 */
export async function signUp(page: Page, firm: NewFirm): Promise<void> {
  await page.goto('/sign-up');
  await page.getByLabel('Firm name').fill(firm.firmName);
  await page.getByLabel('Your name').fill(firm.name);
  await page.getByLabel('E-mail').fill(firm.email);
  await page.getByLabel('Password', { exact: true }).fill(firm.password);
  await page.getByRole('button', { name: 'Create firm' }).click();
  await expect(page.getByRole('status')).toContainText('Check your inbox to finish');
  const mail = await waitForMail(firm.email, /^Finish opening /);
  await page.goto(pathFrom(mail));
  await page.getByRole('button', { name: 'Open my firm' }).click();
  await expect(page).toHaveURL(/\/today$/);
}

/** The main navigation link to an area, as a person reads it. */
export function navLink(page: Page, name: string) {
  return page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name, exact: true });
}
