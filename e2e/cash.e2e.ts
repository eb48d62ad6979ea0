import { readFile } from 'node:fs/promises';
import { parse } from 'csv-parse/sync';
import { expect, test } from '@playwright/test';
import type { CashReceivableInvoices, CashReceivables } from '@layerbook/contracts/types';
import { DEMO, signIn } from './support/people';
import { openLive } from './support/phone';

/** A calendar day `days` before today, as the date fields take it. */
function daysAgo(days: number): string {
  return new Date(Date.now() - days * 86_400_000).toISOString().slice(0, 10);
}

// Journey (billing → cash): the owner opens Cash, reads the money owed by age from the chart's
// table, drills into the invoices 31–60 days late by keyboard, opens one, and downloads the
// invoices as a CSV file for the accountant. The demo firm's seed (server/src/seed/demo-billing.ts)
// leaves the stair hall's stage payment unpaid 35 days past due.
test('the owner reads money owed by age, drills into an invoice 31–60 days late and exports invoices as CSV', async ({ page }) => {
  await signIn(page, DEMO.owner);
  await openLive(page, '/cash');
  await expect(page.getByRole('heading', { level: 1, name: 'Cash' })).toBeVisible();

  // The figures the page shows come from the API; the same answer tells the journey what to expect.
  const owed = (await (await page.request.get('/api/cash/receivables')).json()) as CashReceivables;
  const older = (await (await page.request.get('/api/cash/receivables/invoices?age=31-60')).json()) as CashReceivableInvoices;
  const late = older.invoices[0];
  expect(late, 'the demo seed should leave an invoice 31–60 days late').toBeDefined();
  if (!late) return;
  const money = new Intl.NumberFormat('en-US', { style: 'currency', currency: owed.currency });

  // The chart is one picture with its summary; its numbers are in the table beside it.
  await expect(page.getByRole('img', { name: /money owed by age/ })).toBeVisible();
  const table = page.getByRole('table', { name: /Owed as of/ });
  const row = table.getByRole('row', { name: /31–60 days late/ });
  await expect(row).toContainText(money.format(Number(owed.buckets['31-60'])));
  await expect(table.getByRole('row', { name: /Retainage held/ })).toContainText(money.format(Number(owed.retainage)));
  await expect(page.getByRole('img', { name: /cash received in each of the last twelve months/ })).toBeVisible();
  await expect(page.getByRole('img', { name: /cash expected in each of the next 13 weeks/ })).toBeVisible();
  await page.screenshot({ path: 'e2e/.artifacts/cash-page.png', fullPage: true });

  // Drill down by keyboard: the age's button in the table, then the invoice's link.
  const drill = row.getByRole('button', { name: 'Invoices 31–60 days late' });
  await drill.focus();
  await page.keyboard.press('Enter');
  await expect(drill).toHaveAttribute('aria-pressed', 'true');
  const list = page.getByRole('region', { name: /^Invoices 31–60 days late/ });
  await expect(list).toContainText(`${late.daysPastDue} days late`);
  await expect(page).toHaveURL(/[?&]age=31-60/);
  await list.screenshot({ path: 'e2e/.artifacts/cash-drill.png' });
  await list.getByRole('link', { name: late.number, exact: true }).click();
  await expect(page).toHaveURL(new RegExp(`/billing/invoices/${late.invoiceId}$`));
  await expect(page.getByRole('heading', { level: 1 })).toContainText(late.number);

  // Back on Cash: the invoices of the last 90 days as a CSV file, which a CSV parser reads back.
  await page.goBack();
  await expect(page.getByRole('region', { name: /^Invoices 31–60 days late/ })).toBeVisible();
  const exports = page.getByRole('region', { name: 'Files for your accountant' });
  await exports.getByLabel('First day').fill(daysAgo(90));
  await exports.getByLabel('Last day').fill(daysAgo(0));
  const downloading = page.waitForEvent('download');
  await exports.getByRole('link', { name: /^Invoices/ }).click();
  const download = await downloading;
  expect(download.suggestedFilename()).toMatch(/-invoices-\d{4}-\d{2}-\d{2}-\d{4}-\d{2}-\d{2}\.csv$/);
  const path = await download.path();
  // A spreadsheet may want a byte-order mark first; the parser reads the rest.
  const rows = parse((await readFile(path, 'utf8')).replace(/^\uFEFF/, ''));
  expect(rows.length).toBeGreaterThan(1);
  expect(rows.slice(1).some((cells) => cells.includes(late.number))).toBe(true);
});
