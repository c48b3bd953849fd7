import type { Page } from 'playwright-core';
import { startApi, type RunningApi } from '../support/api-process';
import { openBrowser, saveScreenshot as saveFullPage, type ConsoleBrowser } from '../support/browser';
import { signIn, teamIdOf } from '../support/console-actions';
import { demoAccounts } from '../support/environment';

let api: RunningApi;
let browser: ConsoleBrowser;
let teamId: string;

beforeAll(async () => {
  api = await startApi();
  browser = await openBrowser(api.origin);
  await signIn(browser.page, demoAccounts.developer);
  teamId = teamIdOf(browser.page);
  await browser.page.evaluate(() => window.localStorage.clear());
});

afterAll(async () => {
  await browser?.close();
  await api?.stop();
});

/** The request body as the page's curl snippet carries it (the here-document between <<'JSON' and JSON). */
async function bodyFromCurlSnippet(page: Page): Promise<{ data: { columns: Record<string, number[]> } }> {
  const text = (await page.getByLabel('curl command').textContent()) ?? '';
  const lines = text.split('\n');
  const start = lines.findIndex((line) => line.endsWith("<<'JSON'"));
  return JSON.parse(lines.slice(start + 1, lines.lastIndexOf('JSON')).join('\n'));
}

/** Least-squares slope and intercept of y on x by the closed form Sxy / Sxx, as an outside check. */
function straightLine(x: number[], y: number[]) {
  const meanX = x.reduce((sum, value) => sum + value, 0) / x.length;
  const meanY = y.reduce((sum, value) => sum + value, 0) / y.length;
  let sxy = 0;
  let sxx = 0;
  x.forEach((value, index) => {
    sxy += (value - meanX) * ((y[index] ?? 0) - meanY);
    sxx += (value - meanX) ** 2;
  });
  const slope = sxy / sxx;
  return { slope, intercept: meanY - slope * meanX };
}

/** Full-page screenshots are taken from the top, so the sticky header sits where it belongs. */
async function saveScreenshot(page: Page, name: string) {
  await page.evaluate(() => window.scrollTo(0, 0));
  await saveFullPage(page, name);
}

async function replaceEditorText(page: Page, text: string) {
  await page.locator('.monaco-editor .view-lines').click();
  await page.keyboard.press('Control+A');
  await page.keyboard.press('Delete');
  await page.keyboard.insertText(text);
}

