import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { computeReport } from '@shared/engine/report';
import { formatLength } from '@shared/geometry/units';
import { buildCabinetRun, parseCabinetSpec } from '@shared/model/cabinet-run';
import { sheetGoods } from '@shared/panels/index';
import { screenshotPath } from './support/browser';
import { useScratchFrame } from './editor-helpers';

// The example side galley (invented). Side-mount slides take 1/2 in a side (common practice, no source): the drawer
// over the cooler, 420 mm between the uprights, gets a box 420 − 25.4 = 394.6 mm wide.
const spec = parseCabinetSpec(JSON.parse(readFileSync(new URL('../../scripts/examples/side-galley-spec.json', import.meta.url), 'utf8')));
const doc = buildCabinetRun(spec);

describe('the Drawers & panels tab', () => {
  let page: Page;
  useScratchFrame('drawers', doc, (opened) => {
    page = opened;
  });

  it('lists each drawer box in the builder’s unit, groups the sheet parts by material and plans the sheets', async () => {
    await page.getByRole('tab', { name: 'Drawers & panels' }).click();
    const row = page.getByTestId('drawer-cooler-drawer');
    await row.waitFor();
    expect(await row.textContent()).toContain(`${formatLength(394.6, 'mm')} × ${formatLength(114.6, 'mm')} × ${formatLength(500, 'mm')}`);
    // The builder's own slide: 10 mm a side from its sheet → 420 − 2·10 = 400 mm wide.
    const side = page.getByTestId('slide-sideDeduction_mm').locator('input');
    await side.fill('10 mm');
    await side.press('Enter');
    await expect.poll(async () => (await row.textContent()) ?? '').toContain(`${formatLength(400, 'mm')} × ${formatLength(114.6, 'mm')}`);
    const goods = sheetGoods(computeReport(doc));
    for (const m of new Set(goods.parts.map((p) => p.material.name))) await page.getByRole('heading', { name: m }).waitFor();
    await page.getByTestId('plan-sheets').click();
    const sheets = page.getByRole('list', { name: 'Sheets needed' });
    await sheets.waitFor();
    expect(await sheets.locator('li').count()).toBe(new Set(goods.parts.map((p) => p.material.id)).size);
    // An offcut on hand is taken before a bought sheet.
    await page.getByTestId('add-offcut').click();
    await page.getByTestId('plan-sheets').click();
    await expect.poll(async () => (await sheets.innerText()).includes('from offcuts on hand')).toBe(true);
    await page.screenshot({ path: screenshotPath('editor-drawers.png') });
  });
});
