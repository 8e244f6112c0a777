import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, saveScreenshot, signIn } from './browser';
import { DEMO_GROWER } from './e2e-config';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('pages around the house', () => {
  it('sends a signed-out visitor to sign in, which lists the demo accounts', async () => {
    const { page, pageErrors } = await newPage(browser);
    await page.goto('/farms');
    await page.waitForURL('**/login');
    const demoList = page.getByRole('list', { name: 'Demo accounts' });
    await demoList.waitFor();
    expect(await demoList.textContent()).toContain(DEMO_GROWER.email);
    await saveScreenshot(page, 'sign-in.png');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it('shows the farm with its houses and, for a grower, the New house button but no farm editing', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
    const firstFarm = page.getByRole('grid', { name: 'Farms' }).getByRole('link').first();
    await firstFarm.waitFor();
    await saveScreenshot(page, 'farms.png');

    // Keyboard only: Tab into the grid's header, arrow down onto the farm link, Enter opens it.
    const focusedRole = () => page.evaluate(() => document.activeElement?.getAttribute('role') ?? '');
    for (let presses = 0; presses < 15 && (await focusedRole()) !== 'columnheader'; presses++) {
      await page.keyboard.press('Tab');
    }
    expect(await focusedRole()).toBe('columnheader');
    await page.keyboard.press('ArrowDown');
    expect(await page.evaluate(() => document.activeElement?.tagName)).toBe('A');
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/farms\/\d+$/);
    await page.getByRole('grid', { name: 'Houses' }).getByRole('link').first().waitFor();
    expect(await page.getByRole('link', { name: 'New house' }).count()).toBe(1);
    // grower: house:write but not farm:update / farm:delete
    expect(await page.getByRole('button', { name: 'Edit farm' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Delete farm' }).count()).toBe(0);
    await saveScreenshot(page, 'farm.png');

    await page.goto('/no-such-page');
    await page.getByRole('heading', { name: 'Page not found' }).waitFor();
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });
});
