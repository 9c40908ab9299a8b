import { mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';

const CHROMIUM = '/usr/bin/chromium';
const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking'];

/** Where screenshots go (git-ignored). */
export const outputDir = join(dirname(fileURLToPath(import.meta.url)), '../../../test-output');

/** The running app under test, e.g. http://127.0.0.1:3999 (set by scripts/test.ts). */
export function baseUrl(): string {
  const url = process.env.E2E_BASE_URL;
  if (!url) {
    throw new Error(
      'E2E_BASE_URL is not set. Run the browser tests through `npm test` (it builds the client, starts the server ' +
        'on a seeded test database and sets it), or point it at a running app: E2E_BASE_URL=http://127.0.0.1:3000',
    );
  }
  return url.replace(/\/+$/, '');
}

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM, args: CHROMIUM_ARGS });
}

/** A fresh context (own cookies) with a desktop-sized window. */
export async function newPage(browser: Browser): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1360, height: 860 }, baseURL: baseUrl() });
  const page = await context.newPage();
  page.setDefaultTimeout(15_000);
  return page;
}

/**
 * For a describe block: launches the browser and opens a fresh page before its tests, and closes the browser after.
 * `ready` receives the open page (keep it, and sign in or open a frame there) and the browser for any further
 * pages; `beforeClose` tidies up with the page still open, e.g. deletes what the tests created.
 */
export function useBrowserPage(
  ready: (page: Page, browser: Browser) => void | Promise<void>,
  beforeClose?: (page: Page) => void | Promise<void>,
): void {
  let browser: Browser | undefined;
  let page: Page | undefined;
  beforeAll(async () => {
    browser = await launchBrowser();
    page = await newPage(browser);
    await ready(page, browser);
  });
  afterAll(async () => {
    if (page && beforeClose) await beforeClose(page);
    await browser?.close();
  });
}

export const DEMO_PASSWORD = 'slotwright-demo';
export const DEMO = {
  owner: 'dana@slotwright.test',
  designer: 'rui@slotwright.test',
  cutter: 'sam@slotwright.test',
  viewer: 'jo@slotwright.test',
  client: 'lee@slotwright.test',
} as const;
export const DEMO_PROJECT = 'Rear kitchen pod — short-wheelbase van';

/** Signs in through the form and waits for the projects page of the chosen workshop. */
export async function signIn(page: Page, email: string, password: string = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL(/\/w\/[0-9a-f-]+$/);
  await page.getByRole('heading', { name: 'Projects', level: 1 }).waitFor();
}

/** From the projects page, opens the demo project and then its first frame; returns the frame page's URL. */
export async function openDemoFrame(page: Page): Promise<string> {
  await page.getByRole('link', { name: DEMO_PROJECT }).click();
  await page.getByRole('heading', { name: DEMO_PROJECT, level: 1 }).waitFor();
  await page.getByRole('list', { name: 'Frames' }).getByRole('link').first().click();
  await page.waitForURL(/\/frames\/[0-9a-f-]+$/);
  // The facts card appears with the loaded frame, and the page title with it.
  await page.getByText('Saved versions').waitFor();
  await page.getByRole('heading', { level: 1 }).waitFor();
  return page.url();
}

export function screenshotPath(name: string): string {
  mkdirSync(outputDir, { recursive: true });
  return join(outputDir, name);
}
