import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO, DEMO_PROJECT, screenshotPath, signIn, useBrowserPage } from './support/browser';

describe('the projects page', () => {
  let page: Page;

  useBrowserPage((opened) => {
    page = opened;
  });

  it('lists the demo project, searches, and is captured for review', async () => {
    await signIn(page, DEMO.owner);
    const table = page.getByRole('table');
    await table.getByRole('link', { name: DEMO_PROJECT }).waitFor();
    await page.evaluate(() => document.fonts.ready);
    await page.screenshot({ path: screenshotPath('projects-page.png'), fullPage: true });

    const search = page.getByRole('textbox', { name: 'Search projects' });
    await search.fill('no such project zz');
    await page.getByText('No project matches that search.').waitFor();
    await search.fill('kitchen');
    await table.getByRole('link', { name: DEMO_PROJECT }).waitFor();
  });

  it('renders in Barlow, shipped with the app', async () => {
    const family = await page.evaluate(() => getComputedStyle(document.querySelector('h1')!).fontFamily);
    expect(family).toContain('Barlow');
    expect(await page.evaluate(() => document.fonts.check('16px Barlow'))).toBe(true);
  });

  it('shows owners the members page with each role in plain words', async () => {
    await page.getByRole('link', { name: 'Members' }).click();
    await page.getByRole('heading', { name: 'Members', level: 1 }).waitFor();
    const members = page.getByRole('table', { name: 'Members' });
    // The demo client is let into one project only and is no member of the workshop.
    for (const email of [DEMO.owner, DEMO.designer, DEMO.cutter, DEMO.viewer]) await members.getByText(email).waitFor();
    await page.screenshot({ path: screenshotPath('members-page.png'), fullPage: true });
  });
});
