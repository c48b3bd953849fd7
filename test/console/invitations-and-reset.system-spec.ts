import { randomBytes } from 'node:crypto';
import { startApi, type RunningApi } from '../support/api-process';
import { openBrowser, saveScreenshot, type ConsoleBrowser } from '../support/browser';
import { signIn, signOut, teamIdOf } from '../support/console-actions';
import { demoAccounts, demoTeamName } from '../support/environment';
import { linkIn, startMailbox, type Mailbox } from '../support/mailbox';

let api: RunningApi;
let mailbox: Mailbox;
let browser: ConsoleBrowser;
let teamId: string;

// A new address per run; the account it creates is removed from the team at the end.
const suffix = randomBytes(3).toString('hex');
const inviteeEmail = `new.analyst.${suffix}@quillfeather.example.test`;
const inviteeName = `Nia Analyst ${suffix} (invented)`;
const firstPassword = `first-pass-${suffix}-long`;
const secondPassword = `second-pass-${suffix}-long`;
let invitationLink = '';

beforeAll(async () => {
  api = await startApi();
  mailbox = startMailbox();
  browser = await openBrowser(api.origin);
});

afterAll(async () => {
  await browser?.close();
  await mailbox?.stop();
  await api?.stop();
});

describe('inviting a member', () => {
  it('sends an invitation from the team page and lists it as open', async () => {
    const { page } = browser;
    await signIn(page, demoAccounts.owner);
    teamId = teamIdOf(page);
    await page.goto(`/teams/${teamId}/team`);
    await page.getByRole('button', { name: 'Invite someone' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('E-mail').fill(inviteeEmail);
    await dialog.getByRole('combobox', { name: 'Role' }).click();
    await page.getByRole('option', { name: 'Billing' }).click();
    await saveScreenshot(page, 'team-invite-dialog');
    await dialog.getByRole('button', { name: 'Send invitation' }).click();
    await dialog.waitFor({ state: 'detached' });
    const row = page.locator(`tr[data-invitation-email="${inviteeEmail}"]`);
    await row.waitFor();
    await expect(row.textContent()).resolves.toContain('Billing');
  });

  it('shows the field the API refused beside its input', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Invite someone' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('E-mail').fill('not-an-address');
    await dialog.getByRole('button', { name: 'Send invitation' }).click();
    const emailInput = dialog.getByLabel('E-mail');
    await dialog.locator('input[aria-invalid="true"]').waitFor();
    await expect(emailInput.getAttribute('aria-invalid')).resolves.toBe('true');
    const describedBy = (await emailInput.getAttribute('aria-describedby')) ?? '';
    const fieldError = dialog.locator(`[id="${describedBy.split(' ')[0]}"]`);
    await expect(fieldError.textContent()).resolves.toMatch(/e-?mail/i);
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await signOut(page);
  });

  it('accepts through the e-mailed link, creating the account and opening the team', async () => {
    const { page } = browser;
    const mail = await mailbox.waitFor(inviteeEmail, 'invited');
    invitationLink = linkIn(mail, '/invitations/accept');
    expect(new URL(invitationLink).origin).toBe(api.origin);

    await page.goto(invitationLink);
    await page.getByRole('heading', { name: `Join ${demoTeamName}` }).waitFor();
    // The one-time token is taken out of the address bar once read.
    expect(new URL(page.url()).hash).toBe('');
    await expect(page.locator('.ll-auth-facts').textContent()).resolves.toContain(inviteeEmail);
    await saveScreenshot(page, 'invitation-accept');

    await page.getByLabel('Your name').fill(inviteeName);
    await page.getByLabel('Password', { exact: true }).fill(firstPassword);
    await page.getByRole('button', { name: 'Create the account and join' }).click();
    await page.waitForURL(new RegExp(`/teams/${teamId}$`));
    await expect(page.locator('.ll-facts').textContent()).resolves.toContain('Billing');
    await signOut(page);
  });

  it('refuses the same link a second time with the API’s explanation', async () => {
    const { page } = browser;
    await page.goto(invitationLink);
    await page.getByRole('heading', { name: 'This invitation cannot be used' }).waitFor();
    await expect(page.getByRole('alert').textContent()).resolves.toContain('already accepted');
    await expect(page.getByLabel('Your name').count()).resolves.toBe(0);
  });
});

describe('resetting a password', () => {
  it('mails a reset link, sets the new password through it and signs in with it', async () => {
    const { page } = browser;
    mailbox.clear();
    await page.goto('/sign-in');
    await page.getByRole('link', { name: 'Reset it by e-mail' }).click();
    await page.getByLabel('E-mail').fill(inviteeEmail);
    await page.getByRole('button', { name: 'Send the reset link' }).click();
    await page.getByRole('heading', { name: 'Check your inbox' }).waitFor();

    const mail = await mailbox.waitFor(inviteeEmail, 'Reset your Leastline password');
    await page.goto(linkIn(mail, '/reset-password'));
    await page.getByRole('heading', { name: 'Choose a new password' }).waitFor();
    expect(new URL(page.url()).hash).toBe('');
    await page.getByLabel('New password', { exact: true }).fill(secondPassword);
    await page.getByLabel('Repeat the new password').fill(secondPassword);
    await saveScreenshot(page, 'reset-password');
    await page.getByRole('button', { name: 'Set the new password' }).click();
    await page.getByRole('heading', { name: 'Password changed' }).waitFor();

    await page.getByRole('link', { name: 'Sign in' }).click();
    await page.getByLabel('E-mail').fill(inviteeEmail);
    await page.getByLabel('Password', { exact: true }).fill(firstPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert').textContent()).resolves.toMatch(/password/i);

    await signIn(page, inviteeEmail, secondPassword);
    expect(teamIdOf(page)).toBe(teamId);
    await signOut(page);
  });
});

describe('cleaning up', () => {
  it('lets the owner remove the new member after confirming', async () => {
    const { page } = browser;
    await signIn(page, demoAccounts.owner);
    await page.goto(`/teams/${teamId}/team`);
    const row = page.locator(`tr[data-member-email="${inviteeEmail}"]`);
    await row.getByRole('button', { name: `Remove ${inviteeName}` }).click();
    await page.getByRole('alertdialog').getByRole('button', { name: 'Remove member' }).click();
    await row.waitFor({ state: 'detached' });
  });

  it('withdraws open invitations this suite sent, after confirming', async () => {
    const { page } = browser;
    // Earlier interrupted runs may have left invitations to addresses of the same invented pattern.
    const leftovers = page.locator('tr[data-invitation-email^="new.analyst."]');
    const toWithdraw = `new.analyst.withdrawn.${suffix}@quillfeather.example.test`;
    await page.getByRole('button', { name: 'Invite someone' }).click();
    await page.getByRole('dialog').getByLabel('E-mail').fill(toWithdraw);
    await page.getByRole('dialog').getByRole('button', { name: 'Send invitation' }).click();
    await page.locator(`tr[data-invitation-email="${toWithdraw}"]`).waitFor();
    for (let remaining = await leftovers.count(); remaining > 0; remaining -= 1) {
      const row = leftovers.first();
      const email = await row.getAttribute('data-invitation-email');
      await row.getByRole('button', { name: `Withdraw the invitation to ${email}` }).click();
      await page.getByRole('alertdialog').getByRole('button', { name: 'Withdraw invitation' }).click();
      await page.locator(`tr[data-invitation-email="${email}"]`).waitFor({ state: 'detached' });
    }
    await expect(leftovers.count()).resolves.toBe(0);
    await signOut(page);
  });

  it('made no request outside the console’s own origin', () => {
    expect(browser.foreignRequests()).toEqual([]);
  });
});
