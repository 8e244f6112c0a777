import type { Browser } from 'playwright-core';
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

describe('creating farms and houses, and site administration', () => {
  it('an owner creates a farm, then a house on it from the defaults', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, 'owner@example.com', DEMO_PASSWORD);

    await page.getByRole('button', { name: 'New farm' }).click();
    const dialog = page.getByRole('dialog', { name: 'New farm' });
    await dialog.getByLabel(/Farm name/).fill('E2E Test Farm');
    await dialog.getByLabel(/Latitude/).fill('43.07');
    await dialog.getByLabel(/Longitude/).fill('-89.40');
    await dialog.getByLabel(/Elevation/).fill('5000');
    await dialog.getByRole('button', { name: 'Create farm' }).click();
    // 5000 m is above the shared elevation bound (4500 m): the field says so, nothing is sent.
    await dialog.getByText(/Elevation must be between/).waitFor();
    await dialog.getByLabel(/Elevation/).fill('270');
    await dialog.getByRole('button', { name: 'Create farm' }).click();

    await page.getByRole('heading', { name: 'E2E Test Farm', level: 1 }).waitFor();
    expect(await page.getByRole('button', { name: 'Edit farm' }).count()).toBe(1);

    await page.getByRole('link', { name: 'New house' }).click();
    await page.getByRole('heading', { name: 'New house', level: 1 }).waitFor();
    await page.getByRole('textbox', { name: /^Name/ }).fill('E2E House 1');
    // leaving with what was typed asks first; Cancel keeps it
    await page.getByRole('navigation', { name: 'Breadcrumb' }).getByRole('link', { name: 'E2E Test Farm' }).click();
    const leave = page.getByRole('dialog', { name: 'Leave without saving?' });
    await leave.getByText('Your edits to the new house are not saved.', { exact: false }).waitFor();
    await leave.getByRole('button', { name: 'Cancel' }).click();
    await leave.waitFor({ state: 'hidden' });
    expect(await page.getByRole('textbox', { name: /^Name/ }).inputValue()).toBe('E2E House 1');
    // creating it moves on to the new house without asking
    await page.getByRole('button', { name: 'Create house' }).click();

    await page.waitForURL(/\/houses\/\d+$/);
    await page.getByRole('heading', { name: 'E2E House 1', level: 1 }).waitFor();
    expect(await page.getByRole('dialog').count()).toBe(0);
    await saveScreenshot(page, 'new-house.png');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it('the site administrator sees every account on the users page', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, 'admin@example.com', DEMO_PASSWORD);
    await page.getByRole('link', { name: 'Users' }).click();
    const grid = page.getByRole('grid', { name: 'Users' });
    await grid.getByText('grower@example.com').waitFor();
    expect(await grid.textContent()).toContain('owner@example.com');
    await saveScreenshot(page, 'admin-users.png');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });
});
