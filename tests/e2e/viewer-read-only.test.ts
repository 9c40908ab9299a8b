import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO, openDemoFrame, signIn, useBrowserPage } from './support/browser';

describe('a viewer reads without changing', () => {
  let page: Page;

  useBrowserPage((opened) => {
    page = opened;
  });

  it('is offered no rename, create or delete', async () => {
    await signIn(page, DEMO.viewer);
    expect(await page.getByRole('button', { name: 'New project' }).count()).toBe(0);

    await openDemoFrame(page);
    await page.getByText('Viewer').first().waitFor();
    expect(await page.getByRole('button', { name: 'Rename frame' }).count()).toBe(0);
    expect(await page.getByLabel('Frame name').count()).toBe(0);
  });

  it('is refused by the server when it forces a rename anyway', async () => {
    const frameId = new URL(page.url()).pathname.split('/').pop();
    const reply = await page.evaluate(async (id) => {
      const csrf = (await (await fetch('/api/auth/csrf', { credentials: 'same-origin' })).json()) as { token: string };
      const response = await fetch(`/api/frames/${id}`, {
        method: 'PATCH',
        credentials: 'same-origin',
        headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': csrf.token },
        body: JSON.stringify({ name: 'Renamed by the client' }),
      });
      return { status: response.status, body: (await response.json()) as { error?: { code?: string } } };
    }, frameId);

    expect(reply.status).toBe(403);
    expect(reply.body.error?.code).toBe('forbidden');

    await page.reload();
    expect(await page.getByRole('heading', { level: 1 }).innerText()).not.toBe('Renamed by the client');
  });

  it('is told plainly that the members page is for owners', async () => {
    const workshopId = new URL(page.url()).pathname.split('/')[2];
    await page.goto(`/w/${workshopId}/members`);
    await page.getByRole('heading', { name: 'Not allowed', level: 1 }).waitFor();
    await page.getByText('Your role in this workshop is Viewer').waitFor();
  });
});
