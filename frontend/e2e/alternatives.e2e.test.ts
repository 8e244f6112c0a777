import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, saveScreenshot, signIn } from './browser';
import { DEMO_GROWER, E2E_BASE_URL } from './e2e-config';

const DEMO_ADVISER = { email: 'adviser@example.com', password: 'thermbay-demo' };

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

async function openPage(viewport: { width: number; height: number }) {
  const context = await browser.newContext({ baseURL: E2E_BASE_URL, viewport });
  const page = await context.newPage();
  const pageErrors: string[] = [];
  page.on('pageerror', (error) => pageErrors.push(error.message));
  return { page, pageErrors };
}

async function openHouse(page: Page, namePrefix: string): Promise<void> {
  await page.getByRole('grid', { name: 'Farms' }).getByRole('link').first().click();
  await page.waitForURL(/\/farms\/\d+$/);
  await page
    .getByRole('grid', { name: 'Houses' })
    .getByRole('link', { name: new RegExp(`^${namePrefix}`) })
    .click();
  await page.waitForURL(/\/houses\/\d+$/);
  await page.getByRole('textbox', { name: /Width of one span/ }).waitFor();
}

async function chooseOption(page: Page, field: string, option: RegExp): Promise<void> {
  await page.getByRole('combobox', { name: field }).click();
  await page.getByRole('option', { name: option }).click();
}

async function noSidewaysScroll(page: Page): Promise<{ scrollWidth: number; innerWidth: number }> {
  return page.evaluate(() => ({ scrollWidth: document.documentElement.scrollWidth, innerWidth: window.innerWidth }));
}

function cell(page: Page, row: string, column: 'house' | 'alternative') {
  const selector = column === 'house' ? '[data-column="house"]' : '[data-column^="alternative-"]';
  return page.locator(`[data-row="${row}"] ${selector}`).last();
}

for (const viewport of [
  { width: 1440, height: 1000, label: 'desktop' },
  { width: 390, height: 844, label: 'phone' },
]) {
  describe(`the grower's re-covering decision (${viewport.label}, ${viewport.width} px)`, () => {
    it('saves inflated double poly on House B as an alternative with a cost and reads it side by side', async () => {
      const { page, pageErrors } = await openPage(viewport);
      await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
      await openHouse(page, 'House B');
      const houseUrl = page.url();
      if (viewport.width < 600) expect((await noSidewaysScroll(page)).scrollWidth).toBeLessThanOrEqual(viewport.width);

      const doublePoly = /^Inflated double polyethylene \(/;
      await chooseOption(page, 'Roof covering', doublePoly);
      await chooseOption(page, 'Sidewalls covering', doublePoly);
      // the sticky summary follows the edits
      await page.getByRole('region', { name: 'Design-night summary' }).getByText('With your edits:').waitFor();

      // leaving with unsaved edits asks first, and staying keeps them
      await page.getByRole('navigation', { name: 'Breadcrumb' }).getByRole('link').nth(1).click();
      await page.getByRole('dialog', { name: 'Leave without saving?' }).waitFor();
      await page.getByRole('button', { name: 'Cancel' }).click();
      expect(page.url()).toBe(houseUrl);
      await expect
        .poll(() => page.getByRole('combobox', { name: 'Roof covering' }).textContent())
        .toMatch(/^Inflated double polyethylene \(/);

      const name = `Double poly (${viewport.label})`;
      await page.getByRole('button', { name: 'Save as alternative' }).click();
      const dialog = page.getByRole('dialog', { name: 'Save as alternative' });
      await dialog.getByRole('textbox', { name: /Name of the alternative/ }).fill(name);
      await dialog.getByRole('textbox', { name: /Installed cost/ }).fill('4200');
      await dialog.getByRole('button', { name: 'Save alternative' }).click();
      await dialog.waitFor({ state: 'detached' });
      const section = page.getByRole('region', { name: 'Alternatives' });
      await section.getByText(name, { exact: true }).waitFor();
      await expect.poll(() => section.textContent()).toMatch(/cost \$4,200/); // the demo farm pays in US dollars
      // the form is back to the house as it is: nothing unsaved, leaving does not ask
      await expect
        .poll(() => page.getByRole('combobox', { name: 'Roof covering' }).textContent())
        .toMatch(/^Single polyethylene/);

      await section.getByRole('link', { name: /Compare side by side/ }).click();
      await page.waitForURL(/\/side-by-side/);
      await page.getByRole('table', { name: /side by side/ }).waitFor({ timeout: 60_000 });
      await page.getByRole('columnheader', { name: new RegExp(name.replace(/[()]/g, '\\$&')) }).waitFor();

      const saving = await cell(page, 'saving', 'alternative').innerText();
      const payback = await cell(page, 'payback', 'alternative').innerText();
      const lightRoof = await cell(page, 'light-roof', 'alternative').innerText();
      const houseVerdict = await cell(page, 'verdict', 'house').innerText();
      const altVerdict = await cell(page, 'verdict', 'alternative').innerText();
      expect(saving).toMatch(/^\$\d[\d,]*/);
      expect(Number(saving.split('\n')[0].replace(/[$,]/g, ''))).toBeGreaterThan(0);
      expect(payback).toMatch(/^\d+(\.\d)? years$/);
      expect(lightRoof).toMatch(/−\d+ % light vs house/);
      expect(houseVerdict).toMatch(/^(enough|short|none installed)$/);
      expect(altVerdict).toMatch(/^(enough|short|none installed)$/);

      if (viewport.width < 600) {
        const { scrollWidth, innerWidth } = await noSidewaysScroll(page);
        expect(scrollWidth).toBeLessThanOrEqual(innerWidth);
      }
      await saveScreenshot(page, `side-by-side-${viewport.label}.png`);
      expect(pageErrors).toEqual([]);
      await page.context().close();
    });
  });
}

describe('an adviser on a client house', () => {
  it('adds a bigger-heater proposal without edit rights on the house', async () => {
    const { page, pageErrors } = await openPage({ width: 1440, height: 1000 });
    await signIn(page, DEMO_ADVISER.email, DEMO_ADVISER.password);
    await openHouse(page, 'House A');
    expect(await page.getByRole('button', { name: 'Save house' }).count()).toBe(0);

    const units = page.getByRole('group', { name: 'Heater group 1' }).getByRole('textbox', { name: /^Units/ });
    const count = Number(await units.inputValue());
    await units.fill(String(count + 2));
    await page.getByRole('button', { name: 'Save as alternative' }).click();
    const dialog = page.getByRole('dialog', { name: 'Save as alternative' });
    await dialog.getByRole('textbox', { name: /Name of the alternative/ }).fill('Two more heaters (proposal)');
    await dialog.getByRole('button', { name: 'Save alternative' }).click();
    await dialog.waitFor({ state: 'detached' });
    const section = page.getByRole('region', { name: 'Alternatives' });
    await section.getByText('Two more heaters (proposal)', { exact: true }).waitFor();
    await expect.poll(() => section.textContent()).toMatch(/Changes heaters.*by Ada/);
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });
});
