import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, openFirstHouse, saveScreenshot, signIn, widthInput } from './browser';
import { ARTIFACTS_DIR, DEMO_GROWER } from './e2e-config';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

function heatingPanel(page: Page) {
  return page.getByRole('region', { name: 'Heating on the design night' });
}

function coolingPanel(page: Page) {
  return page.getByRole('region', { name: 'Cooling and ventilation' });
}

async function useUnitSystem(page: Page, system: 'si' | 'us'): Promise<void> {
  const button = page.getByRole('button', { name: system === 'si' ? 'SI units (metric)' : 'US customary units' });
  if ((await button.getAttribute('aria-pressed')) !== 'true') await button.click();
  await expect.poll(() => button.getAttribute('aria-pressed')).toBe('true');
}

/** Full-page screenshot from the top (the app bar is sticky), plus one of each panel up close. */
async function screenshotPanels(page: Page, name: string): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, 0));
  await saveScreenshot(page, `${name}.png`);
  await heatingPanel(page).screenshot({ path: `${ARTIFACTS_DIR}/${name}-heating.png` });
  await coolingPanel(page).screenshot({ path: `${ARTIFACTS_DIR}/${name}-cooling.png` });
  await page.evaluate(() => window.scrollTo(0, 0));
}

async function openHouseNamed(page: Page, name: string): Promise<void> {
  await page.getByRole('grid', { name: 'Farms' }).getByRole('link').first().click();
  await page.waitForURL(/\/farms\/\d+$/);
  await page.getByRole('grid', { name: 'Houses' }).getByRole('link', { name }).click();
  await page.waitForURL(/\/houses\/\d+$/);
  await widthInput(page).waitFor();
}

describe('result panels on the house page', () => {
  it('shows the design heat loss in kW with the heater verdict, and follows an unsaved setpoint edit', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
    await openFirstHouse(page);
    await useUnitSystem(page, 'si');

    // This file has a fresh demo database of its own: demo House A is as seeded. Its design-night
    // loss is 97,940.6 W (POST /api/houses/:id/estimate on a fresh demo database; the figure is
    // checked against hand arithmetic in the engine's specs), and its one propane unit at
    // 117.2 kW output covers it.
    const total = heatingPanel(page).getByTestId('heating-total');
    await total.waitFor();
    await expect.poll(() => total.textContent()).toBe('97.9 kW');
    const verdict = heatingPanel(page).getByTestId('heater-verdict');
    expect(await verdict.textContent()).toContain('Heaters are adequate. 117.2 kW installed output covers');
    const before = await total.textContent();

    // Raise the night setpoint by 3 K without saving: the loss grows with the inside temperature.
    const night = page.getByRole('textbox', { name: /Night heating/ });
    const nightBefore = Number(await night.inputValue());
    await night.fill(String(nightBefore + 3));
    await expect.poll(() => total.textContent(), { timeout: 10_000 }).not.toBe(before);
    const kilowatts = (text: string | null) => Number((text ?? '').replace(/[^\d.]/g, ''));
    expect(kilowatts(await total.textContent())).toBeGreaterThan(kilowatts(before));
    await heatingPanel(page).getByText('Unsaved edits').waitFor();
    expect(await page.getByRole('button', { name: 'Save house' }).isEnabled()).toBe(true);

    await screenshotPanels(page, 'house-results');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it("flags House B's fans as short and says how many fans it needs", async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
    await openHouseNamed(page, 'House B – bedding plants');
    await useUnitSystem(page, 'si');

    const verdict = coolingPanel(page).getByTestId('fan-verdict');
    await verdict.waitFor();
    const text = (await verdict.textContent()) ?? '';
    expect(text).toContain('Fans are short');
    const fansNeeded = Number(/(\d+) fans of this size are needed/.exec(text)?.[1]);
    expect(fansNeeded).toBeGreaterThan(1);
    // the design-day chart is drawn
    expect(await coolingPanel(page).locator('canvas').count()).toBe(1);

    await screenshotPanels(page, 'house-b');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it('shows Btu/h and °F after switching to US units', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
    await openFirstHouse(page);
    await useUnitSystem(page, 'si');
    const total = heatingPanel(page).getByTestId('heating-total');
    await expect.poll(() => total.textContent()).toBe('97.9 kW');

    await useUnitSystem(page, 'us');
    // 97,940.6 W ÷ 0.29307107 W per Btu/h = 334,187 Btu/h
    await expect.poll(() => total.textContent()).toBe('334,187 Btu/h');
    expect(await heatingPanel(page).textContent()).toContain('°F');
    expect(await coolingPanel(page).getByTestId('fan-verdict').textContent()).toContain('cfm');

    await screenshotPanels(page, 'house-results-us');
    await useUnitSystem(page, 'si');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it("writes the quantities in House B's cautions in the reader's units (US: Btu/h, ft; no raw tokens)", async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
    await openHouseNamed(page, 'House B – bedding plants');
    await useUnitSystem(page, 'us');

    // House B's single heater is short and fuel-fired: the cautions quote outputs and chimney heights
    const heatingCautions = heatingPanel(page).getByRole('note').filter({ hasText: 'Cautions' });
    await heatingCautions.waitFor();
    const heatingText = (await heatingCautions.textContent()) ?? '';
    expect(heatingText).toMatch(/Installed output [\d,]+ Btu\/h is [\d,]+ Btu\/h short/);
    expect(heatingText).toMatch(/at least [\d.]+ ft above the ridge/);
    expect(heatingText).not.toContain('{{');
    expect(heatingText).not.toMatch(/\d (kW|m|°C)\b/);

    // its fans and inlet are short: flows in cfm, areas in ft²
    const coolingCautions = coolingPanel(page).getByRole('note').filter({ hasText: 'Cautions' });
    await coolingCautions.waitFor();
    const coolingText = (await coolingCautions.textContent()) ?? '';
    expect(coolingText).toMatch(/Installed fans move [\d,]+ cfm/);
    expect(coolingText).toMatch(/Free inlet area [\d,]+ ft²/);
    expect(coolingText).not.toContain('{{');

    await useUnitSystem(page, 'si');
    await expect
      .poll(async () => (await heatingCautions.textContent()) ?? '')
      .toMatch(/Installed output [\d,.]+ kW is/);
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });
});
