import { expect, test } from '@playwright/test';
import { boardPhotoPng } from './support/images';
import { pathFrom, waitForMail } from './support/inbox';
import { DEMO, navLink, signIn } from './support/people';
import { onPhone, openLive, openLiveOnPhone, PHONE } from './support/phone';

const LABEL = 'Stair hall glaze, board A';

// Journey (samples → portal): a board with a photo is shown to the client, who approves it.
test('the office makes a sample board with a photo and shows it; the client signs in by e-mailed link and approves it; the office sees it approved', async ({
  page,
  browser,
}) => {
  await signIn(page, DEMO.office);
  await navLink(page, 'Sample boards').click();
  await page.getByRole('link', { name: 'New sample board' }).click();
  await page.getByLabel('Client').fill('Hattie');
  await page.getByRole('option', { name: /Hattie Brambleton/ }).click();
  await page.getByLabel('Finish system').click();
  await page.getByRole('option', { name: /^Antiqued umber glaze on a sealed base/ }).click();
  await page.getByLabel('Label').fill(LABEL);
  await page.getByLabel('Notes').fill('Umber tint lot 2291; glaze thinned 20 %; rag rolled, softened with a badger brush.');
  await page.getByRole('button', { name: 'Make the board' }).click();
  await expect(page.getByRole('heading', { name: LABEL })).toBeVisible();
  await expect(page.getByText('Being made')).toBeVisible();

  // The photo goes in through the file chooser the "Add photos" button opens.
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: 'Add photos' }).click();
  await (await chooser).setFiles({ name: 'stair-hall-board-a.png', mimeType: 'image/png', buffer: await boardPhotoPng() });
  const photo = page.getByRole('img', { name: `Photo 1 of ${LABEL}` });
  await expect(photo).toBeVisible();
  await expect(photo).toHaveJSProperty('complete', true);
  await expect.poll(() => photo.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBeGreaterThan(0);

  await page.getByRole('button', { name: 'Show to the client' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Show to the client' }).click();
  await expect(page.getByText('With the client').first()).toBeVisible();
  const boardUrl = page.url();

  // The client follows the e-mail: its button signs them in once and opens the board.
  const shown = await waitForMail(DEMO.client, /sample board for you to look at/, { text: LABEL });
  const boardPath = new URL(pathFrom(shown), 'http://portal.invalid').searchParams.get('next') ?? '';
  expect(boardPath).toMatch(/^\/portal\/boards\//);
  const client = await browser.newContext({ viewport: PHONE });
  const portal = await client.newPage();
  await portal.goto(pathFrom(shown));
  await expect(portal.getByRole('heading', { name: LABEL })).toBeVisible();

  // Act once the browser has taken over the server-rendered page.
  await openLive(portal, boardPath);
  await expect(portal.getByRole('heading', { name: LABEL })).toBeVisible();
  await expect(portal.getByRole('img', { name: `Photo 1 of ${LABEL}` })).toBeVisible();
  await expect(portal.getByText('Antiqued umber glaze on a sealed base, in the order it goes on:')).toBeVisible();
  await expect(portal.getByRole('button', { name: 'Approve this board' })).toBeVisible();
  await portal.screenshot({ path: 'e2e/.artifacts/phone-portal-board.png', fullPage: true });
  await portal.getByRole('button', { name: 'Approve this board' }).click();
  await portal.getByRole('button', { name: 'Yes, approve this board' }).click();
  await expect(portal.getByRole('status')).toContainText('You approved this board on');
  await portal.screenshot({ path: 'e2e/.artifacts/phone-portal-board-approved.png', fullPage: true });
  await client.close();

  // The office hears of it by e-mail and sees the board approved, with its photo kept.
  await waitForMail(DEMO.office, /approved the sample board/, { text: LABEL });
  await page.goto(boardUrl);
  await expect(page.getByRole('status').filter({ hasText: 'Approved by Hattie Brambleton' })).toBeVisible();
  await expect(page.getByRole('img', { name: `Photo 1 of ${LABEL}` })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Delete photo 1' })).toHaveCount(0);
  await navLink(page, 'Sample boards').click();
  const row = page.getByRole('table', { name: 'Sample boards' }).getByRole('row', { name: new RegExp(LABEL) });
  await expect(row).toContainText('Approved — control sample');
  await expect(row.getByRole('img', { name: `Photo of ${LABEL}` })).toBeVisible();

  const { phone, context } = await onPhone(browser, page);
  await openLiveOnPhone(phone, new URL(boardUrl).pathname);
  await expect(phone.getByRole('img', { name: `Photo 1 of ${LABEL}` })).toBeVisible();
  await phone.screenshot({ path: 'e2e/.artifacts/phone-sample-board.png' });
  await context.close();
});
