import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshotPath } from './support/browser';
import { useScratchFrame } from './editor-helpers';

// A table whose 40 kg box overhangs its right-hand cross-member (it tips, by the lever rule), standing on 2 m
// legs of 20×20 (slender columns): the Loads tab shows the tipping error first, then the uprights as columns.
const at = (offset_mm: number) => ({ offset_mm });
const m = (id: string, axis: 'x' | 'y' | 'z', from: number, to: number, place: Record<string, number>, profile = '20x20-s6') => ({
  type: 'member',
  id,
  profile,
  axis,
  start: at(from),
  end: at(to),
  place: Object.fromEntries(Object.entries(place).map(([k, v]) => [k, at(v)])),
});
const doc = {
  schemaVersion: 1,
  name: 'Tipping table',
  members: [
    m('L1', 'z', 0, 2000, { x: 0, y: 0 }),
    m('L2', 'z', 0, 2000, { x: 480, y: 0 }),
    m('L3', 'z', 0, 2000, { x: 0, y: 480 }),
    m('L4', 'z', 0, 2000, { x: 480, y: 480 }),
    m('C1', 'y', 20, 480, { x: 0, z: 1980 }),
    m('C2', 'y', 20, 480, { x: 480, z: 1980 }),
  ],
  modules: [
    { type: 'module', id: 'box', name: 'Storage box', kind: 'other', size: { w_mm: 1100, d_mm: 400, h_mm: 300 }, mass_kg: 40, bearing: 'base', place: { x: at(0), y: at(50), z: at(2000) } },
  ],
};

describe('the Loads tab', () => {
  let page: Page;
  useScratchFrame('loads', doc, (opened) => {
    page = opened;
  });

  it('leads with the tipping error, lists the legs as columns, and refuses a shock factor out of bounds', async () => {
    await page.getByRole('tab', { name: /^Loads/ }).click();
    await expect.poll(() => page.getByText(/“Storage box” tips off toward the right/).count()).toBeGreaterThan(0);
    const columns = page.getByTestId('loads-columns');
    await columns.waitFor();
    expect(await columns.locator('li').count()).toBeGreaterThan(0);
    expect(await columns.innerText()).toMatch(/Buckling governs/);
    await page.screenshot({ path: screenshotPath('editor-loads.png'), fullPage: true });

    // Bolt the top of one leg to the wall: the Loads tab lists what that fixing must take, named by part mark.
    await columns.locator('button').first().click();
    await page.getByRole('tab', { name: 'Part' }).click();
    await page.getByTestId('wall-fixing-end').locator('input').check();
    await page.getByRole('tab', { name: /^Loads/ }).click();
    const wall = page.getByTestId('loads-wall-fixing').first();
    await wall.waitFor();
    expect(await wall.innerText()).toMatch(/^Wall at upright [A-Z]+.*: \d+ N down, \d+ N across/);
    await page.screenshot({ path: screenshotPath('editor-loads-wall.png'), fullPage: true });

    const shock = page.getByTestId('load-case-settings').getByLabel('Vertical shock factor');
    await shock.scrollIntoViewIfNeeded();
    await page.screenshot({ path: screenshotPath('editor-loads-settings.png') });
    await shock.fill('30');
    await shock.press('Enter');
    await expect.poll(() => page.getByRole('alert').filter({ hasText: 'Vertical shock factor: must be at most 20' }).count()).toBeGreaterThan(0);
  }, 60_000);
});
