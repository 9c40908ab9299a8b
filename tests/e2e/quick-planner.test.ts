import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO, screenshotPath, signIn, useBrowserPage } from './support/browser';

describe('the quick planner page', () => {
  let page: Page;

  useBrowserPage(async (opened) => {
    page = opened;
    await signIn(page, DEMO.owner);
  });

  it('plans a pasted list in a Web Worker and compares buying bars with cut to length', async () => {
    await page.getByRole('link', { name: 'Quick planner' }).click();
    await page.waitForURL(/\/planner$/);
    await page.locator('[data-test=parts] textarea').fill('length,qty,label\n1200,9,A\n700,7,B');
    await page.locator('[data-test=stock] textarea').fill('6000,30,');
    await page.locator('[data-test=plan]').click();
    const summary = page.locator('[data-test=summary]');
    await summary.waitFor();
    // By hand: 9 × 1200 + 7 × 700 = 15 700 mm of parts needs at least 3 bars of 6000 mm, and 3 suffice
    // (4 × 1200 + 1 × 700 + 4 kerfs, twice, then 1 × 1200 + 5 × 700 + 5 kerfs).
    expect(await summary.innerText()).toContain('3 bars');
    expect(await summary.innerText()).toContain('Proven optimal');
    await page.getByText('Cut to length:').waitFor();
    await page.screenshot({ path: screenshotPath('quick-planner.png'), fullPage: true });
  });

  it('names the line of a bad list', async () => {
    await page.locator('[data-test=parts] textarea').fill('1200,4,A\nabc,1,B');
    await page.locator('[data-test=plan]').click();
    expect(await page.locator('[data-test=input-error]').innerText()).toContain('line 2: length: "abc"');
  });
});
