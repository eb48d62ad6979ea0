import { expect, test } from '@playwright/test';
import { DEMO, navLink, signIn } from './support/people';
import { onPhone, openLiveOnPhone } from './support/phone';

const NAME = 'Pembridge & Finch Interiors';
const EMAIL = `studio.${Date.now()}@pembridgefinch.example`;

// Journey (clients): a designer's studio is added by hand, corrected, and found again by search.
test('the office adds a client, edits it, and finds it by name, e-mail and phone', async ({ page, browser }) => {
  await signIn(page, DEMO.office);
  await navLink(page, 'Clients').click();
  await page.getByRole('link', { name: 'Add a client' }).click();
  await expect(page.getByRole('heading', { name: 'Add a client' })).toBeVisible();

  const form = page.getByRole('form', { name: 'New client' });
  await form.getByLabel('Client name').fill(NAME);
  await form.getByRole('combobox', { name: 'Kind of client' }).click();
  await page.getByRole('option', { name: 'Interior designer' }).click();
  await form.getByLabel('This is a company').check();
  await form.getByLabel('E-mail').fill(EMAIL);
  await form.getByLabel('Phone').fill('555-0142');
  await form.getByLabel('Notes').fill('Orla Finch leads; send samples to the studio, not the site.');
  await form.getByRole('button', { name: 'Add client' }).click();

  await expect(page).toHaveURL(/\/clients\/[0-9a-f-]+$/);
  await expect(page.getByRole('heading', { level: 1, name: NAME })).toBeVisible();
  await expect(page.getByText('Interior designer, a company')).toBeVisible();
  const clientUrl = page.url();

  // The phone number was wrong and the note needs more.
  await page.getByRole('button', { name: 'Edit client' }).click();
  const edit = page.getByRole('form', { name: 'Edit client' });
  await expect(edit.getByLabel('Client name')).toHaveValue(NAME);
  await edit.getByLabel('Phone').fill('555-0199');
  await edit.getByLabel('Notes').fill('Orla Finch leads; send samples to the studio, not the site. Invoices to accounts@.');
  await edit.getByRole('button', { name: 'Save client' }).click();
  await expect(page.getByText('Client saved.')).toBeVisible();
  const details = page.getByRole('region', { name: 'Details' });
  await expect(details.getByRole('link', { name: '555-0199' })).toBeVisible();
  await expect(details).toContainText('Invoices to accounts@.');
  await page.reload();
  await expect(page.getByRole('region', { name: 'Details' }).getByRole('link', { name: '555-0199' })).toBeVisible();

  await navLink(page, 'Clients').click();
  const search = page.getByRole('searchbox', { name: 'Search clients' });
  const table = page.getByRole('table', { name: 'Clients' });
  /** Types a search and waits for the server's answer to exactly that search. */
  const searchFor = async (words: string) => {
    const answered = page.waitForResponse((r) => {
      const url = new URL(r.url());
      return url.pathname === '/api/clients' && url.searchParams.get('q') === words && r.ok();
    });
    await search.fill(words);
    await answered;
  };
  for (const words of ['Pembridge', EMAIL, '555-0199']) {
    await searchFor(words);
    await expect(table.getByRole('row')).toHaveCount(2);
    await expect(table.getByRole('link', { name: NAME })).toBeVisible();
  }
  // The old phone number finds nobody.
  await searchFor('555-0142');
  await expect(table).toContainText('No clients match.');

  // The search lives in the address, so a reload or a shared link shows the same list.
  await searchFor('pembridge');
  await expect(table.getByRole('link', { name: NAME })).toBeVisible();
  await page.reload();
  await expect(page.getByRole('searchbox', { name: 'Search clients' })).toHaveValue('pembridge');
  await expect(page.getByRole('table', { name: 'Clients' }).getByRole('link', { name: NAME })).toBeVisible();

  const { phone, context } = await onPhone(browser, page);
  await openLiveOnPhone(phone, '/clients?q=pembridge');
  await expect(phone.getByRole('table', { name: 'Clients' }).getByRole('link', { name: NAME })).toBeVisible();
  await phone.screenshot({ path: 'e2e/.artifacts/phone-client-search.png' });
  await phone.getByRole('table', { name: 'Clients' }).getByRole('link', { name: NAME }).click();
  await expect(phone).toHaveURL(clientUrl);
  await expect(phone.getByRole('heading', { level: 1, name: NAME })).toBeVisible();
  await phone.screenshot({ path: 'e2e/.artifacts/phone-client.png' });
  await context.close();
});
