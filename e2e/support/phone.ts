import type { Browser, BrowserContext, Page } from '@playwright/test';

export const PHONE = { width: 390, height: 844 } as const;

/**
 * The same signed-in person on a phone-sized screen: a fresh context with the page's cookies, so
 * the layout is the one a phone loads (not a desktop window squeezed mid-animation).
 */
export async function onPhone(browser: Browser, page: Page): Promise<{ phone: Page; context: BrowserContext }> {
  const context = await browser.newContext({ viewport: PHONE, storageState: await page.context().storageState() });
  return { phone: await context.newPage(), context };
}
