import { expect, type Page, test } from '@playwright/test';
import { navLink, newFirm, signUp } from './support/people';
import { onPhone, openLiveOnPhone } from './support/phone';

/** Saves by the named button and waits for the server to answer the PUT it sends. */
async function saveBy(page: Page, button: string, path: string) {
  const saved = page.waitForResponse((r) => new URL(r.url()).pathname === path && r.request().method() !== 'GET');
  await page.getByRole('button', { name: button }).click();
  expect((await saved).ok()).toBe(true);
}

// Journey (firms): a new firm's owner sets the firm up; everything is still there after a reload.
// A firm of its own, so the demo firm the other journeys read stays as seeded.
test('the owner changes the firm name, address, time zone and pricing rates, and they stick after a reload', async ({ page, browser }) => {
  const firm = newFirm('Quarry Lane Limewash', 'Tobias Wrenfield', 'kiln-and-ochre-2026');
  await signUp(page, firm);
  await navLink(page, 'Settings').click();
  await expect(page.getByRole('heading', { level: 1, name: 'Settings' })).toBeVisible();

  const settings = page.getByRole('group', { name: 'Firm' });
  await expect(settings.getByLabel('Firm name')).toHaveValue(firm.firmName);
  await settings.getByLabel('Firm name').fill('Quarry Lane Lime & Plaster');
  await settings.getByLabel('Phone').fill('555-0163');
  const address = page.getByRole('group', { name: 'Address' });
  await address.getByLabel('Address line 1').fill('3 Tanyard Steps');
  await address.getByLabel('Town or city').fill('Ebbsfold');
  await address.getByLabel('State, province or region').fill('CO');
  await address.getByLabel('Postal code').fill('80999');
  // Chosen by name and stored as its ISO 3166-1 code (typing "United States" once stored "UN").
  await address.getByRole('combobox', { name: 'Country' }).click();
  await page.getByRole('option', { name: 'United States', exact: true }).click();
  await page.getByRole('combobox', { name: 'Time zone' }).click();
  await page.getByRole('option', { name: 'America/Denver', exact: true }).click();
  await saveBy(page, 'Save settings', '/api/firm');
  await expect(page.getByText('Settings saved.')).toBeVisible();

  const pricing = page.getByRole('form', { name: 'Pricing and schedule' });
  await pricing.getByLabel('Labour rate per crew-hour').fill('72.50');
  await pricing.getByLabel('Crew size').fill('3');
  await pricing.getByRole('radio', { name: 'As markups on cost' }).check();
  await pricing.getByLabel('Overhead', { exact: true }).fill('18');
  await pricing.getByLabel('Profit', { exact: true }).fill('12');
  await pricing.getByRole('combobox', { name: 'Sales tax on our prices' }).click();
  await page.getByRole('option', { name: 'On the materials line only' }).click();
  await pricing.getByLabel('Tax rate').fill('4.5');
  await saveBy(page, 'Save pricing and schedule', '/api/firm/estimating');
  await expect(page.getByText('Pricing and schedule settings saved.')).toBeVisible();

  await page.reload();
  await expect(page.getByRole('group', { name: 'Firm' }).getByLabel('Firm name')).toHaveValue('Quarry Lane Lime & Plaster');
  await expect(page.getByRole('group', { name: 'Firm' }).getByLabel('Phone')).toHaveValue('555-0163');
  await expect(page.getByRole('group', { name: 'Address' }).getByLabel('Town or city')).toHaveValue('Ebbsfold');
  await expect(page.getByRole('combobox', { name: 'Time zone' })).toContainText('America/Denver');
  await expect(page.getByRole('group', { name: 'Address' }).getByRole('combobox', { name: 'Country' })).toContainText('United States');
  const reloaded = page.getByRole('form', { name: 'Pricing and schedule' });
  await expect(reloaded.getByLabel('Labour rate per crew-hour')).toHaveValue('72.50');
  await expect(reloaded.getByLabel('Crew size')).toHaveValue('3');
  await expect(reloaded.getByRole('radio', { name: 'As markups on cost' })).toBeChecked();
  await expect(reloaded.getByLabel('Overhead', { exact: true })).toHaveValue('18');
  await expect(reloaded.getByLabel('Profit', { exact: true })).toHaveValue('12');
  await expect(reloaded.getByRole('combobox', { name: 'Sales tax on our prices' })).toContainText('On the materials line only');
  await expect(reloaded.getByLabel('Tax rate')).toHaveValue('4.5');
  await expect(reloaded.getByText('These are still the starting values.')).toHaveCount(0);
  // The header names the firm as saved (it keeps the old name until the page is loaded again).
  await expect(page.getByRole('banner')).toContainText('Quarry Lane Lime & Plaster');

  const { phone, context } = await onPhone(browser, page);
  await openLiveOnPhone(phone, '/settings');
  await expect(phone.getByRole('group', { name: 'Firm' }).getByLabel('Firm name')).toHaveValue('Quarry Lane Lime & Plaster');
  await phone.screenshot({ path: 'e2e/.artifacts/phone-settings.png' });
  await phone.getByRole('heading', { name: 'Pricing and schedule' }).scrollIntoViewIfNeeded();
  await phone.screenshot({ path: 'e2e/.artifacts/phone-settings-pricing.png' });
  await context.close();
});
