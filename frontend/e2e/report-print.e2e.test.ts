import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, saveScreenshot, signIn } from './browser';

const DEMO_PASSWORD = 'thermbay-demo';
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const ALTERNATIVES: Array<[string, Record<string, unknown>]> = [
  ['Aluminised energy screen drawn every night of the season', { curtainId: 'energy-screen-aluminised' }],
  ['Twin-wall polycarbonate endwalls', { coverings: { endwalls: 'polycarbonate-twin-8mm' } }],
  ['Night setpoint lowered to 13 °C', { setpoints: { nightHeatingC: 13 } }],
  ['Insulated perimeter and a tighter house', { perimeterInsulated: true }],
];

/** Each caution the report must carry on paper (the standing list in backend report-document.ts). */
const CAUTIONS = [/^Combustion air:/, /^Venting:/, /^Carbon monoxide:/, /^Ethylene injury:/, /^Installation:/];

async function visibleCount(locator: Locator): Promise<number> {
  let visible = 0;
  for (const item of await locator.all()) if (await item.isVisible()) visible += 1;
  return visible;
}

/**
 * Per table of the report: rows drawn, and whether any column is cut off (scrolled inside its
 * frame, or past the right edge of the page).
 */
async function tableLayout(page: Page) {
  return page.getByRole('article', { name: 'Report' }).evaluate((article) => {
    const pageWidth = document.documentElement.clientWidth;
    return [...article.querySelectorAll('table')].map((table) => {
      const frame = table.parentElement!;
      const rows = [...table.querySelectorAll('tr')];
      return {
        rows: rows.length,
        rowsDrawn: rows.filter((row) => row.getBoundingClientRect().height > 0).length,
        cutOff: frame.scrollWidth > frame.clientWidth + 1 || table.getBoundingClientRect().right > pageWidth + 1,
      };
    });
  });
}

describe('the printed report', () => {
  it('prints the report alone: no app bar, navigation, buttons or form; every table whole; the cautions there', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, 'adviser@example.com', DEMO_PASSWORD);
    await page.getByRole('region', { name: 'Your client farms' }).getByRole('link').first().click();
    await page.waitForURL(/\/farms\/\d+$/);
    await page.getByRole('grid', { name: 'Houses' }).getByRole('link').first().click();
    await page.waitForURL(/\/houses\/\d+$/);
    // four saved alternatives with long names: the widest comparison a report prints
    const houseId = Number(/\/houses\/(\d+)$/.exec(page.url())?.[1]);
    const login = await page.request.post('/api/auth/login', {
      data: { email: 'adviser@example.com', password: DEMO_PASSWORD },
    });
    const headers = { Authorization: `Bearer ${(await login.json()).accessToken}` };
    for (const [name, patch] of ALTERNATIVES) {
      const created = await page.request.post(`/api/houses/${houseId}/alternatives`, {
        headers,
        data: { name, patch, costAmount: 12_500 },
      });
      expect(created.status()).toBe(201);
    }
    await page.getByRole('textbox', { name: 'Report title' }).fill('Print check (browser test)');
    await page.getByRole('button', { name: 'Create report' }).click();
    await page.waitForURL(/\/reports\/\d+$/);
    await page.getByRole('heading', { name: 'Print check (browser test)', level: 1 }).waitFor();
    const report = page.getByRole('article', { name: 'Report' });
    await report.getByRole('table').first().waitFor();

    // On screen the chrome is there (so the checks below can fail) ...
    const chrome = {
      appBar: page.getByRole('banner'),
      mainNavigation: page.getByRole('navigation', { name: 'Main' }),
      breadcrumb: page.getByRole('navigation', { name: 'Breadcrumb' }),
      printButton: page.getByRole('button', { name: 'Print' }),
      notesField: page.getByRole('textbox', { name: 'Notes' }),
    };
    for (const [what, locator] of Object.entries(chrome))
      expect([what, await locator.isVisible()]).toEqual([what, true]);
    const onScreen = await tableLayout(page);
    expect(onScreen.length).toBeGreaterThanOrEqual(3);

    // ... and in print it is gone, while the report stays whole, at the width of an A4 sheet
    // inside 10 mm margins (190 mm = 718 CSS px; a Letter sheet is wider).
    await page.emulateMedia({ media: 'print' });
    await page.setViewportSize({ width: 718, height: 1000 });
    for (const [what, locator] of Object.entries(chrome))
      expect([what, await locator.isVisible()]).toEqual([what, false]);
    expect(await visibleCount(page.getByRole('button'))).toBe(0);
    expect(await visibleCount(page.getByRole('textbox'))).toBe(0);
    expect(await report.isVisible()).toBe(true);
    await report.getByRole('heading', { name: 'Print check (browser test)', level: 1 }).waitFor();

    const printed = await tableLayout(page);
    expect(printed.map((t) => t.rows)).toEqual(onScreen.map((t) => t.rows));
    for (const table of printed) expect(table).toEqual({ rows: table.rows, rowsDrawn: table.rows, cutOff: false });

    // the house and its four alternatives: one table, every column on the sheet
    const comparison = report.getByRole('region', { name: 'Alternatives compared' }).getByRole('table');
    expect(await comparison.getByRole('columnheader').allTextContents()).toEqual([
      '',
      expect.stringMatching(/ as it is$/),
      ...ALTERNATIVES.map(([name]) => name),
    ]);
    const edges = await comparison.evaluate((table) => {
      const right = Math.max(...[...table.querySelectorAll('th, td')].map((c) => c.getBoundingClientRect().right));
      return { right, page: document.documentElement.clientWidth };
    });
    expect(edges.right).toBeLessThanOrEqual(edges.page);

    const safety = report.getByRole('region', { name: 'Safety' });
    const cautions = (await safety.getByRole('listitem').allTextContents()).map((text) => text.trim());
    for (const caution of CAUTIONS) expect(cautions.filter((text) => caution.test(text))).toHaveLength(1);
    expect(await safety.isVisible()).toBe(true);
    await saveScreenshot(page, 'report-print.png');

    // Chromium's own print of the page: a PDF of more than one page.
    const pdf = await page.pdf({ format: 'A4', printBackground: true });
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const pageCount = Number(/\/Type\s*\/Pages[^>]*\/Count (\d+)/.exec(pdf.toString('latin1'))?.[1]);
    expect(pageCount).toBeGreaterThan(1);
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });
});
