import { readFileSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
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

/** The admin's outbox: the newest message whose subject matches, and its text. */
async function newestOutboxMessage(page: Page, subject: RegExp) {
  await page.goto('/admin/outbox');
  await page.getByRole('heading', { name: 'Outbox', level: 1 }).waitFor();
  const message = page
    .getByRole('list', { name: 'Messages' })
    .getByRole('listitem')
    .filter({ hasText: subject })
    .first();
  await message.waitFor();
  return message;
}

async function linkFromOutbox(subject: RegExp, path: RegExp): Promise<string> {
  const { page } = await newPage(browser);
  await signIn(page, 'admin@example.com', DEMO_PASSWORD);
  const message = await newestOutboxMessage(page, subject);
  const text = (await message.textContent()) ?? '';
  const match = path.exec(text);
  await page.context().close();
  if (!match) throw new Error(`no link matching ${path} in: ${text}`);
  return match[0];
}

describe('reports, e-mail, invitations and password reset', () => {
  it('an adviser writes a report, saves it, downloads the PDF and e-mails it to the owner; the outbox shows it', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, 'adviser@example.com', DEMO_PASSWORD);
    const clients = page.getByRole('region', { name: 'Your client farms' });
    await clients.getByRole('link').first().click();
    await page.waitForURL(/\/farms\/\d+$/);
    await page.getByRole('grid', { name: 'Houses' }).getByRole('link').first().click();
    await page.waitForURL(/\/houses\/\d+$/);

    await page.getByRole('textbox', { name: 'Report title' }).fill('Winter check (browser test)');
    await page.getByRole('button', { name: 'Create report' }).click();
    await page.waitForURL(/\/reports\/\d+$/);
    await page.getByRole('heading', { name: 'Winter check (browser test)', level: 1 }).waitFor();
    await page.getByRole('textbox', { name: 'Notes' }).fill('Checked the north wall on site.');
    await page.getByRole('button', { name: 'Save report' }).click();
    await page.getByRole('status').filter({ hasText: 'Report saved.' }).waitFor();
    await page.getByRole('article', { name: 'Report' }).getByText('Checked the north wall on site.').waitFor();
    await page.getByRole('img', { name: 'Heat loss by part on the design night' }).waitFor();
    await page
      .getByText(/carbon monoxide/i)
      .first()
      .waitFor();

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download PDF' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/\.pdf$/);
    const pdfPath = await download.path();
    expect(readFileSync(pdfPath).subarray(0, 5).toString('latin1')).toBe('%PDF-');

    await page.getByRole('button', { name: 'E-mail PDF' }).click();
    const dialog = page.getByRole('dialog', { name: 'E-mail this report as PDF' });
    await dialog.getByLabel(/owner@example\.com/).check();
    await dialog.getByRole('textbox', { name: 'Short message' }).fill('Here is the winter check.');
    await dialog.getByRole('button', { name: 'Send' }).click();
    await dialog.getByRole('status').filter({ hasText: 'Sent to owner@example.com' }).waitFor();
    await saveScreenshot(page, 'report-page.png');
    expect(pageErrors).toEqual([]);
    await page.context().close();

    const admin = await newPage(browser);
    await signIn(admin.page, 'admin@example.com', DEMO_PASSWORD);
    const message = await newestOutboxMessage(admin.page, /Winter check \(browser test\)/);
    expect(await message.textContent()).toContain('Here is the winter check.');
    await message.getByRole('button', { name: /\.pdf/ }).waitFor();
    await saveScreenshot(admin.page, 'admin-outbox.png');
    expect(admin.pageErrors).toEqual([]);
    await admin.page.context().close();
  });

  it('an owner invites a new adviser; the link from the outbox signs them up and they see the farm', async () => {
    const { page, pageErrors } = await newPage(browser);
    await signIn(page, 'owner@example.com', DEMO_PASSWORD);
    await page.getByRole('grid', { name: 'Farms' }).getByRole('link').first().click();
    await page.waitForURL(/\/farms\/\d+$/);
    await page.getByRole('tab', { name: 'Members' }).click();
    await page.getByRole('textbox', { name: /E-mail address to invite/ }).waitFor();
    const farmName = (await page.getByRole('heading', { level: 1 }).textContent()) ?? '';
    expect(farmName).not.toBe('Farms');
    await page.getByRole('textbox', { name: /E-mail address to invite/ }).fill('new.adviser@example.org');
    await page.getByRole('form', { name: 'Invite someone' }).locator('#field-role').click();
    await page.getByRole('option', { name: 'Adviser' }).click();
    await page.getByRole('button', { name: 'Invite' }).click();
    await page.getByRole('status').filter({ hasText: 'Invitation sent to new.adviser@example.org' }).waitFor();
    expect(pageErrors).toEqual([]);
    await page.context().close();

    const link = await linkFromOutbox(/invites you to/, /https?:\/\/[^\s]+\/invitations\/[A-Za-z0-9_-]+/);
    const invitee = await newPage(browser);
    await invitee.page.goto(link);
    await invitee.page.getByRole('heading', { name: /Join/, level: 1 }).waitFor();
    await invitee.page.getByRole('textbox', { name: /Your name/ }).fill('Nia New-Adviser');
    await invitee.page.getByLabel(/Choose a password/).fill('a-fresh-adviser-pass');
    await invitee.page.getByRole('button', { name: 'Create account and join' }).click();
    await invitee.page.waitForURL('**/farms');
    await invitee.page.getByRole('grid', { name: 'Farms' }).getByText(farmName.trim()).first().waitFor();
    expect(invitee.pageErrors).toEqual([]);
    await invitee.page.context().close();
  });

  it('a user resets a forgotten password with the e-mailed link', async () => {
    const { page, pageErrors } = await newPage(browser);
    await page.goto('/login');
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    // The forgot-password page is a lazy route: until its code has loaded, the sign-in page stays
    // on screen, and its own "E-mail" field would take the typing (then the new page opens empty).
    await page.getByRole('heading', { name: 'Forgot your password?', level: 1 }).waitFor();
    const askForReset = async (email: string) => {
      await page.getByLabel(/E-mail/).fill(email);
      const [answer] = await Promise.all([
        page.waitForResponse((r) => r.url().endsWith('/api/auth/password-reset/request')),
        page.getByRole('button', { name: 'Send reset link' }).click(),
      ]);
      expect(answer.status()).toBe(202);
      await page.getByRole('status').filter({ hasText: 'If an account uses that address' }).waitFor();
    };
    // the same answer for an address without an account as for one with
    await askForReset('viewer-reset@example.org');
    await askForReset('grower@example.com');

    const link = await linkFromOutbox(
      /Reset your Thermbay password/,
      /https?:\/\/[^\s]+\/reset-password\/[A-Za-z0-9_-]+/,
    );
    await page.goto(link);
    await page.getByLabel(/^New password/).fill('password');
    await page.getByLabel(/Repeat new password/).fill('password');
    await page.getByRole('button', { name: 'Save new password and sign in' }).click();
    await page.getByText('Use at least 10 characters').first().waitFor();
    await page.getByLabel(/^New password/).fill('grower-new-secret-9');
    await page.getByLabel(/Repeat new password/).fill('grower-new-secret-9');
    await page.getByRole('button', { name: 'Save new password and sign in' }).click();
    await page.waitForURL('**/farms');
    expect(pageErrors).toEqual([]);
    await page.context().close();

    const again = await newPage(browser);
    await signIn(again.page, 'grower@example.com', 'grower-new-secret-9');
    await again.page.context().close();
  });
});
