import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, saveScreenshot, signIn } from './browser';
import { DEMO_GROWER } from './e2e-config';

const DEMO_OWNER = { email: 'owner@example.com', password: DEMO_GROWER.password };

let browser: Browser;
let csvDir: string;

beforeAll(async () => {
  browser = await launchBrowser();
  csvDir = mkdtempSync(join(tmpdir(), 'thermbay-e2e-csv-'));
});

afterAll(async () => {
  await browser?.close();
  rmSync(csvDir, { recursive: true, force: true });
});

async function useUnitSystem(page: Page, system: 'si' | 'us'): Promise<void> {
  const button = page.getByRole('button', { name: system === 'si' ? 'SI units (metric)' : 'US customary units' });
  if ((await button.getAttribute('aria-pressed')) !== 'true') await button.click();
  await expect.poll(() => button.getAttribute('aria-pressed')).toBe('true');
}

async function openFirstFarmTab(page: Page, tabName: string): Promise<void> {
  await page.getByRole('grid', { name: 'Farms' }).getByRole('link').first().click();
  await page.waitForURL(/\/farms\/\d+$/);
  await page.getByRole('tab', { name: tabName }).click();
}

/** Three days of hourly readings, a gentle daily swing around −7 °C. */
function hourlyCsv(): string {
  const lines = ['Time,Outdoor (°C)'];
  for (let hour = 0; hour < 72; hour++) {
    const day = 10 + Math.floor(hour / 24);
    const clock = String(hour % 24).padStart(2, '0');
    const celsius = -7 - 3 * Math.cos(((hour % 24) - 15) * (Math.PI / 12));
    lines.push(`2026-01-${day} ${clock}:00,${celsius.toFixed(1)}`);
  }
  return `${lines.join('\n')}\n`;
}

/** The app bar is sticky: scroll to the top so a full-page screenshot shows it once, at the top. */
async function screenshot(page: Page, fileName: string): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, 0));
  await saveScreenshot(page, fileName);
}

function writeCsv(name: string, text: string): string {
  const path = join(csvDir, name);
  writeFileSync(path, text, 'utf8');
  return path;
}

