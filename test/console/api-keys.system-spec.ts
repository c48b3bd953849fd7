import { randomBytes } from 'node:crypto';
import type { Locator, Page } from 'playwright-core';
import { startApi, type RunningApi } from '../support/api-process';
import { openBrowser, saveScreenshot, type ConsoleBrowser } from '../support/browser';
import { signIn, teamIdOf } from '../support/console-actions';
import { demoAccounts } from '../support/environment';
import { startMailbox, type Mailbox } from '../support/mailbox';
import { describeKey } from '../support/public-api';

let api: RunningApi;
let mailbox: Mailbox;
let browser: ConsoleBrowser;
let teamId: string;

// A unique name per run: revoked keys stay listed, so reruns must not trip over earlier ones.
const keyName = `settlement-forecast job ${randomBytes(3).toString('hex')} (invented)`;
const keyShape = /^llsq1_[0-9a-hjkmnp-tv-z]{12}_[0-9a-hjkmnp-tv-z]{40}_[0-9a-hjkmnp-tv-z]{8}$/;
let firstKey = '';
let rotatedKey = '';

beforeAll(async () => {
  api = await startApi();
  mailbox = startMailbox();
  browser = await openBrowser(api.origin);
  await signIn(browser.page, demoAccounts.admin);
  teamId = teamIdOf(browser.page);
});

afterAll(async () => {
  await browser?.close();
  await mailbox?.stop();
  await api?.stop();
});

function rowOf(page: Page, name: string, state?: string): Locator {
  const rows = page.locator('tr[data-key-id]').filter({ hasText: name });
  return state ? rows.filter({ hasText: state }) : rows;
}

async function readRevealedKey(page: Page): Promise<string> {
  const shown = page.getByTestId('new-api-key');
  await shown.waitFor();
  return (await shown.textContent())?.trim() ?? '';
}

describe('API keys, as an admin', () => {
  it('creates a key and shows the full key exactly once, with a working copy button', async () => {
    const { page } = browser;
    await page.goto(`/teams/${teamId}/api-keys`);
    await page.getByRole('button', { name: 'Create key' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Name').fill(keyName);
    await dialog.getByRole('checkbox').nth(3).click(); // "Read usage", beside the preselected "Run fits"
    await dialog.getByRole('button', { name: 'Create key' }).click();

    firstKey = await readRevealedKey(page);
    expect(firstKey).toMatch(keyShape);
    await expect(dialog.textContent()).resolves.toContain('shown only this once');
    await saveScreenshot(page, 'api-keys-created-once');

    await dialog.getByRole('button', { name: 'Copy key' }).click();
    await dialog.getByRole('button', { name: 'Copied' }).waitFor();
    await expect(page.evaluate(() => navigator.clipboard.readText())).resolves.toBe(firstKey);

    await dialog.getByRole('button', { name: 'I have stored the key' }).click();
    await dialog.waitFor({ state: 'detached' });
    await expect(page.getByTestId('new-api-key').count()).resolves.toBe(0);
    await expect(page.content()).resolves.not.toContain(firstKey);

    const row = rowOf(page, keyName);
    await row.waitFor();
    await expect(row.textContent()).resolves.toMatch(/fits:run.*usage:read/);
    await expect(row.textContent()).resolves.toContain('You');
    await expect(row.textContent()).resolves.toContain('Active');
  });

  it('issues a key the public API accepts, with the chosen scopes', async () => {
    const answer = await describeKey(api.origin, firstKey);
    expect(answer.status).toBe(200);
    expect(answer.body.scopes).toEqual(['fits:run', 'usage:read']);
    expect(answer.body.teamId).toBe(teamId);
  });

  it('rotates the key with a one-hour overlap: both keys work and the creator is told by e-mail', async () => {
    const { page } = browser;
    mailbox.clear();
    await rowOf(page, keyName, 'Active').getByRole('button', { name: `Rotate ${keyName}` }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('radio', { name: 'Overlap 1 hour' }).click();
    await saveScreenshot(page, 'api-keys-rotate');
    await dialog.getByRole('button', { name: 'Rotate key' }).click();

    rotatedKey = await readRevealedKey(page);
    expect(rotatedKey).toMatch(keyShape);
    expect(rotatedKey).not.toBe(firstKey);
    await dialog.getByRole('button', { name: 'I have stored the key' }).click();

    await rowOf(page, keyName, 'Retiring').waitFor();
    await rowOf(page, keyName, 'Active').waitFor();
    expect((await describeKey(api.origin, firstKey)).status).toBe(200);
    expect((await describeKey(api.origin, rotatedKey)).status).toBe(200);

    const notice = await mailbox.waitFor(demoAccounts.admin, keyName);
    expect(notice.text).toContain('keeps working until');
  });

  it('revokes after confirmation, and the public API refuses the key at once', async () => {
    const { page } = browser;
    for (const state of ['Retiring', 'Active']) {
      await rowOf(page, keyName, state).getByRole('button', { name: `Revoke ${keyName}` }).click();
      const confirm = page.getByRole('alertdialog');
      await confirm.getByRole('button', { name: 'Revoke key' }).click();
      await confirm.waitFor({ state: 'detached' });
    }
    await expect(rowOf(page, keyName).count()).resolves.toBe(0);

    await page.getByRole('radio', { name: /^All/ }).click();
    await expect(rowOf(page, keyName, 'Revoked').count()).resolves.toBe(2);

    for (const key of [firstKey, rotatedKey]) {
      const answer = await describeKey(api.origin, key);
      expect(answer.status).toBe(401);
      expect(String(answer.body.type)).toMatch(/\/api-key-revoked$/);
    }
  });

  it('records creation, rotation and revocation in the audit log, filterable by action', async () => {
    const { page } = browser;
    await page.goto(`/teams/${teamId}/team`);
    await page.getByRole('combobox', { name: 'Action' }).click();
    await page.getByRole('option', { name: 'API key rotated' }).click();
    const rows = page.locator('tr[data-audit-action]');
    await rows.first().waitFor();
    const actions = await rows.evaluateAll((elements) => elements.map((element) => element.getAttribute('data-audit-action')));
    expect(new Set(actions)).toEqual(new Set(['api-key.rotated']));
    await expect(rows.first().textContent()).resolves.toContain(keyName);
  });

  it('made no request outside the console’s own origin', () => {
    expect(browser.foreignRequests()).toEqual([]);
  });
});
