import { startApi, type RunningApi } from '../support/api-process';
import { openBrowser, saveScreenshot, type ConsoleBrowser } from '../support/browser';
import { navLabels, signIn, signOut, teamIdOf } from '../support/console-actions';
import { demoAccounts, demoTeamName, type DemoRole } from '../support/environment';

let api: RunningApi;
let browser: ConsoleBrowser;

beforeAll(async () => {
  api = await startApi();
  browser = await openBrowser(api.origin);
});

afterAll(async () => {
  await browser?.close();
  await api?.stop();
});

// Expected from the permission table in README.md: which console sections each role can use.
const expectedNav: Record<DemoRole, string[]> = {
  owner: ['Overview', 'Playground', 'Datasets', 'API keys', 'Team', 'Usage', 'Billing'],
  admin: ['Overview', 'API keys', 'Team', 'Usage'],
  developer: ['Overview', 'Playground', 'Datasets', 'API keys', 'Team'],
  billing: ['Overview', 'Team', 'Usage', 'Billing'],
};

describe('signing in', () => {
  it('sends a visitor without a session to the sign-in page and back to the page asked for', async () => {
    const { page } = browser;
    await page.goto('/teams/00000000-0000-4000-8000-000000000000/api-keys');
    await page.waitForURL(/\/sign-in\?next=/);
    expect(new URL(page.url()).searchParams.get('next')).toBe('/teams/00000000-0000-4000-8000-000000000000/api-keys');
    await saveScreenshot(page, 'sign-in');
  });

  it('shows the API’s explanation when the password is wrong', async () => {
    const { page } = browser;
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(demoAccounts.admin);
    await page.getByLabel('Password', { exact: true }).fill('not-the-right-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    const alert = page.getByRole('alert');
    await expect(alert.textContent()).resolves.toMatch(/e-mail address or password/i);
    expect(page.url()).toMatch(/\/sign-in/);
  });
});

describe.each(Object.keys(demoAccounts) as DemoRole[])('signed in as the %s', (role) => {
  beforeAll(async () => {
    await signIn(browser.page, demoAccounts[role]);
  });

  afterAll(async () => {
    await signOut(browser.page);
  });

  it('lists only the sections this role may use and names the team and role', async () => {
    const { page } = browser;
    expect(await navLabels(page)).toEqual(expectedNav[role]);
    await expect(page.getByRole('button', { name: `Team: ${demoTeamName}. Switch team` }).isVisible()).resolves.toBe(true);
    const roleLabel = { owner: 'Owner', admin: 'Admin', developer: 'Developer', billing: 'Billing' }[role];
    await expect(page.locator('.ll-facts').textContent()).resolves.toContain(roleLabel);
    await saveScreenshot(page, `overview-${role}`);
  });

  it('offers key actions only where the role may act', async () => {
    const { page } = browser;
    await page.goto(`/teams/${teamIdOf(page)}/api-keys`);
    await page.getByRole('heading', { level: 1, name: 'API keys' }).waitFor();
    const createButton = page.getByRole('button', { name: 'Create key' });
    if (role === 'owner' || role === 'admin') {
      await createButton.waitFor();
      // The seeded demo key is visible to owners and admins, with its actions.
      await page.getByRole('button', { name: /^Revoke / }).first().waitFor();
    } else if (role === 'developer') {
      await page.getByText('have not allowed developers to create their own keys').waitFor();
      await expect(createButton.count()).resolves.toBe(0);
    } else {
      await page.getByRole('heading', { name: 'API keys are not part of your role' }).waitFor();
      await expect(createButton.count()).resolves.toBe(0);
      await expect(page.getByRole('button', { name: /^(Rotate|Revoke) / }).count()).resolves.toBe(0);
    }
    await saveScreenshot(page, `api-keys-${role}`);
  });

  it('offers member management, invitations and the audit log only to owners and admins', async () => {
    const { page } = browser;
    await page.goto(`/teams/${teamIdOf(page)}/team`);
    await page.getByRole('heading', { level: 2, name: 'Members' }).waitFor();
    await page.locator(`tr[data-member-email="${demoAccounts.billing}"]`).waitFor();
    const manages = role === 'owner' || role === 'admin';
    await expect(page.getByRole('button', { name: 'Invite someone' }).count()).resolves.toBe(manages ? 1 : 0);
    await expect(page.getByRole('heading', { name: 'Audit log' }).count()).resolves.toBe(manages ? 1 : 0);
    await expect(page.getByRole('heading', { name: 'Ownership' }).count()).resolves.toBe(role === 'owner' ? 1 : 0);
    const roleSelects = await page.getByRole('combobox', { name: /^Role of / }).count();
    if (manages) expect(roleSelects).toBeGreaterThan(0);
    else expect(roleSelects).toBe(0);
    if (manages) await page.locator('[data-audit-action]').first().waitFor();
    await saveScreenshot(page, `team-${role}`);
  });
});

describe('appearance', () => {
  it('renders the overview in the dark theme', async () => {
    const { page } = browser;
    await signIn(page, demoAccounts.owner);
    await page.getByRole('button', { name: 'Switch to dark theme' }).click();
    await expect(page.evaluate(() => document.documentElement.classList.contains('dark'))).resolves.toBe(true);
    await saveScreenshot(page, 'overview-owner-dark');
    await page.getByRole('button', { name: 'Switch to light theme' }).click();
    await signOut(page);
  });
});

it('made no request outside the console’s own origin', () => {
  expect(browser.requests.length).toBeGreaterThan(10);
  expect(browser.foreignRequests()).toEqual([]);
});
