import { expect, type Page, test } from '@playwright/test';

async function signInAsOffice(page: Page) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('office@fernhollow.example');
  await page.getByLabel('Password', { exact: true }).fill('limewash-demo-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/today$/);
}

/** Sizes are typed into the named fields; sketches also carry the numbers in their labels. */
const field = (page: Page, name: string) =>
  page.getByRole('textbox', { name, exact: true }).or(page.getByRole('spinbutton', { name, exact: true }));

// Journey (takeoff → proposals): the office measures a round room with a turret ceiling and prices it two ways.
test('the office measures a round room with a turret ceiling and builds an estimate with two options', async ({ page }) => {
  await signInAsOffice(page);
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Clients' }).click();
  // On the list before choosing her: Today can name her too (an invoice ready to bill), and a click
  // there, before the list is shown, would open that invoice instead.
  await expect(page).toHaveURL(/\/clients$/);
  await page.getByRole('main').getByRole('link', { name: 'Hattie Brambleton' }).first().click();
  await page
    .getByRole('link', { name: /^Measure rooms/ })
    .first()
    .click();
  await expect(page.getByRole('heading', { name: 'Measure rooms' })).toBeVisible();

  await page.getByRole('button', { name: 'Add a room' }).click();
  await page.getByLabel('Room name').fill('Turret study');
  await page.getByRole('button', { name: 'Add room' }).click();
  const room = page
    .getByRole('region', { name: /Turret study/ })
    .or(page.locator('mat-expansion-panel', { hasText: 'Turret study' }))
    .first();
  await expect(room).toBeVisible();

  // Round walls: r 6 ft, H 9 ft → 2π·6·9 = 339.29 ft² (DOMAIN.md §2.2, round room wall 2πrH).
  await room.getByRole('button', { name: 'Add a surface' }).click();
  await page.getByRole('combobox', { name: 'Shape' }).click();
  await page.getByRole('option', { name: 'Round room walls (all the way round)' }).click();
  await page.getByLabel('Surface name').fill('Study walls');
  await field(page, 'Radius').fill('6');
  await field(page, 'Wall height').fill('9');
  await expect(page.getByRole('status').filter({ hasText: '339.29' })).toBeVisible();
  await page.getByRole('button', { name: 'Save surface' }).click();
  await expect(page.getByRole('article', { name: 'Study walls' })).toContainText('339.29');

  // Turret cone: r 6, rise 8 → slant 10, π·6·10 = 188.50 ft² (lateral area πrs, Pearson Geometry §11-3).
  await room.getByRole('button', { name: 'Add a surface' }).click();
  await page.getByRole('combobox', { name: 'Shape' }).click();
  await page.getByRole('option', { name: 'Turret ceiling, cone' }).click();
  await page.getByLabel('Surface name').fill('Turret ceiling');
  await field(page, 'Radius at the base').fill('6');
  await field(page, 'Rise').fill('8');
  await expect(page.getByRole('status').filter({ hasText: '188.5' })).toBeVisible();
  await page.getByRole('button', { name: 'Save surface' }).click();
  await expect(page.getByRole('article', { name: 'Turret ceiling' })).toContainText('188.5');
  await page.screenshot({ path: 'e2e/.artifacts/takeoff.png', fullPage: true });

  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Estimates' }).click();
  await page.getByRole('link', { name: 'New estimate' }).click();
  await page.getByLabel('Client').fill('Hattie');
  await page.getByRole('option', { name: /Hattie Brambleton/ }).click();
  await page.getByLabel('Site').click();
  await page.getByRole('option').first().click();
  await page.getByLabel('Estimate title').fill('Turret study finishes');
  await page.getByRole('button', { name: 'Create estimate' }).click();
  await expect(page).toHaveURL(/\/estimates\/[0-9a-f-]+$/);

  const study = page.getByRole('group', { name: 'Turret study' });
  await study.getByLabel('Same finish for the whole room').click();
  await page.getByRole('option', { name: 'Layered lime plaster, burnished and waxed' }).click();
  await expect(page.getByTestId('price')).not.toBeEmpty();
  await page.getByRole('button', { name: 'Add an option' }).click();
  await page.getByRole('tabpanel').getByLabel('Option name').fill('Option B: limewash');
  await page.getByRole('tabpanel').getByRole('group', { name: 'Turret study' }).getByLabel('Same finish for the whole room').click();
  await page.getByRole('option', { name: 'Two-coat limewash' }).click();
  await page.getByRole('button', { name: 'Save estimate' }).click();
  await expect(page.getByText('Saved — these are the figures on record.')).toBeVisible();
  await expect(page.getByText('All changes saved')).toBeVisible();
  await page.screenshot({ path: 'e2e/.artifacts/estimate-builder.png', fullPage: true });

  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Estimates' }).click();
  await expect(page.getByRole('table', { name: 'Estimates' })).toContainText('Turret study finishes');
});
