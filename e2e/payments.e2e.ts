import { readFile } from 'node:fs/promises';
import { PDFParse } from 'pdf-parse';
import { expect, test, type Page } from '@playwright/test';
import type { PortalInvoiceSummary } from '@layerbook/contracts/types';
import { pathFrom, waitForMail } from './support/inbox';
import { issuedDeposit, sentProposal, setDepositAtAcceptance } from './support/payment-setup';
import { DEMO } from './support/people';
import { axeProblems, phoneProblems } from './support/phone-checks';
import { onPhone, openLive } from './support/phone';

const TITLE = 'Stair hall limewash, paid by card';
const TITLE_AT_ACCEPTANCE = 'Stair hall limewash, deposit paid at signing';

/** Stripe's published test cards (Stripe Docs "Testing" — test card numbers): one pays, one is declined. */
const CARDS = { pays: '4242 4242 4242 4242', declined: '4000 0000 0000 0002' } as const;

let deposit: { readonly id: string; readonly number: string };
test.beforeAll(async () => {
  deposit = await issuedDeposit(TITLE);
});

/** Fills the stand-in's card page (any future expiry and CVC go with a test card) and presses Pay. */
async function payOnCardPage(page: Page, card: string): Promise<void> {
  await expect(page.getByRole('heading', { level: 1, name: 'Pay by card' })).toBeVisible();
  await page.getByLabel('Card number').fill(card);
  await page.getByLabel('Expiry (MM / YY)').fill('12 / 34');
  await page.getByLabel('Security code (CVC)').fill('123');
  await page.getByRole('button', { name: /^Pay / }).click();
}

async function expectAccessible(page: Page): Promise<void> {
  expect(await axeProblems(page)).toEqual([]);
}

// Journey (portal → card page → portal): the client opens the e-mailed deposit invoice, pays it by card
// on the card processor's page (the local stand-in), comes back to it being confirmed and then paid,
// gets the receipt by e-mail and downloads it; on another open invoice a declined card says so, and
// going back from the card page leaves that invoice open with nothing charged.
test('the client pays the e-mailed deposit by card, sees it paid, gets the receipt and downloads it; a declined card leaves an invoice open', async ({
  browser,
}) => {
  const context = await browser.newContext({ acceptDownloads: true });
  const page = await context.newPage();

  // The invoice e-mail's link signs the client in and opens the invoice.
  const invoiceMail = await waitForMail(DEMO.client, new RegExp(`^Invoice ${deposit.number} from `));
  await openLive(page, pathFrom(invoiceMail));
  await expect(page).toHaveURL(new RegExp(`/portal/invoices/${deposit.id}$`));
  await expect(page.getByRole('heading', { level: 1, name: `Invoice ${deposit.number}` })).toBeVisible();
  // An invoice's page is in the Invoices section: the portal's nav marks it as the current one.
  const sections = page.getByRole('navigation', { name: 'Your pages' });
  await expect(sections.getByRole('link', { name: 'Your invoices' })).toHaveAttribute('aria-current', 'page');
  await expect(sections.getByRole('link', { name: 'Your projects' })).not.toHaveAttribute('aria-current');
  const pay = page.getByRole('button', { name: /^Pay .+ by card$/ });
  await expect(pay).toBeEnabled();
  const amount = (await pay.textContent())!.trim().replace(/^.*Pay (.+) by card$/s, '$1');
  await page.getByRole('region', { name: 'Pay online' }).screenshot({ path: 'e2e/.artifacts/payments-pay-button.png' });
  await expectAccessible(page);

  // The card page (the stand-in for Stripe Checkout) shows the amount; the success card pays it.
  await pay.click();
  await expect(page).toHaveURL(/\/pay\/cs_/);
  await expect(page.getByText(amount).first()).toBeVisible();
  await page.screenshot({ path: 'e2e/.artifacts/payments-card-page.png', fullPage: true });
  await payOnCardPage(page, CARDS.pays);

  // Back in the portal: being confirmed (perhaps only for a moment), then paid with its receipt.
  await expect(page).toHaveURL(new RegExp(`/portal/invoices/${deposit.id}/payment/`));
  const state = page.getByRole('status').filter({ hasText: /Paid|Payment received|Checking/ });
  await expect(state).toBeVisible();
  const paid = page.getByRole('heading', { level: 2, name: /^Paid — receipt RCT-\d+$/ });
  await expect(paid).toBeVisible({ timeout: 45_000 });
  const receiptNumber = (await paid.textContent())!.replace('Paid — receipt ', '').trim();
  const returnPath = new URL(page.url()).pathname;
  await expect(page.getByText(`Invoice ${deposit.number} is paid in full.`)).toBeVisible();
  await page.screenshot({ path: 'e2e/.artifacts/payments-paid.png', fullPage: true });
  await expectAccessible(page);

  // The invoice reads paid, with no pay button, and lists the receipt.
  await page.getByRole('link', { name: 'Back to the invoice' }).click();
  await expect(page.getByText('Paid in full. Thank you.')).toBeVisible();
  await expect(page.getByRole('button', { name: /by card$/ })).toHaveCount(0);
  const receipts = page.getByRole('region', { name: 'Receipts' });
  await expect(receipts.getByRole('listitem').filter({ hasText: `Receipt ${receiptNumber}` })).toContainText('Paid by card online');
  await expectAccessible(page);

  // The receipt e-mail names it and links to the invoice in the portal.
  const receiptMail = await waitForMail(DEMO.client, new RegExp(`^Receipt ${receiptNumber} — `));
  expect(receiptMail.text).toContain(deposit.number);
  expect(receiptMail.text).toContain(`/portal/invoices/${deposit.id}`);

  // The receipt PDF downloads from the invoice page and carries its number and the invoice's.
  const downloading = page.waitForEvent('download');
  await receipts.getByRole('link', { name: `Download receipt ${receiptNumber} (PDF)` }).click();
  const download = await downloading;
  const pdf = await readFile(await download.path());
  await download.saveAs('e2e/.artifacts/payments-receipt.pdf');
  expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  const parser = new PDFParse({ data: pdf });
  const { text } = await parser.getText();
  await parser.destroy();
  expect(text).toContain(`Receipt ${receiptNumber}`);
  expect(text).toContain(deposit.number);

  // Another open invoice of the client's (the demo firm's billing): a declined card.
  const list = (await (await page.request.get('/api/portal/invoices')).json()) as { items: PortalInvoiceSummary[] };
  const other = list.items.find((i) => i.id !== deposit.id && (i.status === 'issued' || i.status === 'part_paid'));
  expect(other, 'an open invoice in the demo billing').toBeDefined();
  await openLive(page, `/portal/invoices/${other!.id}`);
  const otherDue = page.getByRole('status').filter({ hasText: /due by|was due on/ });
  const dueBefore = (await otherDue.textContent())!.trim();
  await page.getByRole('button', { name: /^Pay .+ by card$/ }).click();
  await payOnCardPage(page, CARDS.declined);
  await expect(page.getByRole('alert')).toContainText('Your card was declined.');
  await page.screenshot({ path: 'e2e/.artifacts/payments-declined.png', fullPage: true });

  // Going back from the card page: nothing charged, the invoice still open with the same amount due.
  await page.getByRole('link', { name: 'Cancel and go back' }).click();
  await expect(page).toHaveURL(new RegExp(`/portal/invoices/${other!.id}\\?payment=cancelled$`));
  await expect(page.getByText('The payment was not completed and nothing was charged. You can try again.')).toBeVisible();
  await expect(otherDue).toHaveText(dueBefore);
  await expect(page.getByRole('button', { name: /^Pay .+ by card$/ })).toBeEnabled();
  await page.screenshot({ path: 'e2e/.artifacts/payments-cancelled.png', fullPage: true });
  await expectAccessible(page);

  // The same pages on a phone: axe's rules and our layout checks.
  const { phone, context: phoneContext } = await onPhone(browser, page);
  for (const [path, name] of [
    [`/portal/invoices/${deposit.id}`, 'receipts'],
    [returnPath, 'paid'],
    [`/portal/invoices/${other!.id}?payment=cancelled`, 'cancelled'],
  ] as const) {
    await openLive(phone, path);
    await expect(phone.getByRole('heading', { level: 1 })).toBeVisible();
    await phone.screenshot({ path: `e2e/.artifacts/payments-phone-${name}.png`, fullPage: true });
    expect(await phoneProblems(phone), path).toEqual([]);
    expect(await axeProblems(phone), path).toEqual([]);
  }
  await phoneContext.close();
  await context.close();
});