describe('playground, as a developer', () => {
  it('sends the sample fit and shows the coefficient table, fit measures and checks', async () => {
    const { page } = browser;
    await page.goto(`/teams/${teamId}/playground`);
    await page.locator('.monaco-editor').waitFor();
    const body = await bodyFromCurlSnippet(page);
    const expected = straightLine(body.data.columns.avg_ticket_eur ?? [], body.data.columns.chargeback_bps ?? []);

    await page.getByRole('button', { name: 'Send /v1/fits' }).click();
    const table = page.getByRole('table', { name: 'Coefficients', exact: true });
    const slopeRow = table.locator('tr[data-term="avg_ticket_eur"]');
    await slopeRow.waitFor();
    const slopeCells = await slopeRow.getByRole('cell').allTextContents();
    // Shown to six significant digits, so agreement to 1e-5 relative is expected.
    expect(Math.abs(Number(slopeCells[0]) - expected.slope) / Math.abs(expected.slope)).toBeLessThan(1e-5);
    const interceptCells = await table.locator('tr[data-term="(intercept)"]').getByRole('cell').allTextContents();
    expect(Math.abs(Number(interceptCells[0]) - expected.intercept) / Math.abs(expected.intercept)).toBeLessThan(1e-5);

    await page.getByRole('table', { name: 'Analysis of variance' }).waitFor();
    await page.getByRole('table', { name: 'Assumption checks' }).waitFor();
    await expect(page.locator('tr[data-check="durbinWatson"] .rt-Badge').textContent()).resolves.toMatch(/^(Pass|Flag)$/);
    await page.getByRole('table', { name: /Coefficients under the hc3 covariance/ }).waitFor();
    // The answer states its own accuracy beside the numbers: "≤ 2.2e-16 / ≤ 4.4e-16" (estimate / standard error).
    await expect(table.locator('[data-accuracy="avg_ticket_eur"]').textContent()).resolves.toMatch(/^≤ \d\.\de-1[0-9] \/ ≤ \d\.\de-1[0-9]$/);
    await page.getByText('These are estimates that hold only if').first().waitFor();
    await saveScreenshot(page, 'playground-fit-tables');
  });

  it('plots the data with the fitted line and band, the residuals and a normal quantile plot', async () => {
    const { page } = browser;
    await page.getByRole('tab', { name: 'Plots' }).click();
    const scatter = page.locator('figure[aria-label="chargeback_bps against avg_ticket_eur"]');
    await scatter.locator('svg.recharts-surface').first().waitFor();
    await scatter.locator('.ll-chart-band path').first().waitFor();
    await expect(scatter.locator('.recharts-scatter-symbol').count()).resolves.toBe(32);
    await expect(page.locator('figure[aria-label="Residuals against fitted values"] .recharts-scatter-symbol').count()).resolves.toBe(32);
    await expect(page.locator('figure[aria-label="Normal quantile plot of the residuals"] .recharts-scatter-symbol').count()).resolves.toBe(32);
    await saveScreenshot(page, 'playground-fit-plots');

    await page.getByRole('button', { name: 'Switch to dark theme' }).click();
    await saveScreenshot(page, 'playground-fit-plots-dark');
    await page.getByRole('button', { name: 'Switch to light theme' }).click();
  });

  it('draws the coefficient paths of a rolling fit', async () => {
    const { page } = browser;
    await page.getByRole('radio', { name: 'Rolling fit' }).click();
    await page.getByRole('button', { name: 'Send /v1/rolling-fits' }).click();
    await page.getByRole('table', { name: 'Rolling coefficients' }).waitFor();
    await page.getByRole('tab', { name: 'Plots' }).click();
    const path = page.locator('figure[aria-label="Path of benchmark"]');
    await path.locator('.ll-chart-fit-line path').first().waitFor();
    await saveScreenshot(page, 'playground-rolling-plots');
  });

  it('shows the API’s explanation and the offending field of a refused request', async () => {
    const { page } = browser;
    await page.getByRole('radio', { name: 'Fit', exact: true }).click();
    await replaceEditorText(page, '{"data": {"columns": {"fee": [1, 2, 3]}}, "model": {"response": "fee", "predictors": ["missing_col"]}}');
    await page.getByRole('button', { name: 'Send /v1/fits' }).click();
    const alert = page.getByRole('alert').filter({ hasText: 'missing_col' });
    await alert.waitFor();
    await expect(alert.locator('.rt-Badge').first().textContent()).resolves.toMatch(/^4\d\d$/);
    await saveScreenshot(page, 'playground-refused');
  });

  it('checks the request against the API’s own schema and suggests its fields', async () => {
    const { page } = browser;
    await replaceEditorText(page, '{\n  "confidenceLevel": "high",\n  \n}');
    await page.locator('.monaco-editor .squiggly-error').first().waitFor();
    await page.keyboard.press('ArrowUp');
    await page.keyboard.press('End');
    await page.keyboard.press('Control+Space');
    const suggestions = page.locator('.monaco-editor .suggest-widget .monaco-list-row');
    await suggestions.first().waitFor();
    const labels = await suggestions.allTextContents();
    expect(labels.some((label) => label.includes('includeObservations'))).toBe(true);
    await page.keyboard.press('Escape');
    await saveScreenshot(page, 'playground-schema-check');
  });

  it('keeps the recent requests and restores one with its stored result', async () => {
    const { page } = browser;
    await page.getByRole('tab', { name: /^Recent/ }).click();
    const items = page.getByRole('list', { name: 'Recent requests' }).getByRole('listitem');
    await expect(items.count()).resolves.toBe(3);
    await items.last().getByRole('button').click();
    await page.getByRole('table', { name: 'Coefficients', exact: true }).locator('tr[data-term="avg_ticket_eur"]').waitFor();
    await page.getByText('Stored result').waitFor();
  });
});

it('made no request outside the console’s own origin', () => {
  expect(browser.foreignRequests()).toEqual([]);
});
