import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { projectBox, VIEWS } from '@shared/editing/views';
import { buildCabinetRun } from '@shared/model/cabinet-run';
import { reportWithSheetGoods } from '@shared/panels/report-with-goods';
import { defaultDraft, specFromDraft } from '@/editor/cabinet/cabinet-draft';
import { screenshotPath, useBrowserPage } from './support/browser';
import { newWorkshopAndProject, signUp, newFrameFromLayout } from './support/fresh-account';
import { resultsSettled, toScreen } from './editor-helpers';

// A brand-new account lays out the default cabinet (cooler, sink, drawer stack): the drawer boxes, panels and
// countertop are drawn in the views and can be hidden; their hardware is on the hardware list, their mass in the
// total and their parts on the cut list by material.

describe('drawers and panels in the editor’s views, from an empty account', () => {
  let page: Page;
  useBrowserPage(async (opened) => {
    page = opened;
    const stamp = Date.now().toString(36);
    await signUp(page, `drawers-${stamp}@example.test`);
    await newWorkshopAndProject(page, `Van shop ${stamp}`, 'My galley');
    await newFrameFromLayout(page);
  });

  it('draws each drawer box thin and translucent, hides them on request, and lists their hardware and parts', async () => {
    await resultsSettled(page);
    await page.waitForTimeout(300);
    // The engine's own answer for the dialog's default layout, to find a drawer box on the drawing.
    const { goods, report } = reportWithSheetGoods(buildCabinetRun(specFromDraft(defaultDraft())));
    const drawer = goods?.boxes.find((b) => b.kind === 'drawer');
    expect(drawer, 'the default layout has a drawer').toBeDefined();
    if (!drawer) return;
    const r = projectBox(VIEWS.front, { min: [drawer.min_mm.x, drawer.min_mm.y, drawer.min_mm.z], max: [drawer.max_mm.x, drawer.max_mm.y, drawer.max_mm.z] });
    const a = await toScreen(page, 'front', r.x0, r.y1);
    const b = await toScreen(page, 'front', r.x1, r.y0);
    // Inside the box's outline, clear of its edges: what the tint changes.
    const clip = { x: a.x + 4, y: a.y + 4, width: Math.max(4, b.x - a.x - 8), height: Math.max(4, b.y - a.y - 8) };
    const shown = await page.screenshot({ clip });
    await page.screenshot({ path: screenshotPath('drawers-in-views.png') });

    const toggle = page.getByTestId('show-sheet-goods').locator('input');
    expect(await toggle.isChecked()).toBe(true);
    await toggle.click();
    await page.waitForTimeout(200);
    const hidden = await page.screenshot({ clip });
    expect(shown.equals(hidden), 'the drawer box’s tint goes when hidden').toBe(false);
    await page.screenshot({ path: screenshotPath('drawers-hidden.png') });
    await toggle.click();
    await page.waitForTimeout(200);
    expect((await page.screenshot({ clip })).equals(shown), 'and comes back').toBe(true);

    // The drawers' slides, panel screws and drop-in T-nuts are on the hardware list.
    await page.getByRole('tab', { name: 'Hardware' }).click();
    const hw = page.getByRole('table', { name: 'Hardware list' });
    await hw.waitFor();
    const slides = report.hardware.lines.find((l) => l.name.startsWith('Drawer slide pair'));
    expect(slides).toBeDefined();
    await expect.poll(async () => (await hw.innerText()).includes('Drawer slide pair')).toBe(true);
    expect(await hw.innerText()).toContain('T-nut, drop-in');

    // Their mass is in the modules' mass, said on the Weight tab.
    await page.getByRole('tab', { name: 'Weight' }).click();
    expect(await page.getByTestId('goods-mass').innerText()).toContain(`${Math.round((goods?.mass.total_kg ?? 0) * 10) / 10} kg`);
    expect(await page.getByTestId('total-mass').innerText()).toBe(`${Math.round(report.mass.total_kg * 10) / 10} kg`);

    // The sheet parts are on the cut list, by material.
    await page.getByRole('tab', { name: 'Cut list' }).click();
    for (const m of new Set(goods?.parts.map((p) => p.material.name))) await page.getByRole('heading', { name: m }).first().waitFor();
    await page.screenshot({ path: screenshotPath('drawers-cut-list.png') });
  });
});
