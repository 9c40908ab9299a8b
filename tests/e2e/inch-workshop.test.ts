import { writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshotPath, useBrowserPage } from './support/browser';
import { newWorkshopAndProject, signUp, newFrameFromLayout } from './support/fresh-account';
import { cutListRows } from './editor-helpers';
import { pdfText } from '../support/pdf-text';

// A new builder whose shop works in inches and pounds: they set the workshop once, lay out a frame, and the
// editor's cut list, the weight, the printed saw list and the saw's cutting view all read in inches.

const stamp = Date.now().toString(36);
/** A tape reading in sixteenths: whole inches and a reduced fraction, then the inch mark (e.g. 29 1/2"). */
const INCH_16 = /^-?(\d+( \d+\/(2|4|8|16))?|\d+\/(2|4|8|16))"$/;

async function choose(page: Page, testid: string, option: string): Promise<void> {
  await page.getByTestId(testid).click();
  await page.getByRole('option', { name: option }).click();
}

describe('an inch workshop from an empty account', () => {
  let page: Page;
  let frameUrl = '';
  useBrowserPage(async (opened) => {
    page = opened;
    await signUp(page, `inch-${stamp}@example.test`);
    await newWorkshopAndProject(page, `Inch shop ${stamp}`, 'Bench');
  });

  it('the owner sets inches to 1/16, pounds and day-first dates for the workshop', async () => {
    await page.getByRole('link', { name: 'Settings' }).click();
    await page.getByRole('heading', { name: 'Workshop settings', level: 1 }).waitFor();
    await choose(page, 'setting-length-unit', 'Inches to 1/16');
    await choose(page, 'setting-mass', 'Pounds (lb)');
    await choose(page, 'setting-date', '02/12/2026 (day first)');
    await page.getByTestId('save-workshop-settings').click();
    await page.getByText('Workshop settings saved').waitFor();
    await page.screenshot({ path: screenshotPath('inch-workshop-settings.png'), fullPage: true });
    await page.reload();
    await page.getByTestId('setting-length-unit').getByText('Inches to 1/16').waitFor();
  });

  it('a new frame is in inches: cut list, weight and its Settings tab', async () => {
    await page.getByRole('link', { name: 'Projects' }).click();
    await page.getByRole('link', { name: 'Bench' }).click();
    await newFrameFromLayout(page, 'Inch galley');
    frameUrl = page.url();
    const rows = await cutListRows(page);
    expect(rows.length).toBeGreaterThan(1);
    // every length cell reads as a tape measure in sixteenths, none in millimetres
    const lengths = rows.flatMap((r) => r.filter((c) => c.endsWith('"')));
    expect(lengths.length).toBeGreaterThanOrEqual(rows.length);
    for (const l of lengths) expect(l).toMatch(INCH_16);
    expect(rows.flat().join(' ')).not.toMatch(/\d mm\b/);
    await page.screenshot({ path: screenshotPath('inch-workshop-cut-list.png') });
    await page.getByRole('tab', { name: 'Weight' }).click();
    expect(await page.getByTestId('total-mass').innerText()).toMatch(/^\d+(\.\d+)? lb$/);
    await page.getByRole('tab', { name: 'Settings' }).click();
    await page.getByTestId('frame-settings').getByText('Inches to 1/16').waitFor();
  });

  it('the saw list PDF prints the cuts in inches', async () => {
    const frameId = /\/frames\/([0-9a-f-]+)/.exec(frameUrl)![1];
    const res = await page.request.get(`/api/frames/${frameId}/shop/saw-list.pdf`);
    expect(res.status()).toBe(200);
    const pdf = Buffer.from(await res.body());
    // kept beside the screenshots, to look at as printed
    writeFileSync(screenshotPath('inch-workshop-saw-list.pdf'), pdf);
    const { text } = await pdfText(pdf);
    expect(text).toContain('inches to 1/16');
    expect(text).toMatch(/\d+ \d+\/(2|4|8|16)"/);
    expect(text).not.toMatch(/\b\d+(\.\d)? mm\b/);
    expect(text).toMatch(/\b\d{2}\/\d{2}\/\d{4}\b/);
  });

  it('the cutting view shows the bars in inches', async () => {
    await page.goto(`${frameUrl}/cutting`);
    await page.getByRole('heading', { name: /^Cutting: /, level: 1 }).waitFor();
    const start = page.getByRole('button', { name: 'Start cutting' });
    if (await start.count()) await start.click();
    await page.getByTestId('bar-title').waitFor();
    const cuts = await page.locator('button[data-cut]').allInnerTexts();
    expect(cuts.length).toBeGreaterThan(0);
    for (const c of cuts) expect(c).toMatch(/\d+(\/\d+)?"/);
    await page.screenshot({ path: screenshotPath('inch-workshop-cutting.png') });
  });
});
