import { expect, type Browser, type BrowserContext, type Page } from '@playwright/test';

export const PHONE = { width: 390, height: 844 } as const;

/**
 * The same signed-in person on a phone-sized screen: a fresh context with the page's cookies, so
 * the layout is the one a phone loads (not a desktop window squeezed mid-animation).
 */
export async function onPhone(browser: Browser, page: Page): Promise<{ phone: Page; context: BrowserContext }> {
  const context = await browser.newContext({ viewport: PHONE, storageState: await page.context().storageState() });
  return { phone: await context.newPage(), context };
}

/**
 * Opens an admin page on the phone and waits until it is live: the browser has read `api` itself
 * (the server-rendered copy is replaced once the app starts) and the shell has folded its
 * navigation behind the menu button (the server renders it open, not knowing the screen size).
 */
export async function openLiveOnPhone(phone: Page, path: string, api: string): Promise<void> {
  const read = phone.waitForResponse((r) => new URL(r.url()).pathname === api && r.request().method() === 'GET');
  await phone.goto(path);
  expect((await read).ok()).toBe(true);
  await expect(phone.getByRole('button', { name: 'Open navigation' })).toBeVisible();
  await expect(phone.getByRole('navigation', { name: 'Main' })).toBeHidden();
}
