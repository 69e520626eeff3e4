import { mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { Browser, BrowserContext, Page } from '@playwright/test';

export const TABLET = { width: 1024, height: 768 };
export const PHONE = { width: 390, height: 844 };

const ARTIFACTS = fileURLToPath(new URL('./artifacts/screenshots/', import.meta.url));
mkdirSync(ARTIFACTS, { recursive: true });

/** Saves a full-page screenshot with the test output (apps/web/e2e/artifacts/screenshots). */
export async function snap(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: `${ARTIFACTS}${name}.png`, fullPage: true });
}

export async function device(browser: Browser, size: typeof TABLET, touch = false): Promise<BrowserContext> {
  return browser.newContext({ viewport: size, hasTouch: touch, isMobile: touch, deviceScaleFactor: 1 });
}

let n = 0;
/** An e-mail no other test run has used. */
export const uniqueEmail = (who: string) => `${who}-${Date.now()}-${++n}@browser.test`;

export async function register(page: Page, name: string, email: string, password = 'a long kitchen password') {
  await page.getByLabel('Your name').fill(name);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Create account' }).click();
}
