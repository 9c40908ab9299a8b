import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshotPath, useBrowserPage } from './support/browser';
import { newWorkshopAndProject, signUp } from './support/fresh-account';

// From an empty account: a project exported to one file and imported back as a second project, the copy
// deleted to the bin and restored from it.

const stamp = Date.now().toString(36);

describe('exporting, importing, the bin', () => {
  let page: Page;
  useBrowserPage(async (opened) => {
    page = opened;
    await signUp(page, `files-${stamp}@example.test`);
    await newWorkshopAndProject(page, `Bench shop ${stamp}`, 'Yard bench');
    await page.getByRole('button', { name: 'New frame' }).click();
    await page.getByLabel('Frame name').fill('Bench top frame');
    await page.getByRole('button', { name: 'Create frame' }).click();
    await page.waitForURL(/\/frames\/[0-9a-f-]+$/);
    await page.goBack();
    await page.getByRole('heading', { name: 'Yard bench', level: 1 }).waitFor();
  });

  it('exports the project as one file and imports it as a new project with its frame', async () => {
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export project' }).click()]);
    expect(download.suggestedFilename()).toMatch(/Yard-bench\.slotwright\.json$/);
    const file = screenshotPath(`yard-bench-${stamp}.slotwright.json`);
    await download.saveAs(file);
    const json = JSON.parse(readFileSync(file, 'utf8')) as { format: string; frames: { name: string }[] };
    expect(json.format).toBe('slotwright-project');
    expect(json.frames.map((f) => f.name)).toEqual(['Bench top frame']);

    await page.getByRole('link', { name: 'Projects' }).first().click();
    await page.getByRole('heading', { name: 'Projects', level: 1 }).waitFor();
    await page.screenshot({ path: screenshotPath('projects-import-bin-buttons.png') });
    await page.getByLabel('Project file to import').setInputFiles(file);
    await page.waitForURL(/\/projects\/[0-9a-f-]+$/);
    await page.getByRole('heading', { name: 'Yard bench', level: 1 }).waitFor();
    await page.getByRole('list', { name: 'Frames' }).getByText('Bench top frame').waitFor();
    await page.getByRole('button', { name: 'Export project' }).waitFor();
    await page.screenshot({ path: screenshotPath('project-imported.png'), fullPage: true });
  });

  it('a deleted project waits in the bin and comes back from it', async () => {
    await page.getByRole('button', { name: 'Delete project' }).click();
    await page.getByRole('dialog').getByText('waits in the bin for 30 days').waitFor();
    await page.getByRole('dialog').getByRole('button', { name: 'Delete project' }).click();
    await page.getByRole('heading', { name: 'Projects', level: 1 }).waitFor();
    await expect.poll(() => page.getByRole('table').getByRole('link', { name: 'Yard bench' }).count()).toBe(1);

    await page.getByRole('link', { name: 'Bin' }).click();
    await page.getByRole('heading', { name: 'Bin', level: 1 }).waitFor();
    const bin = page.getByRole('list', { name: 'Deleted projects and frames' });
    await bin.getByText('Yard bench').waitFor();
    await bin.getByText('30 days left').waitFor();
    await page.screenshot({ path: screenshotPath('bin.png'), fullPage: true });
    await bin.getByRole('button', { name: 'Restore Yard bench' }).click();
    await page.getByText('The bin is empty').waitFor();

    await page.getByRole('link', { name: 'Projects' }).first().click();
    await expect.poll(() => page.getByRole('table').getByRole('link', { name: 'Yard bench' }).count()).toBe(2);
  });

  it('a file that is no project file is refused, saying what is wrong', async () => {
    await page.getByLabel('Project file to import').setInputFiles({ name: 'notes.json', mimeType: 'application/json', buffer: Buffer.from('{"format":"notes","version":1}') });
    await page.getByText(/Could not import notes\.json: .*format: Not a project file/).waitFor();
    await page.screenshot({ path: screenshotPath('project-import-refused.png') });
    await expect.poll(() => page.getByRole('table').getByRole('link', { name: 'Yard bench' }).count()).toBe(2);
  });
});
