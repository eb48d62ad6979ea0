import { readFile } from 'node:fs/promises';
import { PDFParse } from 'pdf-parse';
import { expect, test, type Page } from '@playwright/test';
import { pathFrom, waitForMail } from './support/inbox';
import { DEMO } from './support/people';
import { PHONE, openLive } from './support/phone';

// Journey (portal, on a phone, in Spanish): the demo client signs in by an e-mailed link, chooses
// Spanish, and reads a proposal (its safety cautions too) and an invoice, on screen and as a PDF, in
// Spanish. Her choice is put back to the firm's language at the end, so later journeys read English.

const SHOTS = '/tmp/lb/shots';
/** Demo data (server/src/seed/demo-billing.ts): the stair hall proposal the client signed, and its invoices. */
const PROPOSAL = 'Stair hall lime plaster';

/** Back to the firm's language through the API (the same session), whatever happened in the journey. */
async function firmLanguageAgain(portal: Page): Promise<void> {
  const session = (await (await portal.request.get('/api/portal/session')).json()) as { csrfToken?: string };
  if (!session.csrfToken) return;
  await portal.request.patch('/api/portal/me/language', { data: { language: null }, headers: { 'x-csrf-token': session.csrfToken } });
}

test('the client chooses Spanish and reads a proposal and an invoice in Spanish, on screen and in the PDF', async ({ browser }) => {
  test.setTimeout(120_000);
  const context = await browser.newContext({ viewport: PHONE, acceptDownloads: true });
  const portal = await context.newPage();
  try {
    await portal.goto('/portal/sign-in');
    await portal.getByLabel('E-mail').fill(DEMO.client);
    await portal.getByRole('button', { name: 'E-mail me a sign-in link' }).click();
    await expect(portal.getByRole('status')).toContainText('Check your inbox');
    await openLive(portal, pathFrom(await waitForMail(DEMO.client, /sign-in link/i)));
    await expect(portal.getByRole('heading', { level: 1, name: 'Your projects' })).toBeVisible();

    // The language menu carries the current language's name; her choice is saved with her.
    await portal.getByRole('button', { name: 'English' }).click();
    await portal.getByRole('menuitemradio', { name: 'Español' }).click();
    await expect(portal.getByRole('heading', { level: 1, name: 'Sus proyectos' })).toBeVisible();
    // The server renders her pages in Spanish from then on: no English first, then Spanish. (Switching in
    // the browser leaves <html lang> as the server wrote it until the next page load; the server's is checked.)
    const rendered = await (await portal.request.get('/portal/projects')).text();
    expect(rendered).toContain('lang="es"');
    expect(rendered).toContain('Sus proyectos');
    await openLive(portal, '/portal/projects');
    await expect(portal.locator('html')).toHaveAttribute('lang', 'es');
    await expect(portal.getByRole('heading', { level: 1, name: 'Sus proyectos' })).toBeVisible();
    await portal.screenshot({ path: `${SHOTS}/portal-es-projects.png`, fullPage: true });

    // A proposal: the document's headings and the engine's cautions (lime is caustic; the standing line) in Spanish.
    await portal
      .getByRole('link', { name: new RegExp(PROPOSAL) })
      .first()
      .click();
    await expect(portal).toHaveURL(/\/portal\/proposals\/[0-9a-f-]+$/);
    await expect(portal.getByRole('heading', { name: 'Seguridad y cumplimiento' })).toBeVisible();
    const safety = portal.getByRole('region', { name: 'Seguridad y cumplimiento' });
    await expect(safety.getByRole('heading', { name: 'La cal es cáustica' })).toBeVisible();
    await expect(safety).toContainText('Siga los códigos locales, la hoja de datos de seguridad del producto');
    await expect(portal.getByRole('link', { name: 'Descargar su copia firmada (PDF)' })).toBeVisible();
    await portal.screenshot({ path: `${SHOTS}/portal-es-proposal.png`, fullPage: true });

    // An invoice: the list, one invoice, and its PDF in Spanish.
    await portal.getByRole('navigation', { name: 'Sus páginas' }).getByRole('link', { name: 'Sus facturas' }).click();
    await expect(portal.getByRole('heading', { level: 1, name: 'Sus facturas' })).toBeVisible();
    await portal.screenshot({ path: `${SHOTS}/portal-es-invoices.png`, fullPage: true });
    await portal
      .getByRole('link', { name: /^INV-\d+$/ })
      .first()
      .click();
    const heading = portal.getByRole('heading', { level: 1, name: /^Factura INV-\d+$/ });
    await expect(heading).toBeVisible();
    const number = (await heading.textContent())!.replace('Factura', '').trim();
    await portal.screenshot({ path: `${SHOTS}/portal-es-invoice.png`, fullPage: true });
    const downloading = portal.waitForEvent('download');
    await portal.getByRole('link', { name: 'Descargar el PDF' }).click();
    const pdf = await readFile(await (await downloading).path());
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const parser = new PDFParse({ data: pdf });
    const { text } = await parser.getText();
    await parser.destroy();
    expect(text).toContain(number);
    expect(text).toContain('FACTURAR A');
    expect(text).toContain('Vence');

    // Back to the firm's language from the same menu.
    await portal.getByRole('button', { name: 'Español' }).click();
    await portal.getByRole('menuitemradio', { name: 'Igual que Fernhollow Plaster & Glaze (English)' }).click();
    await expect(portal.getByRole('heading', { level: 1, name: `Invoice ${number}` })).toBeVisible();
    // and the menu marks that choice: following the firm, not English chosen
    await portal.getByRole('button', { name: 'English' }).click();
    await expect(portal.getByRole('menuitemradio', { name: 'Same as Fernhollow Plaster & Glaze (English)' })).toHaveAttribute(
      'aria-checked',
      'true',
    );
    await portal.keyboard.press('Escape');
  } finally {
    await firmLanguageAgain(portal);
    await context.close();
  }
});
