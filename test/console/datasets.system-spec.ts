import { randomBytes } from 'node:crypto';
import { startApi, type RunningApi } from '../support/api-process';
import { openBrowser, saveScreenshot, type ConsoleBrowser } from '../support/browser';
import { signIn, teamIdOf } from '../support/console-actions';
import { demoAccounts } from '../support/environment';

let api: RunningApi;
let browser: ConsoleBrowser;
let teamId: string;

// Invented data: average ticket and settlement delay of twelve merchants of a fictional processor,
// with one ticket missing. The expected summaries are worked out here from the same numbers.
const tickets = [18.4, 22.9, 35.1, 41.7, null, 55.2, 63.8, 70.4, 84.6, 91.3, 104.9, 118.2];
const delays = [1.2, 1.4, 1.9, 2.0, 2.3, 2.6, 2.9, 3.1, 3.6, 3.8, 4.3, 4.9];
const csv = [
  'merchant_ref,avg_ticket_eur,settlement_delay_days',
  ...tickets.map((ticket, index) => `QP-${100 + index},${ticket ?? ''},${delays[index]}`),
].join('\n');
const datasetName = `quayside-settlements-${randomBytes(3).toString('hex')}`;

function mean(values: number[]): number {
  return values.reduce((sum, value) => sum + value, 0) / values.length;
}

beforeAll(async () => {
  api = await startApi();
  browser = await openBrowser(api.origin);
  await signIn(browser.page, demoAccounts.developer);
  teamId = teamIdOf(browser.page);
});

afterAll(async () => {
  await browser?.close();
  await api?.stop();
});

describe('datasets, as a developer', () => {
  it('uploads a CSV file with progress and shows its column summaries and rows', async () => {
    const { page } = browser;
    await page.goto(`/teams/${teamId}/datasets`);
    await page.getByRole('heading', { level: 1, name: 'Datasets' }).waitFor();
    await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: `${datasetName}.csv`, mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await expect(page.getByLabel('Dataset name').inputValue()).resolves.toBe(datasetName);
    await page.getByRole('button', { name: 'Upload' }).click();

    await page.getByText(`${datasetName}, version 1: 12 rows, 3 columns.`).waitFor();
    await page.getByRole('progressbar', { name: 'Upload progress' }).waitFor();
    const summary = page.getByRole('table', { name: 'Column summaries' });
    const ticketRow = summary.locator('tr[data-column="avg_ticket_eur"]');
    await ticketRow.waitFor();
    const cells = await ticketRow.getByRole('cell').allTextContents();
    const present = tickets.filter((value): value is number => value !== null);
    // Kind, values, missing, mean (to the six significant digits shown), …, min, max.
    expect(cells[0]).toBe('numeric');
    expect(cells[1]).toBe('11');
    expect(cells[2]).toBe('1');
    expect(Number(cells[3]?.replace(/,/g, ''))).toBeCloseTo(mean(present), 3);
    expect(Number(cells[5])).toBe(Math.min(...present));
    expect(Number(cells[6])).toBe(Math.max(...present));
    await expect(summary.locator('tr[data-column="merchant_ref"]').getByRole('cell').first().textContent()).resolves.toBe('text');

    await page.getByText('Rows 1–12 of 12').waitFor();
    await saveScreenshot(page, 'datasets-uploaded');
  });

  it('groups a second upload under the same name as version 2', async () => {
    const { page } = browser;
    await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: `${datasetName}.csv`, mimeType: 'text/csv', buffer: Buffer.from(`${csv}\nQP-999,130.5,5.2`) });
    await page.getByRole('button', { name: 'Upload' }).click();
    await page.getByText(`${datasetName}, version 2: 13 rows, 3 columns.`).waitFor();
    const group = page.locator(`li[data-dataset-name="${datasetName}"]`);
    await group.getByRole('button', { name: `${datasetName} version 2` }).waitFor();
    await expect(group.getByRole('button', { name: `${datasetName} version 1` }).count()).resolves.toBe(1);
  });

  it('explains which rows of a malformed file are wrong', async () => {
    const { page } = browser;
    const broken = 'avg_ticket_eur,settlement_delay_days\n18.4,1.2\n22.9\n35.1,1.9,7\n';
    await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: 'broken-settlements.csv', mimeType: 'text/csv', buffer: Buffer.from(broken) });
    await page.getByRole('button', { name: 'Upload' }).click();
    const alert = page.getByRole('alert').filter({ hasText: 'Reason' });
    await alert.waitFor();
    const text = (await alert.textContent()) ?? '';
    expect(text).toContain('malformed-row');
    expect(text).toMatch(/Data rows \(header not counted\): 2/);
    await saveScreenshot(page, 'datasets-upload-refused');
  });

  it('opens the playground with a fit on the dataset', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: `${datasetName} version 1` }).click();
    await page.getByRole('button', { name: 'Open in playground' }).click();
    await page.waitForURL(new RegExp(`/teams/${teamId}/playground$`));
    await page.locator('.monaco-editor').waitFor();
    await expect(page.locator('.monaco-editor .view-lines').textContent()).resolves.toContain('datasetId');

    // The first numeric column explained by the next; the row with a missing ticket is left out.
    await page.getByRole('button', { name: 'Send /v1/fits' }).click();
    await page.getByRole('table', { name: 'Coefficients', exact: true }).locator('tr[data-term="settlement_delay_days"]').waitFor();
    await page.getByRole('tab', { name: 'Plots' }).click();
    const scatter = page.locator('figure[aria-label="avg_ticket_eur against settlement_delay_days"]');
    await scatter.locator('.ll-chart-band path').first().waitFor();
    await expect(scatter.locator('.recharts-scatter-symbol').count()).resolves.toBe(11);
  });

  it('deletes a version after confirmation', async () => {
    const { page } = browser;
    await page.goto(`/teams/${teamId}/datasets`);
    await page.getByRole('button', { name: `${datasetName} version 2` }).click();
    await page.getByRole('button', { name: 'Delete version' }).click();
    const dialog = page.getByRole('alertdialog');
    await dialog.getByRole('button', { name: 'Delete version' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByRole('button', { name: `${datasetName} version 2` }).waitFor({ state: 'detached' });
    await expect(page.getByRole('button', { name: `${datasetName} version 1` }).count()).resolves.toBe(1);
  });
});

it('made no request outside the console’s own origin', () => {
  expect(browser.foreignRequests()).toEqual([]);
});
