import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshotPath, useBrowserPage } from './support/browser';
import { computeReport } from '@shared/engine/report';
import { formatLength } from '@shared/geometry/units';
import { buildCabinetRun } from '@shared/model/cabinet-run';
import { defaultDraft, specFromDraft } from '@/editor/cabinet/cabinet-draft';
import { bearingByModule, fieldValue, itemInView, pickMember, resultsSettled, toScreen } from './editor-helpers';
import { newWorkshopAndProject, signUp, newFrameFromLayout } from './support/fresh-account';

// From a brand-new account: a bay moved along the run by dragging its module on the canvas, and a bay's stack
// edited in the Bays tab (a shelf added over the cooler, the cooler made taller, the two swapped, the shelf removed).

const whatChanged = (page: Page) => page.getByTestId('what-changed').innerText();

describe('bays reordered on the canvas and stacks edited in the editor, on a cabinet of one’s own', () => {
  let page: Page;
  useBrowserPage(async (opened) => {
    page = opened;
    await signUp(page, `bays-${Date.now().toString(36)}@example.test`);
    await newWorkshopAndProject(page, 'Van shop', 'My galley');
    await newFrameFromLayout(page);
  });

  it('drags the cooler’s bay to the end of the run; the uprights follow; undo puts it back', async () => {
    // The dialog's default layout (cooler, sink, drawer stack), worked out by the engine to find things on screen.
    const report = computeReport(buildCabinetRun({ ...specFromDraft(defaultDraft()), name: 'Galley cabinet' }));
    const [cooler, sink] = report.bays;
    await pickMember(page, 'run-u1-f');
    const xBefore = await fieldValue(page, 'part-position-x');

    const box = itemInView(report, 'front', 'compressor-cooler');
    const from = await toScreen(page, 'front', (box.x0 + box.x1) / 2, (box.y0 + box.y1) / 2);
    // Past the drawer stack, at the run's far end: the boundary after the last bay.
    const end = report.bays[report.bays.length - 1].end_mm;
    const to = await toScreen(page, 'front', end + 15, (box.y0 + box.y1) / 2);
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    for (let k = 1; k <= 12; k++) await page.mouse.move(from.x + ((to.x - from.x) * k) / 12, from.y);
    await page.screenshot({ path: screenshotPath('own-cabinet-bay-drag.png') });
    await page.mouse.up();
    await expect.poll(() => whatChanged(page)).toMatch(/Move bay 1 to the end of the run/);

    // The sink's bay comes first now: the first inner upright stands after it instead of after the cooler's.
    await pickMember(page, 'run-u1-f');
    expect(await fieldValue(page, 'part-position-x')).toBe(formatLength(cooler.end_mm + sink.width_mm - cooler.width_mm, 'mm'));
    await page.getByRole('tab', { name: 'Bays' }).click();
    await expect.poll(() => page.getByTestId('bay-3').innerText()).toMatch(/Compressor cooler/);

    await page.locator('[data-view="front"]').focus();
    await page.keyboard.press('Control+z');
    await pickMember(page, 'run-u1-f');
    await expect.poll(() => fieldValue(page, 'part-position-x')).toBe(xBefore);
  });

  it('adds a shelf over the cooler, makes the cooler taller (the shelf rises), swaps the two, removes the shelf', async () => {
    await page.getByRole('tab', { name: 'Bays' }).click();
    const bay1 = page.getByTestId('bay-1');
    await bay1.getByTestId('stack-add-1').click();
    await page.getByRole('option', { name: 'Shelf', exact: true }).click();
    await expect.poll(() => whatChanged(page)).toMatch(/Add “Shelf” to bay 1/);
    await resultsSettled(page);
    const loads = await bearingByModule(page);
    expect(loads.get('Shelf')?.length, 'the shelf bears on members of its own').toBeGreaterThan(0);
    for (const l of loads.get('Shelf') ?? []) expect(l).toMatch(/\d+ %$/);

    const shelfZ = async () => {
      await page.getByRole('tab', { name: 'Modules' }).click();
      await page.getByRole('list', { name: 'Modules in this frame' }).getByRole('button', { name: /^Shelf/ }).click();
      await page.getByRole('tab', { name: 'Part' }).click();
      return fieldValue(page, 'module-position-z');
    };
    const z0 = await shelfZ();
    await page.getByRole('tab', { name: 'Bays' }).click();
    // The cooler is 500 mm tall in the layout's library; 560 mm lifts what is above it by 60 mm.
    const height = bay1.locator('li', { hasText: 'Compressor cooler' }).getByLabel('Height');
    await height.fill('560 mm');
    await height.press('Enter');
    await expect.poll(() => whatChanged(page)).toMatch(/Change the height of Compressor cooler/);
    await expect.poll(shelfZ).toBe(formatLength(Number.parseFloat(z0) + 60, 'mm'));
    await page.screenshot({ path: screenshotPath('own-cabinet-stack.png') });

    await page.getByRole('tab', { name: 'Bays' }).click();
    await bay1.getByRole('button', { name: 'Swap Compressor cooler with the module above' }).click();
    await expect.poll(() => whatChanged(page)).toMatch(/Swap “Compressor cooler” and “Shelf” in bay 1/);
    await expect.poll(() => bay1.getByRole('list').first().innerText()).toMatch(/Compressor cooler[\s\S]*Shelf/);

    await bay1.getByRole('button', { name: 'Remove Shelf' }).click();
    await expect.poll(() => whatChanged(page)).toMatch(/Remove “Shelf” from bay 1/);
    await expect.poll(() => bay1.innerText()).not.toMatch(/Shelf/);
  });
});