// Journey (portal): a firm that issues the deposit in the acceptance — the client signs in the portal,
// is offered the deposit at once, and pays it by card. The demo firm's setting is put back after.
test('right after accepting, the client pays the deposit the firm issued in the acceptance', async ({ browser }) => {
  await setDepositAtAcceptance('issueAndSend');
  try {
    const versionId = await sentProposal(TITLE_AT_ACCEPTANCE);
    const context = await browser.newContext();
    const page = await context.newPage();
    const mail = await waitForMail(DEMO.client, /sent you a proposal/, { text: `/portal/proposals/${versionId}` });
    await openLive(page, pathFrom(mail));
    await expect(page).toHaveURL(new RegExp(`/portal/proposals/${versionId}$`));
    await page.getByRole('radio', { name: /^Limewash — / }).check();
    await page.getByLabel('Your full name').fill('Hattie Brambleton');
    await page.getByLabel('I accept this proposal and its terms.').check();
    await page.getByRole('button', { name: 'Accept this proposal' }).click();
    await expect(page.getByText(/Accepted by Hattie Brambleton/)).toBeVisible();

    const ready = page.getByRole('region', { name: 'Your deposit invoice is ready' });
    await expect(ready).toBeVisible();
    await ready.screenshot({ path: 'e2e/.artifacts/payments-deposit-ready.png' });
    await ready.getByRole('link', { name: 'Pay the deposit now' }).click();
    await expect(page.getByRole('heading', { level: 1, name: /^Invoice INV-\d+$/ })).toBeVisible();
    await expect(page.getByText(/^Deposit from /)).toBeVisible();
    await page.getByRole('button', { name: /^Pay .+ by card$/ }).click();
    await payOnCardPage(page, CARDS.pays);
    await expect(page.getByRole('heading', { level: 2, name: /^Paid — receipt RCT-\d+$/ })).toBeVisible({ timeout: 45_000 });
    await context.close();
  } finally {
    await setDepositAtAcceptance('draft');
  }
});
