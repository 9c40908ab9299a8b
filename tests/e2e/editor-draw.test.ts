import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { computeReport, type FrameReport } from '@shared/engine/report';
import { formatLength } from '@shared/geometry/units';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { screenshotPath } from './support/browser';
import { cutListRows, dragAcrossOpening, fieldValue, itemInView, useScratchFrame } from './editor-helpers';

describe('drawing in the frame editor', () => {
  let page: Page;
  const doc = demoFrameDocument();
  let report: FrameReport;

  useScratchFrame('drawing', doc, (opened) => {
    page = opened;
    report = computeReport(doc);
  });

  it('draws a rail between two uprights and lists its cut length, face to face', async () => {
    // The front uprights either side of the cooler's bay.
    const left = itemInView(report, 'front', 'galley-u1-f');
    const right = itemInView(report, 'front', 'galley-u2-f');
    // A butting member is cut to the distance between the faces it meets (DOMAIN.md; no machining allowance set).
    const expected = right.x0 - left.x1;
    const z = 250;

    await page.getByRole('button', { name: /^Draw/ }).click();
    // Start and finish a little inside the opening: the ends snap to the uprights' faces.
    await dragAcrossOpening(page, left, right, z);

    await expect.poll(() => page.getByTestId('part-cut-length').innerText()).toBe(formatLength(expected, 'mm'));
    await page.screenshot({ path: screenshotPath('editor-draw-rail.png') });

    const rows = await cutListRows(page);
    const line = rows.find((r) => r[2] === formatLength(expected, 'mm'));
    expect(line, `a cut list line of ${expected} mm`).toBeDefined();
    // The bay's own four rails are the same length, so the new rail joins their line.
    const before = computeReport(doc).cut_list.find((l) => Math.abs(l.cut_length_mm - expected) < 0.05);
    expect(Number(line![3])).toBe((before?.qty ?? 0) + 1);
  });

  it('turns a typed "29 1/2 in" into 749.3 mm', async () => {
    await page.getByRole('tab', { name: 'Part' }).click();
    const field = page.getByTestId('part-length').locator('input');
    await field.fill('29 1/2 in');
    await field.press('Enter');
    // 29.5 × 25.4 mm = 749.3 mm exactly (25.4 mm to the inch by definition).
    await expect.poll(() => fieldValue(page, 'part-length')).toBe('749.3 mm');
  });

  it('refuses a length it cannot read, says why, and keeps the last good value', async () => {
    const field = page.getByTestId('part-length').locator('input');
    await field.fill('about a metre');
    await field.press('Enter');
    await page.getByTestId('part-length').getByText(/could not be read|not a unit/).waitFor();
    await field.press('Escape');
    expect(await fieldValue(page, 'part-length')).toBe('749.3 mm');
  });

  it('undoes the drawing with Ctrl+Z', async () => {
    const rows = await cutListRows(page);
    const count = rows.reduce((n, r) => n + Number(r[3]), 0);
    await page.locator('[data-view="front"]').focus();
    await page.keyboard.press('Control+z'); // the length
    await page.keyboard.press('Control+z'); // the rail
    // The cut list follows the document a moment after the key: poll it rather than read it once.
    await expect
      .poll(async () => (await cutListRows(page)).reduce((n, r) => n + Number(r[3]), 0))
      .toBe(count - 1);
    expect(count - 1).toBe(report.members.length);
  });
});
