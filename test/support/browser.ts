import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

const chromiumArgs = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export const screenshotDirectory = join(__dirname, '..', '..', '.artifacts', 'screenshots');

export type ConsoleBrowser = {
  context: BrowserContext;
  page: Page;
  /** Every URL the browser asked for, in order. */
  requests: string[];
  /** Requests that went anywhere but the console's own origin (data: and blob: URLs stay in the page). */
  foreignRequests: () => string[];
  close: () => Promise<void>;
};

/** A fresh Chromium profile for one test file: no cookies, no storage, nothing shared with other runs. */
export async function openBrowser(origin: string, options: { colorScheme?: 'light' | 'dark' } = {}): Promise<ConsoleBrowser> {
  const userDataDir = mkdtempSync(join(tmpdir(), 'leastline-console-'));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: process.env.LEASTLINE_CHROMIUM || '/usr/bin/chromium',
    headless: true,
    args: chromiumArgs,
    viewport: { width: 1280, height: 800 },
    colorScheme: options.colorScheme ?? 'light',
    permissions: ['clipboard-read', 'clipboard-write'],
    baseURL: origin,
  });
  const requests: string[] = [];
  context.on('request', (request) => requests.push(request.url()));
  const page = context.pages()[0] ?? (await context.newPage());
  page.setDefaultTimeout(15_000);

  return {
    context,
    page,
    requests,
    foreignRequests: () =>
      requests.filter((url) => !url.startsWith(`${origin}/`) && !url.startsWith('data:') && !url.startsWith('blob:')),
    close: async () => {
      await context.close();
      rmSync(userDataDir, { recursive: true, force: true });
    },
  };
}

export async function saveScreenshot(page: Page, name: string): Promise<void> {
  mkdirSync(screenshotDirectory, { recursive: true });
  await page.screenshot({ path: join(screenshotDirectory, `${name}.png`), fullPage: true });
}
