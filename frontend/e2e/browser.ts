import { mkdirSync } from 'node:fs';
import { chromium, type Browser, type Page } from 'playwright-core';
import { ARTIFACTS_DIR, CHROMIUM_ARGS, CHROMIUM_PATH, E2E_BASE_URL } from './e2e-config';

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS, headless: true });
}

/** A fresh page that records uncaught page errors so a test can assert there were none. */
export async function newPage(browser: Browser): Promise<{ page: Page; pageErrors: string[] }> {
  const context = await browser.newContext({ baseURL: E2E_BASE_URL, viewport: { width: 1440, height: 1000 } });
  const page = await context.newPage();
  const pageErrors: string[] = [];
  page.on('pageerror', (error) => pageErrors.push(error.message));
  return { page, pageErrors };
}

export async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto('/login');
  await page.getByLabel(/E-mail/).fill(email);
  await page.getByLabel(/Password/).fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL('**/farms');
}

/** From the farms list, opens the first farm and its first house; returns the house URL. */
export async function openFirstHouse(page: Page): Promise<string> {
  await page.getByRole('grid', { name: 'Farms' }).getByRole('link').first().click();
  await page.waitForURL(/\/farms\/\d+$/);
  await page.getByRole('grid', { name: 'Houses' }).getByRole('link').first().click();
  await page.waitForURL(/\/houses\/\d+$/);
  await widthInput(page).waitFor();
  return page.url();
}

export function widthInput(page: Page) {
  return page.getByRole('textbox', { name: /Width of one span/ });
}

export async function saveScreenshot(page: Page, fileName: string): Promise<string> {
  mkdirSync(ARTIFACTS_DIR, { recursive: true });
  const path = `${ARTIFACTS_DIR}/${fileName}`;
  await page.screenshot({ path, fullPage: true });
  return path;
}
