import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshotPath, useBrowserPage } from './support/browser';
import { newWorkshopAndProject, signUp, newFrameFromLayout } from './support/fresh-account';
import { computeReport } from '@shared/engine/report';
import { formatLength } from '@shared/geometry/units';
import { buildCabinetRun } from '@shared/model/cabinet-run';
import { defaultDraft, specFromDraft } from '@/editor/cabinet/cabinet-draft';
import { bearingByModule, cutListRows, drawRailBetween, fieldValue, itemInView, pickMember, swapModules } from './editor-helpers';

// A builder with a brand-new account (signed up here, no demo data) lays out their own cabinet, reads its loads,
// swaps two modules, undoes, and adds and removes a bay: the demo's story on a frame nobody scripted.

const stamp = Date.now().toString(36);

describe('a builder lays out and re-lays their own cabinet from an empty account', () => {
  let page: Page;
  useBrowserPage(async (opened) => {
    page = opened;
    await signUp(page, `builder-${stamp}@example.test`);
    await newWorkshopAndProject(page, `Van shop ${stamp}`, 'My galley');
  });

  it('lays out cooler, sink and drawers; loads per module; swap, undo; a bay added at the end and removed', async () => {
    await page.getByRole('button', { name: 'From a cabinet layout' }).click();
    const dialog = page.getByTestId('cabinet-layout');
    await dialog.waitFor();
    // The default layout holds a cooler, a sink and a drawer stack; check the rows say so, as the builder would.
    for (const [i, name] of ['Compressor cooler', 'Sink with tap', 'Drawer stack'].entries()) {
      await expect.poll(() => dialog.getByTestId(`cabinet-bay-${i + 1}`).getByLabel('Name').inputValue()).toBe(name);
    }
    await dialog.getByLabel('Name').first().fill('Galley cabinet');
    await page.screenshot({ path: screenshotPath('own-cabinet-layout.png') });
    await dialog.getByRole('button', { name: 'Create', exact: true }).click();
    await page.getByTestId('frame-editor').waitFor();
    await page.waitForTimeout(400);

    // Loads: every module bears on members, each with a utilisation.
    const before = await bearingByModule(page);
    expect([...before.keys()]).toEqual(['Compressor cooler', 'Sink with tap', 'Drawer stack']);
    for (const [name, lines] of before) {
      expect(lines.length, `${name} bears on members`).toBeGreaterThan(0);
      for (const l of lines) expect(l).toMatch(/\d+ %$/);
    }
    await page.screenshot({ path: screenshotPath('own-cabinet-loads.png') });

    // What the dialog's default layout makes, worked out here by the engine to find things on the drawing.
    const report = computeReport(buildCabinetRun({ ...specFromDraft(defaultDraft()), name: 'Galley cabinet' }));
    const bay = (i: number) => report.bays[i];

    // A shelf rail drawn by hand across the sink's bay, its ends snapped to the uprights' faces: it re-lays with them.
    const left = itemInView(report, 'front', 'run-u1-f');
    await drawRailBetween(page, report, 'run-u1-f', 'run-u2-f', 420);

    // The upright between the cooler's and the sink's bays, before the swap.
    await pickMember(page, 'run-u1-f');
    const xBefore = await fieldValue(page, 'part-position-x');
    const cutBefore = await cutListRows(page);

    // Swap the cooler and the sink: pick one, Shift-click the other in the list, press S.
    await swapModules(page, /Compressor cooler/, /Sink with tap/);
    const changed = page.getByTestId('what-changed');
    await changed.waitFor();
    expect(await changed.innerText()).toMatch(/Swap “?Compressor cooler”? and “?Sink with tap”?/);
    await page.screenshot({ path: screenshotPath('own-cabinet-swapped.png') });

    // The sink's bay now comes first: the upright between the two bays moves by the difference of their widths.
    await pickMember(page, 'run-u1-f');
    expect(await fieldValue(page, 'part-position-x')).toBe(formatLength(left.x0 + bay(1).width_mm - bay(0).width_mm, 'mm'));
    // The drawn rail now spans the cooler's wider bay: one part fewer at the sink bay's width, one more at the cooler's.
    const qty = (rows: string[][], len: number) => rows.filter((r) => r[2] === formatLength(len, 'mm')).reduce((n, r) => n + Number(r[3]), 0);
    // The cut list table follows the report when the page has a moment: poll it.
    await expect
      .poll(async () => {
        const cutAfter = await cutListRows(page);
        return [qty(cutAfter, bay(0).width_mm), qty(cutAfter, bay(1).width_mm)];
      })
      .toEqual([qty(cutBefore, bay(0).width_mm) + 1, qty(cutBefore, bay(1).width_mm) - 1]);
    expect(await changed.innerText()).toMatch(/1 re-cut|1 new/);

    // Undo restores the upright and the cut list.
    await page.locator('[data-view="front"]').focus();
    await page.keyboard.press('Control+z');
    await expect.poll(() => cutListRows(page)).toEqual(cutBefore);
    await pickMember(page, 'run-u1-f');
    expect(await fieldValue(page, 'part-position-x')).toBe(xBefore);

    // A bay at the end brings its upright pair and rails; removing it takes them away again.
    const memberCount = async () => {
      await page.getByRole('tab', { name: 'Part' }).click();
      const back = page.getByRole('button', { name: '← All members' });
      if (await back.count()) await back.click();
      return page.getByRole('list', { name: 'Members' }).getByRole('button').count();
    };
    const membersBefore = await memberCount();
    await page.getByRole('tab', { name: 'Bays' }).click();
    await page.getByRole('button', { name: 'Add a bay at the end' }).click();
    await expect.poll(() => page.getByTestId('what-changed').innerText()).toMatch(/Add a bay at the end[\s\S]*8 new/);
    // An upright pair with its two cross-members, and the new bay's four rails.
    expect(await memberCount()).toBe(membersBefore + 8);
    await page.screenshot({ path: screenshotPath('own-cabinet-bay-added.png') });
    await page.getByRole('tab', { name: 'Bays' }).click();
    await page.getByRole('button', { name: 'Remove bay 4' }).click();
    await expect.poll(() => page.getByTestId('what-changed').innerText()).toMatch(/Remove/);
    await expect.poll(memberCount).toBe(membersBefore);
  });
});

