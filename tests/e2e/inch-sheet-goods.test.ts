import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshotPath, useBrowserPage } from './support/browser';
import { newWorkshopAndProject, signUp, newFrameFromLayout } from './support/fresh-account';

// A workshop in inches and pounds: its frames plan on 8 × 4 ft sheets (96" × 48" exactly, 1 ft = 304.8 mm by the
// 1959 international foot), and sheet densities read and type in lb/ft³ (1 lb/ft³ = 16.018463 kg/m³, same source).

const stamp = Date.now().toString(36);

async function choose(page: Page, testid: string, option: string): Promise<void> {
  await page.getByTestId(testid).click();
  await page.getByRole('option', { name: option }).click();
}

describe('sheet goods in an inch and pound workshop', () => {
  let page: Page;
  useBrowserPage(async (opened) => {
    page = opened;
    await signUp(page, `sheets-${stamp}@example.test`);
    await newWorkshopAndProject(page, `Sheet shop ${stamp}`, 'Van');
    await page.getByRole('link', { name: 'Settings' }).click();
    await page.getByRole('heading', { name: 'Workshop settings', level: 1 }).waitFor();
    await choose(page, 'setting-length-unit', 'Inches to 1/16');
    await choose(page, 'setting-mass', 'Pounds (lb)');
    await page.getByTestId('save-workshop-settings').click();
    await page.getByText('Workshop settings saved').waitFor();
  });

  it('a new frame’s Drawers & panels tab: 96" × 48" sheets, densities in lb/ft³, a bare number read in lb/ft³', async () => {
    await page.getByRole('link', { name: 'Projects' }).click();
    await page.getByRole('link', { name: 'Van' }).click();
    await newFrameFromLayout(page, 'Inch galley');
    await page.getByRole('tab', { name: 'Drawers & panels' }).click();
    await page.getByTestId('plan-sheets').waitFor();
    expect(await page.getByTestId('plan-sheets').innerText()).toContain('96" × 48"');
    expect(await page.getByTestId('sheet-length').locator('input').inputValue()).toBe('96"');
    expect(await page.getByTestId('sheet-width').locator('input').inputValue()).toBe('48"');
    // Birch plywood, typical 680 kg/m³: 680 / 16.018463 = 42.45 → 42.5 lb/ft³.
    const birch = page.getByTestId('density-birch-12').locator('input');
    expect(await birch.inputValue()).toBe('42.5 lb/ft³');
    await birch.fill('40');
    await birch.press('Enter');
    await expect.poll(async () => birch.inputValue()).toBe('40 lb/ft³');
    await page.getByTestId('plan-sheets').click();
    await page.getByRole('list', { name: 'Sheets needed' }).waitFor();
    await page.getByTestId('density-birch-12').scrollIntoViewIfNeeded();
    await page.screenshot({ path: screenshotPath('inch-sheet-goods-densities.png') });
    await page.getByTestId('plan-sheets').scrollIntoViewIfNeeded();
    await page.screenshot({ path: screenshotPath('inch-sheet-goods-sheets.png') });
  });

  it('a metric sheet typed in an inch frame is kept as typed, and 8 × 4 ft is offered rather than put in its place', async () => {
    for (const [id, text] of [['sheet-length', '2440 mm'], ['sheet-width', '1220 mm']] as const) {
      const input = page.getByTestId(id).locator('input');
      await input.fill(text);
      await input.press('Enter');
    }
    const offer = page.getByTestId('use-usual-sheet');
    await offer.waitFor();
    // 2440 mm = 96.06 in → 96 1/16" to the sixteenth.
    expect(await page.getByTestId('sheet-length').locator('input').inputValue()).toBe('96 1/16"');
    await page.screenshot({ path: screenshotPath('inch-sheet-goods-offer.png') });
    await offer.click();
    await expect.poll(async () => page.getByTestId('sheet-length').locator('input').inputValue()).toBe('96"');
    expect(await page.getByTestId('sheet-width').locator('input').inputValue()).toBe('48"');
    expect(await offer.count()).toBe(0);
  });
});
