import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { computeReport, type FrameReport } from '@shared/engine/report';
import { formatLength } from '@shared/geometry/units';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { screenshotPath } from './support/browser';
import { cutListRows, fieldValue, itemInView, pickMember, toScreen, useScratchFrame } from './editor-helpers';

const qtyOf = (rows: string[][], length: string) => rows.filter((r) => r[2] === length).reduce((n, r) => n + Number(r[3]), 0);

describe('swapping modules re-lays the frame', () => {
  let page: Page;
  const doc = demoFrameDocument();
  let report: FrameReport;

  useScratchFrame('swap', doc, (opened) => {
    page = opened;
    report = computeReport(doc);
  });

  it('moves the upright between the cooler and the tank, changes the cut list, and undo puts it all back', async () => {
    const cooler = doc.modules.find((m) => m.id === 'cooler')!;
    const tank = doc.modules.find((m) => m.id === 'tank')!;
    expect(cooler.size.w_mm).not.toBe(tank.size.w_mm);
    const bayOf = (module: string) => report.bays.find((b) => b.module_id === module)!;
    const coolerBay = bayOf('cooler');
    const tankBay = bayOf('tank');
    expect(tankBay.index).toBe(coolerBay.index + 1);

    // A shelf rail drawn between the uprights either side of the cooler, attached to their faces: it re-lays with them.
    const left = itemInView(report, 'front', 'galley-u1-f');
    const right = itemInView(report, 'front', 'galley-u2-f');
    await page.getByRole('button', { name: /^Draw/ }).click();
    const a = await toScreen(page, 'front', left.x1 + 4, 250);
    const b = await toScreen(page, 'front', right.x0 - 4, 250);
    await page.mouse.move(a.x, a.y);
    await page.mouse.down();
    for (let k = 1; k <= 10; k++) await page.mouse.move(a.x + ((b.x - a.x) * k) / 10, a.y);
    await page.mouse.up();
    await page.getByRole('button', { name: /^Pick/ }).click();

    await pickMember(page, 'galley-u2-f');
    const xBefore = await fieldValue(page, 'part-position-x');
    expect(xBefore).toBe(formatLength(right.x0, 'mm'));
    const rowsBefore = await cutListRows(page);

    // Drag the cooler onto the tank.
    const c = itemInView(report, 'front', 'cooler');
    const t = itemInView(report, 'front', 'tank');
    const from = await toScreen(page, 'front', (c.x0 + c.x1) / 2, (c.y0 + c.y1) / 2 + 60);
    const to = await toScreen(page, 'front', (t.x0 + t.x1) / 2, (t.y0 + t.y1) / 2 + 60);
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    for (let k = 1; k <= 12; k++) await page.mouse.move(from.x + ((to.x - from.x) * k) / 12, from.y + ((to.y - from.y) * k) / 12);
    await page.mouse.up();
    await page.getByTestId('what-changed').waitFor();
    await page.screenshot({ path: screenshotPath('editor-swap.png') });

    // The tank's bay now comes first: the upright between the two bays moves by the difference of the bay widths.
    await pickMember(page, 'galley-u2-f');
    const moved = right.x0 + (tankBay.width_mm - coolerBay.width_mm);
    await expect.poll(() => fieldValue(page, 'part-position-x')).toBe(formatLength(moved, 'mm'));

    // The drawn rail now spans the tank's narrower bay: one part fewer at the cooler bay's width, one more at the tank's.
    // The cut list table follows the report when the page has a moment: poll it.
    const wide = formatLength(coolerBay.width_mm, 'mm');
    const narrow = formatLength(tankBay.width_mm, 'mm');
    await expect
      .poll(async () => {
        const rowsAfter = await cutListRows(page);
        return [qtyOf(rowsAfter, wide), qtyOf(rowsAfter, narrow)];
      })
      .toEqual([qtyOf(rowsBefore, wide) - 1, qtyOf(rowsBefore, narrow) + 1]);

    // Undo: the bays, the upright and the cut list are as before.
    await page.locator('[data-view="front"]').focus();
    await page.keyboard.press('Control+z');
    // The status still says "checked in" for a moment before the undone frame's report is asked for: poll.
    await expect.poll(() => cutListRows(page)).toEqual(rowsBefore);
    await pickMember(page, 'galley-u2-f');
    expect(await fieldValue(page, 'part-position-x')).toBe(xBefore);
    await page.screenshot({ path: screenshotPath('editor-swap-undone.png') });
  });

  it('swaps from the keyboard as well: one bay on with "]"', async () => {
    await page.getByRole('tab', { name: 'Modules' }).click();
    await page.getByRole('list', { name: 'Modules in this frame' }).getByRole('button', { name: /Compressor cooler/ }).click();
    await page.locator('[data-view="front"]').focus();
    await page.keyboard.press(']');
    await page.getByTestId('what-changed').waitFor();
    await pickMember(page, 'galley-u2-f');
    const right = itemInView(report, 'front', 'galley-u2-f');
    const shift = report.bays.find((b) => b.module_id === 'tank')!.width_mm - report.bays.find((b) => b.module_id === 'cooler')!.width_mm;
    await expect.poll(() => fieldValue(page, 'part-position-x')).toBe(formatLength(right.x0 + shift, 'mm'));
  });
});
