import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, openFirstHouse, saveScreenshot, signIn, widthInput } from './browser';
import { DEMO_GROWER } from './e2e-config';

const METRES_PER_FOOT = 0.3048; // exact (NIST SP 811)

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('a grower editing a house', () => {
  it('changes the width, saves, reloads and sees the change kept', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
    const houseUrl = await openFirstHouse(page);

    const width = widthInput(page);
    // a fresh demo database (one per file): House A as seeded, 30 ft = 9.144 m wide, shown in SI
    // (the account's default) to 2 decimals
    expect(await width.inputValue()).toBe('9.14');
    const changed = 10.64;
    await width.fill(String(changed));
    await page.getByRole('button', { name: 'Save house' }).click();
    await page.getByRole('status').filter({ hasText: 'Saved.' }).waitFor();

    await page.reload();
    await widthInput(page).waitFor();
    expect(page.url()).toBe(houseUrl);
    expect(Number(await widthInput(page).inputValue())).toBeCloseTo(changed, 6);

    await saveScreenshot(page, 'house-page.png');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it('shows the width in the other unit system after switching units', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
    await openFirstHouse(page);

    const siButton = page.getByRole('button', { name: 'SI units (metric)' });
    const usButton = page.getByRole('button', { name: 'US customary units' });
    const width = widthInput(page);
    // The unit is part of the input's accessible name: "Width of one span (m)".
    const widthIn = (unit: string) => page.getByRole('textbox', { name: `Width of one span (${unit})` });

    // The account starts in SI on this file's fresh database, and House A has the width saved by
    // the test above.
    expect(await siButton.getAttribute('aria-pressed')).toBe('true');
    await widthIn('m').waitFor();
    const metres = Number(await width.inputValue());
    expect(metres).toBe(10.64);

    await usButton.click();
    await expect.poll(() => usButton.getAttribute('aria-pressed')).toBe('true');
    await widthIn('ft').waitFor();
    const feet = Number(await width.inputValue());
    // 10.64 m ÷ 0.3048 m/ft = 34.908 ft, shown to 1 decimal
    expect(feet).toBe(34.9);
    // SI shows 2 decimals and US 1, so the two readings agree to within their rounding.
    expect(Math.abs(feet * METRES_PER_FOOT - metres)).toBeLessThan(0.02);
    expect(feet).not.toBeCloseTo(metres, 1);

    await saveScreenshot(page, 'house-page-us-units.png');

    // The preference is stored on the account: still US after a reload.
    await page.reload();
    await widthInput(page).waitFor();
    await expect.poll(() => usButton.getAttribute('aria-pressed')).toBe('true');
    expect(Number(await widthInput(page).inputValue())).toBeCloseTo(feet, 6);

    await siButton.click();
    await widthIn('m').waitFor();
    expect(Number(await width.inputValue())).toBeCloseTo(metres, 6);
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });
});
