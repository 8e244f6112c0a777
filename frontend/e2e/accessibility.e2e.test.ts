import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, signIn } from './browser';

/**
 * axe-core (evaluated in the page: its Playwright wrapper needs a newer Node, and the app's strict
 * content security policy rightly refuses an injected <script> tag) on every main
 * page: no serious or critical violation; each page has its own document title; the strict
 * content security policy blocks nothing the app needs.
 */
const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
const DEMO_PASSWORD = 'thermbay-demo';

interface Violation {
  id: string;
  impact: string | null;
  help: string;
  nodes: Array<{ target: string[] }>;
}

async function seriousViolations(page: Page): Promise<string[]> {
  await page.evaluate(AXE_SOURCE);
  const violations = (await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (context: Document, options: object) => Promise<unknown> } }).axe;
    const result = (await axe.run(document, { resultTypes: ['violations'] })) as { violations: unknown[] };
    return result.violations;
  })) as Violation[];
  return violations
    .filter((violation) => violation.impact === 'serious' || violation.impact === 'critical')
    .map(
      (violation) =>
        `${violation.impact} ${violation.id}: ${violation.help} at ${violation.nodes
          .slice(0, 3)
          .map((node) => node.target.join(' '))
          .join(' | ')}`,
    );
}

let browser: Browser;
let page: Page;
let adminPage: Page;
let farmUrl = '';
let houseUrl = '';
const titles = new Map<string, string>();
const blocked: string[] = [];
const pageErrors: string[] = [];

beforeAll(async () => {
  browser = await launchBrowser();
  const opened = await newPage(browser);
  page = opened.page;
  page.on('pageerror', (error) => pageErrors.push(error.message));
  page.on('console', (message) => {
    if (/Content Security Policy/i.test(message.text())) blocked.push(message.text());
  });
});

afterAll(async () => {
  await browser?.close();
});

/** Waits for the page's heading, records its title and answers its serious and critical violations. */
async function audit(target: Page, name: string): Promise<string[]> {
  await target.getByRole('heading', { level: 1 }).first().waitFor();
  await target.waitForTimeout(300); // let lazy panels settle
  titles.set(name, await target.title());
  return seriousViolations(target);
}

describe('accessibility of the main pages (axe: no serious or critical violation)', () => {
  it('sign-in', async () => {
    await page.goto('/login');
    expect(await audit(page, 'sign-in')).toEqual([]);
  });

  it('farms', async () => {
    await signIn(page, 'owner@example.com', DEMO_PASSWORD);
    await page.getByRole('grid', { name: 'Farms' }).getByRole('link').first().waitFor();
    expect(await audit(page, 'farms')).toEqual([]);
  });

  it('farm, and each of its tabs', async () => {
    await page.getByRole('grid', { name: 'Farms' }).getByRole('link').first().click();
    await page.waitForURL(/\/farms\/\d+$/);
    await page.getByRole('grid', { name: 'Houses' }).waitFor();
    farmUrl = page.url();
    const problems: Record<string, string[]> = { houses: await audit(page, 'farm') };
    const tabs = page.getByRole('tablist', { name: 'Farm sections' }).getByRole('tab');
    const tabNames = await tabs.allTextContents();
    for (const [index, tabName] of tabNames.entries()) {
      if (index === 0) continue;
      await tabs.nth(index).click();
      await page.waitForURL(/tab=/);
      await page.waitForTimeout(500);
      problems[tabName] = await seriousViolations(page);
    }
    expect(problems).toEqual(Object.fromEntries(Object.keys(problems).map((tab) => [tab, []])));
  });

  it('house', async () => {
    await page.goto(farmUrl);
    await page.getByRole('grid', { name: 'Houses' }).getByRole('link').first().click();
    await page.waitForURL(/\/houses\/\d+$/);
    houseUrl = page.url();
    await page.getByRole('textbox', { name: /Width of one span/ }).waitFor();
    expect(await audit(page, 'house')).toEqual([]);
  });

  it('season', async () => {
    await page.goto(`${houseUrl}/season`);
    expect(await audit(page, 'season')).toEqual([]);
  });

  it('fuel bills and calibration', async () => {
    await page.goto(`${farmUrl}/fuel-records`);
    await page.getByRole('grid', { name: 'Fuel bills and deliveries' }).waitFor();
    expect(await audit(page, 'fuel bills')).toEqual([]);
  });

  it('settings', async () => {
    await page.goto('/settings');
    expect(await audit(page, 'settings')).toEqual([]);
  });

  it('admin users', async () => {
    adminPage = (await newPage(browser)).page;
    await signIn(adminPage, 'admin@example.com', DEMO_PASSWORD);
    await adminPage.goto('/admin/users');
    await adminPage.getByRole('heading', { name: 'Users', level: 1 }).waitFor();
    expect(await audit(adminPage, 'admin users')).toEqual([]);
    await adminPage.context().close();
  });

  it('gives every page its own document title, and the strict CSP blocks nothing the app needs', () => {
    expect(titles.size).toBe(8);
    for (const title of titles.values()) expect(title).toMatch(/ – Thermbay$/);
    expect(new Set(titles.values()).size).toBe(titles.size);
    expect(blocked).toEqual([]);
    expect(pageErrors).toEqual([]);
  });
});
