import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { computeReport } from '@shared/engine/report';
import { buildCabinetRun } from '@shared/model/cabinet-run';
import { defaultDraft, specFromDraft } from '@/editor/cabinet/cabinet-draft';
import { screenshotPath, useBrowserPage } from './support/browser';
import { newWorkshopAndProject, signUp, newFrameFromLayout } from './support/fresh-account';
import { cutListRows, drawRailBetween, swapModules } from './editor-helpers';

// From a brand-new account: lay out a cabinet, draw a rail, save a named revision, change the frame, compare the
// two revisions side by side and bring the named one back as a new save.

const stamp = Date.now().toString(36);

async function allSaved(page: Page): Promise<void> {
  await expect.poll(() => page.getByTestId('save-state').innerText(), { timeout: 20_000 }).toBe('All changes saved');
}

const versions = (page: Page) => page.getByRole('table', { name: 'Saved versions' }).locator('tbody tr');

describe('revisions of a frame: save, name, compare, restore', () => {
  let page: Page;
  useBrowserPage(async (opened) => {
    page = opened;
    await signUp(page, `revisions-${stamp}@example.test`);
    await newWorkshopAndProject(page, `Bench shop ${stamp}`, 'Workbench');
  });

  it('keeps one revision per stretch, compares two with the changes marked, and restores one as a new version', async () => {
    await newFrameFromLayout(page);
    await page.waitForTimeout(400);

    // Draw a shelf rail across the second bay; it autosaves.
    const report = computeReport(buildCabinetRun(specFromDraft(defaultDraft())));
    await drawRailBetween(page, report, 'run-u1-f', 'run-u2-f', 420);
    await allSaved(page);
    const drawnCutList = await cutListRows(page);

    // "Save revision" with a name ends the stretch.
    await page.getByRole('button', { name: 'Save revision' }).click();
    await page.getByRole('dialog').getByLabel(/Name/).fill('sent to client');
    await page.getByRole('dialog').getByRole('button', { name: 'Save revision' }).click();
    await versions(page).filter({ hasText: 'sent to client' }).waitFor();
    const named = Number((await versions(page).filter({ hasText: 'sent to client' }).locator('td').nth(1).innerText()).match(/\d+/)![0]);

    // Change the frame: swap the first two modules (members move) — several saves, one stretch.
    await swapModules(page, /Compressor cooler/, /Sink with tap/);
    await page.getByTestId('what-changed').waitFor();
    await allSaved(page);
    // The status can read "saved" before the swap's first save starts: wait for the version it makes.
    const firstVersion = async () => Number((await versions(page).first().locator('td').nth(1).innerText()).match(/\d+/)?.[0] ?? 0);
    await expect.poll(firstVersion, { timeout: 20_000 }).toBeGreaterThan(named);
    await expect.poll(async () => versions(page).first().innerText()).toContain('Current');
    await allSaved(page);
    const current = await firstVersion();
    // The swap's saves and the drawing's saves are not each a revision: the list is the created frame, the named
    // revision and the current one.
    expect(await versions(page).count()).toBe(3);

    // Compare the named revision with the current one.
    await page.getByRole('checkbox', { name: `Compare version ${named}` }).check();
    await page.getByRole('checkbox', { name: `Compare version ${current}` }).check();
    await page.getByRole('button', { name: 'Compare', exact: true }).click();
    const compare = page.getByTestId('revision-compare');
    await compare.getByTestId('compare-legend').waitFor({ timeout: 20_000 });
    const legend = await compare.getByTestId('compare-legend').innerText();
    expect(Number(legend.match(/Moved or resized: (\d+)/)![1])).toBeGreaterThan(0);
    expect(legend).toMatch(/Added: 0/);
    expect(await compare.getByTestId('revision-drawing-after').locator('[data-change="moved"]').count()).toBeGreaterThan(0);
    expect(await compare.getByTestId('revision-drawing-before').locator('[data-change="same"]').count()).toBeGreaterThan(0);
    // The rail drawn across the sink's bay now spans the cooler's: the cut list says one of each length changed.
    await compare.getByTestId('compare-cut-list').waitFor();
    expect(await compare.getByTestId('compare-cut-list').locator('tbody tr').count()).toBeGreaterThan(0);
    await page.screenshot({ path: screenshotPath('revisions-compare.png'), fullPage: true });
    await compare.getByRole('button', { name: 'Close' }).click();

    // Restore the named revision: a new version with its drawing; the swapped one stays in the list.
    await page.getByRole('button', { name: `Restore version ${named}` }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Restore' }).click();
    await versions(page).filter({ hasText: `Restored from ${named} (sent to client)` }).waitFor();
    expect(await versions(page).count()).toBe(4);
    expect(await versions(page).first().innerText()).toContain('Current');
    await allSaved(page);
    // The restored document reaches the editor and its report after the list: wait for its cut list.
    await expect.poll(() => cutListRows(page), { timeout: 20_000 }).toEqual(drawnCutList);
    await page.screenshot({ path: screenshotPath('revisions-restored.png'), fullPage: true });
  });
});
