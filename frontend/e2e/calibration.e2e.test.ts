import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, saveScreenshot, signIn } from './browser';
import { DEMO_GROWER, E2E_BASE_URL } from './e2e-config';

const DEMO_OWNER = { email: 'owner@example.com', password: DEMO_GROWER.password };

// Last winter's five propane deliveries (invented), each from the day after the previous fill.
const DELIVERIES: Array<[string, string]> = [
  ['2025-11-01', '2025-11-30'],
  ['2025-12-01', '2026-01-04'],
  ['2026-01-05', '2026-02-01'],
  ['2026-02-02', '2026-03-01'],
  ['2026-03-02', '2026-03-31'],
];

let browser: Browser;
let token: string;
let farmId: number;
let houseNames: string[];
let gallons: number[];

async function api<T>(method: string, path: string, body?: unknown): Promise<T> {
  const response = await fetch(`${E2E_BASE_URL}${path}`, {
    method,
    headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!response.ok) throw new Error(`${method} ${path}: ${response.status} ${await response.text()}`);
  return (await response.json()) as T;
}

beforeAll(async () => {
  browser = await launchBrowser();
  // Setting the scene through the API: the demo farm gets a second propane house (a copy of
  // House A), and the deliveries are what the model says the two burnt, × 1.25 (invented).
  const login = await fetch(`${E2E_BASE_URL}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify(DEMO_OWNER),
  });
  token = ((await login.json()) as { accessToken: string }).accessToken;
  farmId = (await api<Array<{ id: number }>>('GET', '/api/farms'))[0].id;
  const houses = await api<Array<{ id: number; name: string }>>('GET', `/api/farms/${farmId}/houses`);
  const houseA = houses.find((house) => house.name.startsWith('House A'))!;
  const stored = await api<Record<string, unknown>>('GET', `/api/houses/${houseA.id}`);
  const { id: _id, farmId: _farm, version: _v, createdAt: _c, updatedAt: _u, ...spec } = stored;
  const houseD = await api<{ id: number; name: string }>('POST', `/api/farms/${farmId}/houses`, {
    ...spec,
    name: 'House D – propane (invented)',
  });
  houseNames = [houseA.name, houseD.name];
  gallons = [];
  for (const [startDate, endDate] of DELIVERIES) {
    let total = 0;
    for (const house of [houseA, houseD]) {
      const season = await api<{ total: { fuelQuantityUs: number } }>('POST', `/api/houses/${house.id}/season`, {
        startDate,
        endDate,
      });
      total += season.total.fuelQuantityUs;
    }
    gallons.push(Math.round(total * 1.25));
  }
});

afterAll(async () => {
  await browser?.close();
});

async function useUsUnits(page: Page): Promise<void> {
  const button = page.getByRole('button', { name: 'US customary units' });
  if ((await button.getAttribute('aria-pressed')) !== 'true') await button.click();
  await expect.poll(() => button.getAttribute('aria-pressed')).toBe('true');
}

/** Types into one cell of the row being edited. */
async function fillCell(page: Page, rowId: string, field: string, value: string): Promise<void> {
  const input = page.locator(`[role="row"][data-id="${rowId}"] [data-field="${field}"] input`);
  await input.click();
  await input.fill(value);
}

describe('calibration against last winter’s fuel bills', () => {
  it('the owner enters five propane deliveries for two houses, calibrates, and sees the budget as calibrated', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_OWNER.email, DEMO_OWNER.password);
    await page.goto('/settings');
    await useUsUnits(page);

    // From the farm's budget tab to the fuel bills page
    await page.goto(`/farms/${farmId}?tab=season`);
    await page.getByRole('link', { name: 'Fuel bills and calibration' }).click();
    await page.waitForURL(/\/farms\/\d+\/fuel-records$/);
    await page.getByRole('heading', { name: 'Fuel bills and calibration', level: 1 }).waitFor();
    expect(await page.title()).toContain('Fuel bills and calibration');

    const grid = page.getByRole('grid', { name: 'Fuel bills and deliveries' });
    for (let index = 0; index < DELIVERIES.length; index++) {
      const rowId = `new-${index + 1}`;
      await page.getByRole('button', { name: 'Add a bill or delivery' }).click();
      const row = grid.locator(`[role="row"][data-id="${rowId}"]`);
      await row.waitFor();
      await fillCell(page, rowId, 'quantity', String(gallons[index]));
      if (index === 0) await fillCell(page, rowId, 'startDate', DELIVERIES[index][0]);
      // later rows start the day after the previous fill by themselves
      expect(await row.locator('[data-field="startDate"] input').inputValue()).toBe(DELIVERIES[index][0]);
      await fillCell(page, rowId, 'endDate', DELIVERIES[index][1]);
      if (index === 0) {
        // the tank serves both houses; later rows keep the houses of the previous one
        await row.locator('[data-field="houseIds"] [role="combobox"]').click();
        for (const name of houseNames) await page.getByRole('option', { name }).click();
        await page.keyboard.press('Escape');
      }
      await row.locator('[aria-label="Save bill"]').click();
      await grid.locator(`[role="row"][data-id="${rowId}"]`).waitFor({ state: 'detached' });
    }
    await expect.poll(async () => grid.locator('[role="row"][data-id]').count()).toBe(5);
    expect(await grid.textContent()).toContain('US gal');
    await saveScreenshot(page, 'fuel-bills.png');

    // Run the calibration and read the factor and the verdict
    await page.getByRole('button', { name: 'Run calibration' }).click();
    const factor = page.locator('[data-testid^="factor-propane"]');
    await factor.waitFor();
    const factorText = (await factor.textContent()) ?? '';
    const value = Number(factorText.split(' ')[0]);
    // the bills are 1.25 × the model's fuel; the fitted factor is a little under 1.25, since the
    // sun's gain that offsets part of the loss does not grow with it
    expect(value).toBeGreaterThan(1.1);
    expect(value).toBeLessThan(1.3);
    expect(factorText).toMatch(/90 % interval \d\.\d\d to \d\.\d\d/);
    await page.getByText('Meets ASHRAE Guideline 14 (monthly)').waitFor();
    await page.getByText(/more heat loss than the handbook values assume/).waitFor();
    await page
      .getByRole('img', { name: /billed and modelled fuel per bill/ })
      .locator('canvas')
      .waitFor();
    await saveScreenshot(page, 'calibration-result.png');

    // The budget, as calibrated
    await page.getByRole('link', { name: 'season budget as calibrated' }).click();
    await page.waitForURL(/tab=season/);
    const basis = page.getByTestId('budget-heat-loss-basis');
    await basis.waitFor();
    await expect.poll(async () => basis.textContent()).toMatch(/^As calibrated against the farm's fuel bills/);
    expect(await basis.textContent()).toContain(`${houseNames[0]} × ${value.toFixed(2)}`);
    expect(await page.getByRole('button', { name: 'As calibrated' }).getAttribute('aria-pressed')).toBe('true');
    await saveScreenshot(page, 'budget-as-calibrated.png');

    // and back to the handbook
    await page.getByRole('button', { name: 'From the handbook' }).click();
    await expect.poll(async () => basis.textContent()).toMatch(/^Heat loss from the handbook values/);
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });
});
