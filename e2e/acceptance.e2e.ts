import { expect, type Page, test } from '@playwright/test';
import { linkFrom, waitForMail } from './support/inbox';

async function signInAsOffice(page: Page) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('office@fernhollow.example');
  await page.getByLabel('Password', { exact: true }).fill('limewash-demo-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/today$/);
}

async function finishWholeRoom(page: Page, room: string, system: string) {
  await page.getByRole('tabpanel').getByRole('group', { name: room }).getByLabel('Same finish for the whole room').click();
  await page.getByRole('option', { name: system }).click();
}

// Journey (proposals → portal → jobs): two options priced, a proposal sent, option B accepted by the client.
test('the office sends a two-option proposal with an add-on; the client accepts option B with the add-on; the job appears with its draft payment schedule', async ({
  page,
  browser,
}) => {
  await signInAsOffice(page);
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Estimates' }).click();
  await page.getByRole('link', { name: 'New estimate' }).click();
  await page.getByLabel('Client').fill('Hattie');
  await page.getByRole('option', { name: /Hattie Brambleton/ }).click();
  await page.getByLabel('Site').click();
  await page.getByRole('option').first().click();
  await page.getByLabel('Estimate title').fill('Sitting room plaster');
  await page.getByRole('button', { name: 'Create estimate' }).click();
  await expect(page).toHaveURL(/\/estimates\/[0-9a-f-]+$/);

  await finishWholeRoom(page, 'Round sitting room', 'Layered lime plaster, burnished and waxed');
  await page.getByRole('button', { name: 'Add an option' }).click();
  await page.getByRole('tabpanel').getByLabel('Option name').fill('Option B: limewash');
  await finishWholeRoom(page, 'Round sitting room', 'Two-coat limewash');
  // An add-on the client may take with either option.
  await page.getByRole('button', { name: 'Add an add-on' }).click();
  const addOn = page.getByRole('group', { name: 'Add-on 1' });
  await addOn.getByLabel('Add-on name').fill('Stencilled frieze');
  await addOn.getByLabel('Labour hours').fill('4');
  await addOn.getByLabel('Materials cost').fill('30');
  await page.getByRole('button', { name: 'Save estimate' }).click();
  await expect(page.getByText('All changes saved')).toBeVisible();

  const estimateUrl = page.url();
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sample boards' }).click();
  await page.getByRole('link', { name: 'New sample board' }).click();
  await page.getByLabel('Client').fill('Hattie');
  await page.getByRole('option', { name: /Hattie Brambleton/ }).click();
  await page.getByLabel('Finish system').click();
  await page.getByRole('option', { name: 'Two-coat limewash' }).click();
  await page.getByLabel('Label').fill('Limewash, warm white, round 1');
  await page.getByRole('button', { name: 'Make the board' }).click();
  await expect(page.getByRole('heading', { name: /Limewash, warm white/ })).toBeVisible();
  await page.getByRole('button', { name: 'Show to the client' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Show to the client' }).click();
  await expect(page.getByText('With the client').first()).toBeVisible();
  await page.goto(estimateUrl);

  await page.getByRole('link', { name: 'Proposals for this estimate' }).click();
  await page.getByRole('button', { name: 'Make a proposal' }).click();
  await page.getByRole('button', { name: 'Create version' }).click();
  const version = page.getByRole('article', { name: 'Version 1' });
  await expect(version.getByRole('link', { name: 'Download PDF' })).toBeVisible();
  await version.getByRole('button', { name: 'Send to client' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Send', exact: true }).click();
  await expect(page.getByRole('status').filter({ hasText: /sent to/ })).toBeVisible();

  const mail = await waitForMail('hattie@brambleton.example', /sent you a proposal/);
  const client = await browser.newContext();
  const portal = await client.newPage();
  await portal.goto(linkFrom(mail).replace('http://localhost:4310', ''));
  await expect(portal).toHaveURL(/\/portal\/proposals\/[0-9a-f-]+$/);
  await expect(portal.getByRole('heading', { name: /Sitting room plaster/ }).first()).toBeVisible();
  const proposalUrl = portal.url();

  // The client approves the sample board first: the finish is sold by the board.
  await portal.goto('/portal/boards');
  await portal
    .getByRole('list', { name: 'Sample boards' })
    .getByRole('link', { name: /Limewash, warm white/ })
    .click();
  await portal.getByRole('button', { name: 'Approve this board' }).click();
  await portal.getByRole('button', { name: 'Yes, approve this board' }).click();
  await expect(portal.getByText(/You approved this board on/)).toBeVisible();
  await portal.screenshot({ path: 'e2e/.artifacts/portal-board.png', fullPage: true });
  await portal.goto(proposalUrl);
  await portal.getByRole('radio', { name: /Option B: limewash/ }).check();
  const agreed = portal.locator('.agreed-total');
  const optionOnly = await agreed.textContent();
  await portal.getByRole('checkbox', { name: /Stencilled frieze/ }).check();
  // The total grows by the add-on, and the later payments that carry it are listed before signing.
  await expect(agreed).not.toHaveText(optionOnly!);
  await expect(portal.getByText('Your deposit stays as shown')).toBeVisible();
  await portal.getByLabel('Your full name').fill('Hattie Brambleton');
  await portal.getByLabel('I accept this proposal and its terms.').check();
  await portal.screenshot({ path: 'e2e/.artifacts/portal-proposal.png', fullPage: true });
  await portal.getByRole('button', { name: 'Accept this proposal' }).click();
  await expect(portal.getByText(/Accepted by Hattie Brambleton/)).toBeVisible();
  // The document above the form (left dehydrated while it was only read) wakes up to mark the choice.
  await expect(portal.getByRole('article', { name: /Option B: limewash/ })).toContainText('Your choice');
  await expect(portal.getByRole('article', { name: /Option A/ })).not.toContainText('Your choice');
  await expect(portal.getByRole('region', { name: 'Add-ons you can choose' })).toContainText('Your choice');
  await client.close();

  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Jobs' }).click();
  await page
    .getByRole('link', { name: /Sitting room plaster/ })
    .first()
    .click();
  await expect(page.getByText('Option B: limewash + Stencilled frieze', { exact: true })).toBeVisible();
  // The job page's schedule editor (features/jobs/billing) checks the draft against the contract sum in words.
  const schedule = page.getByRole('form', { name: 'Payment schedule' });
  await expect(schedule).toContainText('The lines add up to the contract sum');
  await page.screenshot({ path: 'e2e/.artifacts/job.png', fullPage: true });
});