describe('options of a module, compared side by side', () => {
  let page: Page;
  useBrowserPage(async (opened) => {
    page = opened;
    await signUp(page, `options-${stamp}@example.test`);
    await newWorkshopAndProject(page, `Van shop ${stamp}`, 'My galley');
    await newFrameFromLayout(page);
  });

  it('adds a heavier sink as an option, compares it, uses it, and one undo goes back', async () => {
    await page.getByRole('tab', { name: 'Modules' }).click();
    await page.getByRole('list', { name: 'Modules in this frame' }).getByRole('button', { name: /Sink with tap/ }).click();
    await page.getByRole('tab', { name: 'Part' }).click();
    // Invented example weights: a pressed-steel sink of 5 kg and a fireclay one of 25 kg.
    for (const [name, kg] of [['pressed steel', '5 kg'], ['fireclay', '25 kg']]) {
      await page.getByLabel('Option', { exact: true }).fill(name);
      const massField = page.locator('.module-options__add').getByLabel('Mass');
      await massField.fill(kg);
      await massField.press('Enter');
      await page.locator('.module-options__add').getByRole('button', { name: 'Add' }).click();
      await page.getByText(`${name} · ${kg}`).waitFor();
    }
    await page.getByTestId('compare-options').click();
    const table = page.getByRole('table', { name: 'Options side by side' });
    await table.waitFor();
    const head = await table.locator('thead th').allInnerTexts();
    expect(head.slice(1)).toEqual(['Sink with tap (as now)', 'pressed steel', 'fireclay']);
    const frameMass = (await table.locator('tbody tr').nth(1).locator('td').allInnerTexts()).map((t) => Number.parseFloat(t));
    // The fireclay sink adds 21 kg to the 4 kg one's frame; the pressed-steel one adds 1 kg.
    expect(frameMass[2] - frameMass[0]).toBeCloseTo(21, 1);
    expect(frameMass[1] - frameMass[0]).toBeCloseTo(1, 1);
    await page.screenshot({ path: screenshotPath('own-cabinet-options.png') });
    await table.getByRole('button', { name: 'Use this one' }).nth(1).click();
    await page.getByRole('tab', { name: 'Modules' }).click();
    await expect.poll(() => page.getByRole('list', { name: 'Modules in this frame' }).innerText()).toMatch(/Sink with tap[\s\S]*25 kg/);
    await page.locator('[data-view="front"]').focus();
    await page.keyboard.press('Control+z');
    await expect.poll(() => page.getByRole('list', { name: 'Modules in this frame' }).innerText()).toMatch(/Sink with tap[\s\S]* 4 kg/);
  });
});
