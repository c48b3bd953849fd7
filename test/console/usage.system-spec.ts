import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { startApi, type RunningApi } from '../support/api-process';
import { openBrowser, saveScreenshot as saveFullPage, type ConsoleBrowser } from '../support/browser';
import { signIn, signOut, teamIdOf } from '../support/console-actions';
import { demoAccounts } from '../support/environment';

let api: RunningApi;
let browser: ConsoleBrowser;
let teamId: string;

beforeAll(async () => {
  api = await startApi();
  browser = await openBrowser(api.origin);
});

afterAll(async () => {
  await browser?.close();
  await api?.stop();
});

async function saveScreenshot(page: Page, name: string) {
  await page.evaluate(() => window.scrollTo(0, 0));
  await saveFullPage(page, name);
}

/** The numbers of the "By endpoint" row for /v1/fits: requests, units, observations. */
async function fitsRow(page: Page): Promise<number[]> {
  const row = page.getByRole('table', { name: 'Usage by endpoint' }).locator('tr[data-usage-key="fits"]');
  await row.waitFor();
  return (await row.getByRole('cell').allTextContents()).map((text) => Number(text.replace(/,/g, '')));
}

describe('usage, as the owner', () => {
  let before: number[] = [0, 0, 0];

  beforeAll(async () => {
    await signIn(browser.page, demoAccounts.owner);
    teamId = teamIdOf(browser.page);
  });

  it('counts a fit sent from the playground', async () => {
    const { page } = browser;
    await page.goto(`/teams/${teamId}/usage`);
    await page.getByTestId('usage-totals').waitFor();
    const hasFits = (await page.locator('tr[data-usage-key="fits"]').count()) > 0;
    if (hasFits) before = await fitsRow(page);

    await page.goto(`/teams/${teamId}/playground`);
    await page.locator('.monaco-editor').waitFor();
    await page.getByRole('button', { name: 'Send /v1/fits' }).click();
    await page.getByRole('table', { name: 'Coefficients', exact: true }).waitFor();

    await page.goto(`/teams/${teamId}/usage`);
    const after = await fitsRow(page);
    // The sample fit has 32 rows: 1 model + ceil(32 / 10 000) = 2 units, by the units rule the API states.
    expect(after[0]).toBe(before[0]! + 1);
    expect(after[1]).toBe(before[1]! + 2);
    expect(after[2]).toBe(before[2]! + 32);
    await page.locator('.ll-usage-chart svg.recharts-surface').first().waitFor();
    await page.locator('.ll-usage-units .recharts-rectangle').first().waitFor();
    await expect(page.getByTestId('units-this-period').textContent()).resolves.toMatch(/of [\d,]+ units/);
    await saveScreenshot(page, 'usage-owner');
  });

  it('exports the rows as CSV', async () => {
    const { page } = browser;
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export CSV' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^leastline-usage-\d{4}-\d{2}-\d{2}-to-\d{4}-\d{2}-\d{2}\.csv$/);
    const text = readFileSync((await download.path()) ?? '', 'utf8');
    const lines = text.trim().split('\r\n');
    expect(lines[0]).toBe('day,api_key_id,endpoint,requests,units,observations');
    expect(lines.some((line) => /^\d{4}-\d{2}-\d{2},,fits,\d+,\d+,\d+$/.test(line))).toBe(true);
  });

  afterAll(async () => {
    await signOut(browser.page);
  });
});

describe('usage, by role', () => {
  it('is shown to billing members, in the dark theme too', async () => {
    const { page } = browser;
    await signIn(page, demoAccounts.billing);
    await page.goto(`/teams/${teamId}/usage`);
    const row = await fitsRow(page);
    expect(row[0]).toBeGreaterThan(0);
    await page.getByRole('button', { name: 'Switch to dark theme' }).click();
    await page.locator('.ll-usage-chart svg.recharts-surface').first().waitFor();
    await saveScreenshot(page, 'usage-billing-dark');
    await page.getByRole('button', { name: 'Switch to light theme' }).click();
    await signOut(page);
  });

  it('tells a developer that the role cannot see usage', async () => {
    const { page } = browser;
    await signIn(page, demoAccounts.developer);
    await page.goto(`/teams/${teamId}/usage`);
    await page.getByRole('heading', { name: 'Your role cannot see usage' }).waitFor();
    await expect(page.getByTestId('usage-totals').count()).resolves.toBe(0);
    await signOut(page);
  });
});

it('made no request outside the console’s own origin', () => {
  expect(browser.foreignRequests()).toEqual([]);
});
