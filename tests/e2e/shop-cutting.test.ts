import { describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { DEMO, DEMO_PROJECT, newPage, screenshotPath, signIn, useBrowserPage } from './support/browser';

// At the saw on a tablet: the cutter starts cutting, taps cuts done, a second person sees the ticks on reload,
// and the last tick can be undone. A viewer sees the same bars but cannot tick.

async function openCutting(page: Page): Promise<void> {
  await page.getByRole('link', { name: DEMO_PROJECT }).click();
  await page.getByRole('heading', { name: DEMO_PROJECT, level: 1 }).waitFor();
  await page.getByRole('link', { name: 'Cutting' }).first().click();
  await page.waitForURL(/\/frames\/[0-9a-f-]+\/cutting$/);
  await page.getByRole('heading', { name: /^Cutting: /, level: 1 }).waitFor();
}

const overall = (page: Page) => page.getByTestId('overall-count').innerText();

describe('cutting at the saw', () => {
  let browser: Browser;
  let cutter: Page;
  let owner: Page;

  useBrowserPage(async (opened, launched) => {
    browser = launched;
    cutter = opened;
    await cutter.setViewportSize({ width: 1180, height: 820 });
    owner = await newPage(browser);
  });

  it('the cutter starts cutting and sees the first bar in saw order', async () => {
    await signIn(cutter, DEMO.cutter);
    await openCutting(cutter);
    const start = cutter.getByRole('button', { name: 'Start cutting' });
    if (await start.count()) await start.click();
    await cutter.getByTestId('bar-title').waitFor();
    expect(await cutter.getByTestId('bar-title').innerText()).toMatch(/^Bar \d+ of \d+$/);
    expect(await overall(cutter)).toMatch(/^\d+ \/ \d+ cuts$/);
  });

  it('a tap ticks a cut; the count goes up; the server keeps it', async () => {
    const before = Number((await overall(cutter)).split(' ')[0]);
    const next = cutter.locator('button[data-cut][aria-pressed="false"]').first();
    const key = await next.getAttribute('data-cut');
    await next.click();
    await cutter.locator(`button[data-cut="${key}"][aria-pressed="true"]`).waitFor();
    expect(Number((await overall(cutter)).split(' ')[0])).toBe(before + 1);
    await cutter.screenshot({ path: screenshotPath('shop-cutting-tablet.png') });

    await signIn(owner, DEMO.owner);
    await openCutting(owner);
    // The owner's page may open on another bar; the tick is counted in the overall progress either way.
    expect(Number((await overall(owner)).split(' ')[0])).toBe(before + 1);
  });

  it('undo takes the last tick back', async () => {
    const before = Number((await overall(cutter)).split(' ')[0]);
    await cutter.getByRole('button', { name: /^Undo last tick/ }).click();
    await cutter.waitForFunction((n) => document.querySelector('[data-testid="overall-count"]')?.textContent?.startsWith(`${n} /`), before - 1);
    await cutter.reload();
    await cutter.getByTestId('bar-title').waitFor();
    expect(Number((await overall(cutter)).split(' ')[0])).toBe(before - 1);
  });

  it('a viewer sees the bars but cannot tick', async () => {
    const viewer = await newPage(browser);
    await signIn(viewer, DEMO.viewer);
    await openCutting(viewer);
    await viewer.getByText('Read only: your role does not tick cuts').waitFor();
    expect(await viewer.locator('button[data-cut]').first().isDisabled()).toBe(true);
  });
});
