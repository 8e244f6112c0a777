import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, saveScreenshot, signIn } from './browser';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe("a new farm's climate from weather history", () => {
  it('an adviser creates a client farm, fills its climate from the history and reaches a season estimate without typing a climate value', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, 'adviser@example.com', 'thermbay-demo');

    await page.getByRole('button', { name: 'New farm' }).click();
    const farmDialog = page.getByRole('dialog', { name: 'New farm' });
    await farmDialog.getByLabel(/Farm name/).fill('Client farm (weather e2e)');
    await farmDialog.getByLabel(/Latitude/).fill('44.93');
    await farmDialog.getByLabel(/Longitude/).fill('-93.05');
    await farmDialog.getByLabel(/Elevation/).fill('250');
    await farmDialog.getByRole('button', { name: 'Create farm' }).click();
    await page.getByRole('heading', { name: 'Client farm (weather e2e)', level: 1 }).waitFor();

    await page.getByRole('tab', { name: 'Climate' }).click();
    await page.getByText('No climate entered yet').waitFor();
    await page.getByRole('button', { name: 'Fill from weather history' }).click();
    const dialog = page.getByRole('dialog', { name: 'Fill the climate from weather history' });
    // The stand-in's weather is invented, and the dialog says so plainly.
    expect(await dialog.getByTestId('weather-source-note').textContent()).toMatch(/INVENTED.*WEATHER_API_URL/s);
    await dialog.getByRole('button', { name: 'Read the history' }).click();
    const proposal = dialog.getByTestId('weather-proposal');
    await proposal.waitFor({ timeout: 90_000 });
    expect(await proposal.textContent()).toMatch(/Years used: (\d{4}, ){9}\d{4}/);
    await saveScreenshot(page, 'weather-proposal.png');
    await dialog.getByRole('button', { name: 'Save these values' }).click();
    await dialog.waitFor({ state: 'hidden' });

    // The form now holds the history's values and says where they came from.
    const januaryMin = page.getByRole('textbox', { name: 'January mean daily minimum (°C)' });
    await expect.poll(async () => januaryMin.inputValue()).toMatch(/^-\d+(\.\d)?$/);
    expect(await page.getByRole('textbox', { name: /Source of these numbers/ }).inputValue()).toMatch(/INVENTED/);

    await page.getByRole('tab', { name: 'Fuel & season budget' }).click();
    await page.getByRole('textbox', { name: /^Price of Natural gas per/ }).fill('0.9');
    await page.getByRole('button', { name: 'Save prices' }).click();
    await page.getByRole('status').filter({ hasText: /saved/i }).first().waitFor();

    await page.getByRole('tab', { name: 'Houses' }).click();
    await page.getByRole('link', { name: 'New house' }).click();
    await page.getByRole('textbox', { name: /^Name/ }).fill('Client house 1');
    await page.getByRole('button', { name: 'Create house' }).click();
    await page.waitForURL(/\/houses\/\d+$/);
    await page.getByRole('link', { name: /Heating season, fuel budget and measures/ }).click();
    await page.waitForURL(/\/houses\/\d+\/season$/);
    await page.getByTestId('season-total-cost').waitFor({ timeout: 60_000 });
    expect(await page.getByTestId('season-total-cost').textContent()).toMatch(/\d/);
    await saveScreenshot(page, 'weather-season.png');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });
});
