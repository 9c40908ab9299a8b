import { writeFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { DEMO, DEMO_PROJECT, launchBrowser, newPage, screenshotPath, signIn } from './support/browser';

// A designer attaches a photo to the project; a viewer can open it but not attach or remove.

// The smallest valid PNG: one white pixel.
const PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAIAAACQd1PeAAAADElEQVR4nGP4//8/AAX+Av4N70a4AAAAAElFTkSuQmCC', 'base64');

describe('project attachments', () => {
  let browser: Browser;
  const name = `fit-check-${Date.now().toString(36)}.png`;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('a designer attaches a photo and it is listed', async () => {
    const page = await newPage(browser);
    await signIn(page, DEMO.designer);
    await page.getByRole('link', { name: DEMO_PROJECT }).click();
    await page.getByText('Photos and data sheets').waitFor();
    const file = screenshotPath(name);
    writeFileSync(file, PNG);
    await page.getByTestId('attach-input').setInputFiles(file);
    await page.getByRole('link', { name }).waitFor();
  });

  it('a viewer can open it but gets no attach or remove', async () => {
    const page = await newPage(browser);
    await signIn(page, DEMO.viewer);
    await page.getByRole('link', { name: DEMO_PROJECT }).click();
    const link = page.getByRole('link', { name });
    await link.waitFor();
    expect(await page.getByRole('button', { name: 'Attach' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: `Remove ${name}` }).count()).toBe(0);
    const href = await link.getAttribute('href');
    const reply = await page.evaluate(async (url) => {
      const r = await fetch(url!, { credentials: 'same-origin' });
      return { status: r.status, type: r.headers.get('content-type'), size: (await r.arrayBuffer()).byteLength };
    }, href);
    expect(reply).toEqual({ status: 200, type: 'image/png', size: PNG.length });
  });
});