describe('farm climate, temperature logs and the season', () => {
  it('the grower edits the farm climate and sees it kept after reload', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
    await useUnitSystem(page, 'si');
    await openFirstFarmTab(page, 'Climate');

    const januaryMin = page.getByRole('textbox', { name: 'January mean daily minimum (°C)' });
    await januaryMin.waitFor();
    const original = await januaryMin.inputValue();
    const changed = String(Number(original) - 0.5);
    await januaryMin.fill(changed);
    const note = page.getByRole('textbox', { name: /Source of these numbers/ });
    const originalNote = await note.inputValue();
    await note.fill('Edited in a browser test');
    await page.getByRole('button', { name: 'Save climate' }).click();
    await page.getByRole('status').filter({ hasText: 'Climate saved.' }).waitFor();

    await page.reload();
    await januaryMin.waitFor();
    expect(page.url()).toContain('tab=climate');
    expect(await januaryMin.inputValue()).toBe(changed);
    expect(await note.inputValue()).toBe('Edited in a browser test');
    // The chart of the monthly normals is drawn beside the table.
    await page
      .getByRole('img', { name: /monthly mean daily minimum and maximum/ })
      .locator('canvas')
      .waitFor();
    await screenshot(page, 'farm-climate.png');

    // Put the demo climate back for the other tests.
    await januaryMin.fill(original);
    await note.fill(originalNote);
    await page.getByRole('button', { name: 'Save climate' }).click();
    await page.getByRole('status').filter({ hasText: 'Climate saved.' }).waitFor();
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it('the grower uploads hourly temperatures, confirms the columns and sees the log listed', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
    await openFirstFarmTab(page, 'Temperature logs');

    await page.getByLabel('CSV file of temperatures').setInputFiles(writeCsv('north-station-jan.csv', hourlyCsv()));
    const sample = page.getByRole('table', { name: 'First rows of the file' });
    await sample.waitFor();
    expect(await sample.textContent()).toContain('temperature (°C)');
    await screenshot(page, 'temperature-log-mapping.png');

    await page.getByRole('button', { name: 'Upload log' }).click();
    await page.getByRole('status').filter({ hasText: 'Stored “north-station-jan”' }).waitFor();
    const stored = page.getByRole('table', { name: 'Stored temperature logs' });
    const row = stored.getByRole('row').filter({ hasText: 'north-station-jan' });
    await row.waitFor();
    expect(await row.textContent()).toContain('2026-01-10');
    expect(await row.textContent()).toContain('2026-01-12');
    await page
      .getByRole('img', { name: /daily temperatures of north-station-jan/ })
      .locator('canvas')
      .waitFor();
    await screenshot(page, 'temperature-logs.png');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it('a bad CSV shows its problems line by line and nothing is stored', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
    await openFirstFarmTab(page, 'Temperature logs');
    const stored = page.getByRole('table', { name: 'Stored temperature logs' });
    await stored.or(page.getByText('No temperature logs stored yet.')).first().waitFor();
    const rowsBefore = await stored.getByRole('row').count();

    const lines = hourlyCsv().trim().split('\n');
    lines[3] = '2026-01-10 02:00,abc'; // file line 4
    lines[6] = 'yesterday,-6.5'; // file line 7
    await page.getByLabel('CSV file of temperatures').setInputFiles(writeCsv('broken.csv', `${lines.join('\n')}\n`));
    await page.getByRole('button', { name: 'Upload log' }).click();

    const problems = page.getByRole('list', { name: 'Problems in the file' });
    await problems.waitFor();
    const text = (await problems.textContent()) ?? '';
    expect(text).toContain('Line 4:');
    expect(text).toContain('Line 7:');
    expect(await page.getByText('Nothing was stored').count()).toBe(1);
    await screenshot(page, 'temperature-log-errors.png');
    expect(await stored.getByRole('row').count()).toBe(rowsBefore);
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it("the owner sees the farm's season cost and downloads the CSV export", async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_OWNER.email, DEMO_OWNER.password);
    await useUnitSystem(page, 'us');
    await openFirstFarmTab(page, 'Fuel & season budget');

    const cost = page.getByTestId('farm-season-cost');
    await cost.waitFor({ timeout: 60_000 });
    // the demo farm pays in US dollars: "$12,345"
    expect(await cost.textContent()).toMatch(/^\$[\d,]+$/);
    expect(Number((await cost.textContent())?.replace(/[$,]/g, ''))).toBeGreaterThan(0);
    const perHouse = page.getByRole('table', { name: 'Season fuel budget per house' });
    // demo House A burns propane, House B and Range C natural gas
    expect(await perHouse.textContent()).toContain('US gal');
    expect(await perHouse.textContent()).toContain('therm');
    expect(await perHouse.textContent()).toContain('MMBtu');
    await page
      .getByRole('img', { name: /fuel cost and heat per month/ })
      .locator('canvas')
      .waitFor();
    // Fuel-fired heat carries the safety cautions.
    expect(await page.getByRole('note').textContent()).toMatch(/carbon monoxide/);

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: /Export CSV/ }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^season-budget-farm-\d+-.*-us\.csv$/);
    const csv = readFileSync(await download.path(), 'utf8');
    expect(csv).toContain('MMBtu');
    expect(csv.split('\n').length).toBeGreaterThan(5);
    expect(await page.evaluate(() => document.body.innerText)).not.toContain('{{');
    await screenshot(page, 'farm-season-budget.png');
    await useUnitSystem(page, 'si');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it('the owner manages members: the last owner cannot be removed or demoted, on the page or through the API', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_OWNER.email, DEMO_OWNER.password);
    await openFirstFarmTab(page, 'Members');
    const grid = page.getByRole('grid', { name: 'Farm members' });
    await grid.getByText('grower@example.com').waitFor();
    expect(await page.getByRole('button', { name: 'Remove owner@example.com' }).isDisabled()).toBe(true);
    // and the API refuses it too, whatever the page offers: removing or demoting the only owner is 409
    const farmId = Number(/\/farms\/(\d+)/.exec(page.url())?.[1]);
    const login = await page.request.post('/api/auth/login', {
      data: { email: DEMO_OWNER.email, password: DEMO_OWNER.password },
    });
    const headers = { Authorization: `Bearer ${(await login.json()).accessToken}` };
    const members = (await (await page.request.get(`/api/farms/${farmId}/members`, { headers })).json()) as Array<{
      userId: number;
      email: string;
      role: string;
    }>;
    const owners = members.filter((member) => member.role === 'owner');
    expect(owners.map((member) => member.email)).toEqual([DEMO_OWNER.email]);
    const removal = await page.request.delete(`/api/farms/${farmId}/members/${owners[0]!.userId}`, { headers });
    expect(removal.status()).toBe(409);
    expect((await removal.json()).message).toMatch(/at least one owner/);
    const demotion = await page.request.patch(`/api/farms/${farmId}/members/${owners[0]!.userId}`, {
      headers,
      data: { role: 'viewer' },
    });
    expect(demotion.status()).toBe(409);

    await page.getByRole('textbox', { name: /E-mail address to invite/ }).fill('nobody-yet@example.com');
    await page.getByRole('button', { name: 'Invite' }).click();
    await page.getByRole('status').filter({ hasText: 'Invitation sent to nobody-yet@example.com' }).waitFor();
    await page
      .getByRole('group', { name: 'Pending invitations' })
      .or(page.getByLabel('Pending invitations'))
      .getByText('nobody-yet@example.com')
      .waitFor();
    await screenshot(page, 'farm-members.png');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it('the season page shows the monthly chart and the degree-day cross-check', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_GROWER.email, DEMO_GROWER.password);
    await page.getByRole('grid', { name: 'Farms' }).getByRole('link').first().click();
    await page.getByRole('grid', { name: 'Houses' }).getByRole('link').first().click();
    await page.waitForURL(/\/houses\/\d+$/);
    await page.getByRole('link', { name: /Heating season, fuel budget and measures/ }).click();
    await page.waitForURL(/\/houses\/\d+\/season$/);

    await page
      .getByRole('img', { name: 'Monthly chart of fuel and heat for the season' })
      .locator('canvas')
      .waitFor({ timeout: 60_000 });
    await page.getByRole('heading', { name: 'Degree-day cross-check' }).waitFor();
    const difference = await page.getByTestId('degree-day-difference').textContent();
    expect(difference).toMatch(/hour-by-hour estimate (is \d+ % (lower|higher)|and the degree-day estimate agree)/);
    expect(await page.getByTestId('season-total-cost').textContent()).toMatch(/\d/);
    await page.getByTestId('night-length').waitFor({ timeout: 60_000 });
    expect(await page.getByTestId('night-length').textContent()).toMatch(/\d+(\.\d)? h/);
    const measures = page.getByRole('table', { name: 'Measures ranked by payback' });
    await measures.waitFor({ timeout: 60_000 });
    // the default list holds only measures that apply to the house
    expect(await measures.textContent()).not.toContain('Does not apply');
    await page.getByRole('columnheader', { name: 'Hours below setpoint' }).waitFor();
    // the season's heat by part, the night sky its own row (the demo house's roof film passes long-wave radiation)
    const byPart = page.getByRole('table', { name: 'Season heat by part' });
    expect(await byPart.textContent()).toMatch(/Radiation to the night sky[^%]*\d[\d,.]* (kWh|MMBtu)\d+ %/);
    await page.getByRole('heading', { name: 'Production calendar' }).waitFor();
    // The API's prose carries quantities as {{kind:value}} tokens: none may reach the reader.
    expect(await page.evaluate(() => document.body.innerText)).not.toContain('{{');
    await screenshot(page, 'house-season.png');

    // Demo House B's one heater cannot hold it in the coldest hours: the season says so.
    await page.goBack();
    await page.waitForURL(/\/houses\/\d+$/);
    await page.goBack();
    await page
      .getByRole('grid', { name: 'Houses' })
      .getByRole('link', { name: /House B/ })
      .click();
    await page.waitForURL(/\/houses\/\d+$/);
    await page.getByRole('link', { name: /Heating season, fuel budget and measures/ }).click();
    const warning = page.getByTestId('season-below-setpoint');
    await warning.waitFor({ timeout: 60_000 });
    expect(await warning.textContent()).toMatch(/crop sits below its setpoint for \d+ hours of the season/);
    expect(await page.evaluate(() => document.body.innerText)).not.toContain('{{');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });

  it('a new farm with no fuel price gets the heat, a price typed per gallon in place, and the cost in its currency', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, DEMO_OWNER.email, DEMO_OWNER.password);
    await useUnitSystem(page, 'us');
    // The new farm, its climate and its house are set up through the API the pages use.
    const login = await page.request.post('/api/auth/login', {
      data: { email: DEMO_OWNER.email, password: DEMO_OWNER.password },
    });
    const headers = { Authorization: `Bearer ${(await login.json()).accessToken}` };
    const farms = (await (await page.request.get('/api/farms', { headers })).json()) as Array<{ id: number }>;
    const demoClimate = (await (await page.request.get(`/api/farms/${farms[0]!.id}/climate`, { headers })).json())
      .climate;
    const farm = (await (
      await page.request.post('/api/farms', {
        headers,
        data: {
          name: 'Euro test farm',
          latitudeDeg: 44,
          longitudeDeg: -93,
          elevationM: 250,
          timeZone: 'America/Chicago',
          currency: 'EUR',
        },
      })
    ).json()) as { id: number };
    expect(
      (
        await page.request.put(`/api/farms/${farm.id}/climate`, {
          headers: { ...headers, 'If-Match': '0' },
          data: demoClimate,
        })
      ).status(),
    ).toBe(200);
    // an invented 9 × 30 m gable house with two propane unit heaters
    const house = (await (
      await page.request.post(`/api/farms/${farm.id}/houses`, {
        headers,
        data: {
          name: 'First house',
          shape: 'gable',
          spans: 1,
          widthM: 9,
          lengthM: 30,
          eaveHeightM: 2.5,
          ridgeHeightM: 4.5,
          coverings: {
            roof: 'poly-double-inflated',
            sidewalls: 'poly-double-inflated',
            endwalls: 'polycarbonate-twin-8mm',
          },
          airLeakageClassId: 'new-film-double',
          perimeterInsulated: false,
          curtainId: null,
          heaters: [{ count: 2, ratedInputW: 60_000, efficiency: 0.8, fuelId: 'propane' }],
          exhaustFans: { count: 2, capacityEachM3PerS: 5 },
          inletAreaM2: 3,
          setpoints: { dayHeatingC: 18, nightHeatingC: 15, coolingC: 25 },
        },
      })
    ).json()) as { id: number };
    expect(house.id).toBeGreaterThan(0);

    await page.goto(`/houses/${house.id}/season`);
    const missing = page.getByTestId('missing-price-propane');
    await missing.waitFor({ timeout: 60_000 });
    // the heat and fuel are there before any price
    expect(await page.getByTestId('season-total-fuel').textContent()).toMatch(/[\d,]+ US gal/);
    expect(await page.getByTestId('season-total-cost').textContent()).toContain('needs a fuel price');
    expect(await missing.textContent()).toContain('per US gal');
    await screenshot(page, 'season-price-missing.png');

    await missing.getByRole('textbox', { name: 'Price of Propane' }).fill('2.10');
    await missing.getByRole('button', { name: 'Save price' }).click();
    await expect
      .poll(async () => page.getByTestId('season-total-cost').textContent(), { timeout: 60_000 })
      .toMatch(/^€[\d,]+$/);
    expect(await page.getByTestId('missing-price-propane').count()).toBe(0);
    // cost = US gallons × €2.10 (the price was per US gallon, the user's unit)
    const gallons = Number((await page.getByTestId('season-total-fuel').textContent())!.replace(/[^\d.]/g, ''));
    const euros = Number((await page.getByTestId('season-total-cost').textContent())!.replace(/[^\d.]/g, ''));
    expect(Math.abs(euros - gallons * 2.1)).toBeLessThanOrEqual(gallons * 2.1 * 0.01 + 2);
    // the farm budget says the same, in euros
    await page.goto(`/farms/${farm.id}?tab=season`);
    const farmCost = page.getByTestId('farm-season-cost');
    await farmCost.waitFor({ timeout: 60_000 });
    expect(await farmCost.textContent()).toMatch(/^€[\d,]+$/);
    expect(await page.evaluate(() => document.body.innerText)).not.toMatch(/pricePerUnit|priceUnit|fuelId/);
    await screenshot(page, 'farm-budget-euro.png');

    await page.request.delete(`/api/farms/${farm.id}`, { headers });
    await useUnitSystem(page, 'si');
    expect(pageErrors).toEqual([]);
    await page.context().close();
  });
});
