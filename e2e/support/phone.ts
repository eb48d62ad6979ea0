import { expect, type Browser, type BrowserContext, type Page } from '@playwright/test';

export const PHONE = { width: 390, height: 844 } as const;

/**
 * The same signed-in person on a phone-sized screen: a fresh context with the page's cookies, so
 * the layout is the one a phone loads (not a desktop window squeezed mid-animation).
 */
export async function onPhone(browser: Browser, page: Page): Promise<{ phone: Page; context: BrowserContext }> {
  // The admin's service worker fetches the whole app once installed, so the network would never go idle
  // while these journeys walk every page; the offline journey (crew-sheet.e2e.ts) runs with it.
  const context = await browser.newContext({ viewport: PHONE, storageState: await page.context().storageState(), serviceWorkers: 'block' });
  return { phone: await context.newPage(), context };
}

/** Opens a page and waits until the browser has taken it over from the server-rendered copy. */
export async function openLive(page: Page, path: string): Promise<void> {
  await page.goto(path);
  await expect(page.locator('lb-root[data-live]')).toBeAttached();
}

/**
 * Opens an admin page on the phone and waits until it is live with its navigation folded behind
 * the menu button (the server renders the wide layout; the stylesheet hides its side navigation on
 * a phone until the app turns it into an overlay).
 */
export async function openLiveOnPhone(phone: Page, path: string): Promise<void> {
  await openLive(phone, path);
  await expect(phone.getByRole('button', { name: 'Open navigation' })).toBeVisible();
  await expect(phone.getByRole('navigation', { name: 'Main' })).toBeHidden();
}
