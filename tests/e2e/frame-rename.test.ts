import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO, openDemoFrame, signIn, useBrowserPage } from './support/browser';

describe('a designer renames a frame', () => {
  let page: Page;

  useBrowserPage((opened) => {
    page = opened;
  });

  it('keeps the new name after a reload', async () => {
    await signIn(page, DEMO.designer);
    const frameUrl = await openDemoFrame(page);
    const before = await page.getByRole('heading', { level: 1 }).innerText();

    const newName = `Kitchen pod, test fit ${Date.now().toString(36)}`;
    await page.getByRole('button', { name: 'Rename frame' }).click();
    const field = page.getByLabel('Frame name');
    await field.fill(newName);
    await field.press('Enter');
    await page.getByRole('heading', { name: newName, level: 1 }).waitFor();
    expect(newName).not.toBe(before);

    await page.reload();
    await page.getByRole('button', { name: 'Rename frame' }).waitFor();
    expect(page.url()).toBe(frameUrl);
    expect(await page.getByRole('heading', { level: 1 }).innerText()).toBe(newName);

    // The project page lists it under the new name too.
    await page.getByRole('navigation', { name: 'Breadcrumb' }).getByRole('link').nth(1).click();
    await page.getByRole('list', { name: 'Frames' }).getByText(newName).waitFor();
  });

  it('shows an empty name as a field error and saves nothing', async () => {
    await page.getByRole('list', { name: 'Frames' }).getByRole('link').first().click();
    await page.waitForURL(/\/frames\/[0-9a-f-]+$/);
    await page.getByRole('button', { name: 'Rename frame' }).waitFor();
    const name = await page.getByRole('heading', { level: 1 }).innerText();

    await page.getByRole('button', { name: 'Rename frame' }).click();
    await page.getByLabel('Frame name').fill('   ');
    await page.getByRole('button', { name: 'Save name' }).click();
    await page.getByText('A name is needed').waitFor();
    await page.getByRole('button', { name: 'Cancel' }).click();

    await page.reload();
    await page.getByRole('button', { name: 'Rename frame' }).waitFor();
    expect(await page.getByRole('heading', { level: 1 }).innerText()).toBe(name);
  });
});
