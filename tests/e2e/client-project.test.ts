import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO, DEMO_PASSWORD, DEMO_PROJECT, screenshotPath, useBrowserPage } from './support/browser';

// The demo client is let into the demo project only: signing in opens it, the shop's side of it is not offered,
// and the workshop's own pages are refused.
describe('a client of one project', () => {
  let page: Page;
  useBrowserPage((opened) => {
    page = opened;
  });

  it('lands on their project and sees its frames, without the shop', async () => {
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(DEMO.client);
    await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.getByRole('heading', { name: DEMO_PROJECT, level: 1 }).waitFor();
    await page.getByRole('list', { name: 'Frames' }).getByRole('link').first().waitFor();
    expect(await page.getByText('In the shop').count()).toBe(0);
    expect(await page.getByRole('button', { name: 'New frame' }).count()).toBe(0);
    expect(await page.getByRole('link', { name: 'Suppliers' }).count()).toBe(0);
    await page.screenshot({ path: screenshotPath('client-project.png'), fullPage: true });
  });

  it('is refused the workshop pages, and the server says 404 for its suppliers and orders', async () => {
    const workshopId = new URL(page.url()).pathname.split('/')[2];
    const statuses = await page.evaluate(async (id) => {
      const s: number[] = [];
      for (const p of ['projects', 'suppliers', 'orders']) s.push((await fetch(`/api/workshops/${id}/${p}`)).status);
      return s;
    }, workshopId);
    expect(statuses).toEqual([404, 404, 404]);
    await page.goto(`/w/${workshopId}/suppliers`);
    await page.getByRole('heading', { name: 'Not allowed', level: 1 }).waitFor();
  });
});
