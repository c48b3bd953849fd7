import { expect } from '@jest/globals';
import type { Page } from 'playwright-core';
import { demoPassword } from './environment';

/** Signs in through the console's own form and waits for a team page. */
export async function signIn(page: Page, email: string, password = demoPassword): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/teams\/[0-9a-f-]+/);
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: /^Account menu/ }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.waitForURL(/\/sign-in/);
}

/** The team id in the address of a team page. */
export function teamIdOf(page: Page): string {
  const match = new URL(page.url()).pathname.match(/^\/teams\/([0-9a-f-]+)/);
  if (!match?.[1]) throw new Error(`Not on a team page: ${page.url()}`);
  return match[1];
}

export async function navLabels(page: Page): Promise<string[]> {
  const nav = page.getByRole('navigation', { name: 'Main' });
  const labels = await nav.locator('.ll-nav-label').allTextContents();
  expect(labels.length).toBeGreaterThan(0);
  return labels;
}
