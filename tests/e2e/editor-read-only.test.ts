import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO, openDemoFrame, screenshotPath, signIn, useBrowserPage } from './support/browser';
import { fieldValue, pickMember } from './editor-helpers';

describe('a viewer sees the frame editor read-only', () => {
  let page: Page;

  useBrowserPage((opened) => {
    page = opened;
  });

  it('shows the drawing and the results but offers no edits', async () => {
    await signIn(page, DEMO.viewer);
    await openDemoFrame(page);
    await page.getByTestId('frame-editor').waitFor();
    await page.getByText('Read only (Viewer)').waitFor();

    expect(await page.getByRole('button', { name: /^Draw/ }).isDisabled()).toBe(true);
    for (const name of ['Undo', 'Delete', 'Duplicate']) expect(await page.getByRole('button', { name: new RegExp(`^${name}`) }).count()).toBe(0);

    await pickMember(page, 'galley-u1-f');
    expect(await page.getByTestId('part-length').locator('input').isDisabled()).toBe(true);
    const x = await fieldValue(page, 'part-position-x');

    // Keys that would edit do nothing.
    await page.locator('[data-view="front"]').focus();
    await page.keyboard.press('ArrowRight');
    await page.keyboard.press('Delete');
    await pickMember(page, 'galley-u1-f');
    expect(await fieldValue(page, 'part-position-x')).toBe(x);

    await page.getByRole('tab', { name: 'Modules' }).click();
    expect(await page.getByRole('button', { name: 'Add module' }).count()).toBe(0);
    await page.getByRole('tab', { name: 'Cut list' }).click();
    await page.getByRole('table', { name: 'Cut list' }).waitFor();
    await page.waitForTimeout(300);
    await page.screenshot({ path: screenshotPath('editor-read-only.png') });
  });
});
