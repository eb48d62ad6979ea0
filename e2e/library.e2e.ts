import { expect, type Page, test } from '@playwright/test';
import { DEMO, navLink, signIn } from './support/people';
import { onPhone, openLiveOnPhone } from './support/phone';

const PRODUCT = 'Slaked lime finishing plaster';
const SYSTEM = 'Three-coat polished lime';

/** A Material select, opened by its label and set to the option a person reads. */
async function choose(page: Page, scope: ReturnType<Page['locator']> | Page, label: string, option: string | RegExp) {
  await scope.getByRole('combobox', { name: label, exact: true }).click();
  await page.getByRole('option', { name: option }).click();
}

// Journey (library): a new product with its container sizes and prices, then a three-layer system using it.
test('the office adds a product with container sizes and prices, then a three-layer finish system that uses it', async ({
  page,
  browser,
}) => {
  await signIn(page, DEMO.office);
  await navLink(page, 'Finish library').click();
  // The two halves of the library are tab links, each with its own address.
  await page.getByRole('tab', { name: 'Products' }).click();
  await expect(page).toHaveURL(/\/library\/products$/);

  await page.getByRole('button', { name: 'Add a product' }).click();
  const form = page.getByRole('form', { name: 'New product' });
  await form.getByLabel('Product name').fill(PRODUCT);
  await choose(page, form, 'Kind of product', 'Lime (putty, wash)');
  await choose(page, form, 'Counted in', 'kilogram (kg)');
  const bag = form.getByRole('group', { name: 'Container 1' });
  await bag.getByLabel('Container name').fill('25 kg bag');
  await bag.getByLabel('Size', { exact: true }).fill('25');
  await choose(page, bag, 'Size unit', 'kilogram (kg)');
  await bag.getByLabel('Price').fill('68.50');
  await form.getByRole('button', { name: 'Add a container size' }).click();
  const pail = form.getByRole('group', { name: 'Container 2' });
  await pail.getByLabel('Container name').fill('5 kg pail');
  await pail.getByLabel('Size', { exact: true }).fill('5');
  await choose(page, pail, 'Size unit', 'kilogram (kg)');
  await pail.getByLabel('Price').fill('17.25');
  await form.getByLabel('Contains lime (caustic: goggles and gloves)').check();
  await form.getByRole('button', { name: 'Add product' }).click();

  const productRow = page.getByRole('table', { name: 'Products' }).getByRole('row', { name: new RegExp(PRODUCT) });
  await expect(productRow).toContainText('25 kg bag');
  await expect(productRow).toContainText('68.50');
  await expect(productRow).toContainText('5 kg pail');
  await expect(productRow).toContainText('17.25');
  await page.screenshot({ path: 'e2e/.artifacts/library-products.png', fullPage: true });

  await page.getByRole('tab', { name: 'Finish systems' }).click();
  await page.getByRole('link', { name: 'New finish system' }).click();
  await expect(page.getByRole('heading', { name: 'New finish system' })).toBeVisible();
  // A new system opens with one empty layer once the products are loaded; text typed before then
  // is wiped when the form is reset (reported), so wait for that layer first.
  await expect(page.getByRole('region', { name: 'Layer 1' })).toBeVisible();
  await page.getByLabel('Finish system name').fill(SYSTEM);
  await page.getByLabel('Description').fill('Bonding primer, a lime body coat, then two thin finish coats troweled tight and polished.');

  const layers: Array<{ name: string; method: string; product: RegExp; coverage?: string; coats?: string; wait: string }> = [
    { name: 'Mineral bonding primer', method: 'Roll', product: /^Sanded bonding primer/, wait: '4 h' },
    { name: 'Lime body coat', method: 'Trowel', product: new RegExp(`^${PRODUCT}`), coverage: '9', wait: 'overnight (16 h)' },
    { name: 'Polished finish coats', method: 'Trowel', product: new RegExp(`^${PRODUCT}`), coverage: '30', coats: '2', wait: '24 h' },
  ];
  // Each further layer is added.
  for (const [i, layer] of layers.entries()) {
    if (i > 0) await page.getByRole('button', { name: 'Add a layer' }).click();
    const card = page.getByRole('region', { name: new RegExp(`^Layer ${i + 1}\\b`) });
    await card.getByLabel('Layer name').fill(layer.name);
    await choose(page, card, 'Method', layer.method);
    await choose(page, card, 'Product', layer.product);
    if (layer.coverage) {
      // Lime is sold by weight: the spread rate is surface per kilogram.
      await card.getByLabel('Surface one unit covers').fill(layer.coverage);
      await choose(page, card, 'Product unit', 'kilogram (kg)');
    }
    if (layer.coats) await card.getByLabel('Coats', { exact: true }).fill(layer.coats);
    await card
      .getByRole('group', { name: /^Quick waits for/ })
      .getByRole('button', { name: layer.wait, exact: true })
      .click();
    await expect(page.getByRole('region', { name: `Layer ${i + 1}: ${layer.name}` })).toBeVisible();
  }
  await expect(page.getByText('3 layers · total wait')).toBeVisible();
  await page.getByRole('button', { name: 'Add finish system' }).click();
  // Saved: the editor moves to the system's own address (the "Saved" note does not survive that move).
  await expect(page).toHaveURL(/\/library\/systems\/[0-9a-f-]+$/);
  await expect(page.getByRole('heading', { level: 1, name: SYSTEM })).toBeVisible();

  await page.getByRole('main').getByRole('link', { name: 'Finish library' }).click();
  const systemRow = page.getByRole('table', { name: 'Finish systems' }).getByRole('row', { name: new RegExp(SYSTEM) });
  await expect(systemRow).toBeVisible();
  await expect(systemRow.getByRole('cell').first()).toHaveText('3');
  await expect(systemRow).toContainText(PRODUCT);
  await expect(systemRow).toContainText('Sanded bonding primer');
  await page.screenshot({ path: 'e2e/.artifacts/library-systems.png', fullPage: true });

  const { phone, context } = await onPhone(browser, page);
  await openLiveOnPhone(phone, '/library');
  const phoneRow = phone.getByRole('table', { name: 'Finish systems' }).getByRole('row', { name: new RegExp(SYSTEM) });
  await expect(phoneRow).toBeVisible();
  await phone.screenshot({ path: 'e2e/.artifacts/phone-library.png' });
  await phoneRow.getByRole('link', { name: SYSTEM }).click();
  await expect(phone.getByRole('region', { name: 'Layer 3: Polished finish coats' })).toBeVisible();
  await phone.screenshot({ path: 'e2e/.artifacts/phone-finish-system.png' });
  await context.close();
});
