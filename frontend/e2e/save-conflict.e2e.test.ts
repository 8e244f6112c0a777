import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, openFirstHouse, saveScreenshot, signIn, widthInput } from './browser';
import { DEMO_GROWER } from './e2e-config';

const DEMO_OWNER = { email: 'owner@example.com', password: DEMO_GROWER.password };

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

async function saveWidth(page: Page, value: number): Promise<void> {
  await widthInput(page).fill(String(value));
  await page.getByRole('button', { name: 'Save house' }).click();
}

/** Both people read metres, so one person's saved width reads the same on the other's screen. */
async function useSi(page: Page): Promise<void> {
  const si = page.getByRole('button', { name: 'SI units (metric)' });
  if ((await si.getAttribute('aria-pressed')) !== 'true') await si.click();
  await page.getByRole('textbox', { name: 'Width of one span (m)' }).waitFor();
}

const savedStatus = (page: Page) => page.getByRole('status').filter({ hasText: 'Saved.' });
const conflictDialog = (page: Page) => page.getByRole('dialog', { name: 'Changed by someone else' });

describe('two people saving the same house', () => {
  it('shows "changed by someone else" to the one who saves second, who can reload theirs or overwrite', async () => {
    const grower = await newPage(browser);
    const owner = await newPage(browser);
    await signIn(grower.page, DEMO_GROWER.email, DEMO_GROWER.password);
    const houseUrl = await openFirstHouse(grower.page);
    await signIn(owner.page, DEMO_OWNER.email, DEMO_OWNER.password);
    await owner.page.goto(houseUrl);
    await widthInput(owner.page).waitFor();
    await useSi(grower.page);
    await useSi(owner.page);

    // Both loaded the same version. Widths stay inside 2–20 m.
    const before = Number(await widthInput(grower.page).inputValue());
    const step = before >= 15 ? -0.5 : 0.5;
    await saveWidth(grower.page, before + step);
    await savedStatus(grower.page).waitFor();

    // The owner, still on the old version, saves: refused, and told why.
    await saveWidth(owner.page, before + 2 * step);
    await conflictDialog(owner.page).waitFor();
    await saveScreenshot(owner.page, 'house-save-conflict.png');
    await conflictDialog(owner.page).getByRole('button', { name: 'Reload their version' }).click();
    await conflictDialog(owner.page).waitFor({ state: 'hidden' });
    // The owner's form now shows what the grower saved.
    await expect.poll(async () => Number(await widthInput(owner.page).inputValue())).toBeCloseTo(before + step, 6);
    const reloaded = Number(await widthInput(owner.page).inputValue());

    // Now on the current version, the owner's next save goes through.
    await saveWidth(owner.page, reloaded + step);
    await savedStatus(owner.page).waitFor();

    // The grower, now behind, saves and chooses to overwrite with theirs.
    const mine = before + 3 * step;
    await saveWidth(grower.page, mine);
    await conflictDialog(grower.page).waitFor();
    await conflictDialog(grower.page).getByRole('button', { name: 'Overwrite with mine' }).click();
    await conflictDialog(grower.page).waitFor({ state: 'hidden' });
    await grower.page.reload();
    await widthInput(grower.page).waitFor();
    expect(Number(await widthInput(grower.page).inputValue())).toBeCloseTo(mine, 6);

    expect(grower.pageErrors).toEqual([]);
    expect(owner.pageErrors).toEqual([]);
    await grower.page.context().close();
    await owner.page.context().close();
    // Two browsers and six saves: allow for a busy machine.
  }, 300_000);
});
