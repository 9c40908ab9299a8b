import { writeFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { DEMO, DEMO_PROJECT, newPage, screenshotPath, signIn, useBrowserPage } from './support/browser';

// The owner adds a supplier, plans an order for the demo frame, sends it once, and finds it in the outbox with the
// PDF attached; the shelf takes offcuts from a CSV with a bad row listed by line.

const SUPPLIER = `Northgate Metals ${Date.now().toString(36)}`;

describe('ordering from a supplier', () => {
  let browser: Browser;
  let page: Page;

  useBrowserPage(async (opened, launched) => {
    page = opened;
    browser = launched;
    await signIn(page, DEMO.owner);
  });

  it('adds a supplier with bar lengths and prices', async () => {
    await page.getByRole('link', { name: 'Suppliers' }).click();
    await page.getByRole('heading', { name: 'Suppliers and stock', level: 1 }).waitFor();
    await page.getByRole('button', { name: 'New supplier' }).click();
    // Fill the form once it has opened: while the dialog is still coming in, focus can move to its first field in
    // the middle of typing into another (the e-mail once landed at the end of the name).
    const form = page.getByRole('dialog');
    await form.waitFor();
    await form.evaluate((el) =>
      Promise.all(
        el
          .getAnimations({ subtree: true })
          .filter((a) => Number.isFinite(Number(a.effect?.getComputedTiming().endTime)))
          .map((a) => a.finished),
      ).then(() => undefined),
    );
    await page.getByLabel('Name').fill(SUPPLIER);
    await page.getByLabel('Order e-mail').fill('orders@northgate.test');
    await page.getByLabel('Fee per cut (cut to length)').fill('1.20');
    await page.getByLabel('Price per bar').first().fill('38');
    expect([await page.getByLabel('Name').inputValue(), await page.getByLabel('Order e-mail').inputValue()]).toEqual([SUPPLIER, 'orders@northgate.test']);
    await page.getByRole('button', { name: 'Save supplier' }).click();
    // Should the save be refused, say what the form said rather than only that the row never came.
    const row = page.getByRole('cell', { name: SUPPLIER, exact: true }).first();
    await row.waitFor({ timeout: 30_000 }).catch(async (e: unknown) => {
      const said = (await form.count()) ? await form.first().innerText() : '(the form is closed)';
      throw new Error(`the saved supplier is not listed: ${e instanceof Error ? e.message.split('\n')[0] : String(e)}; the form reads: ${said}`);
    });
    expect(await page.getByRole('row', { name: new RegExp(SUPPLIER) }).innerText()).toContain('6000 mm');
  });

  it('imports offcuts, keeping good rows and listing the bad one by line', async () => {
    const file = screenshotPath('shop-offcuts.csv');
    writeFileSync(file, 'profile,length,quantity\n30x30-s8,1500,2\nno-such-profile,400,1\n30x30-s8,900,\n');
    await page.getByLabel('CSV file').first().setInputFiles(file);
    await page.getByRole('button', { name: 'Import' }).first().click();
    const result = page.getByTestId('import-result');
    await result.waitFor();
    expect(await result.innerText()).toContain('2 rows imported');
    expect(await result.innerText()).toMatch(/Line 3: profile: "no-such-profile"/);
    await page.getByRole('table', { name: 'Offcuts on the shelf' }).getByText('1500 mm').first().waitFor();
  });

  it('plans an order, sends it once, and the outbox has the mail with the PDF', async () => {
    await page.getByRole('link', { name: 'Orders' }).click();
    await page.getByRole('heading', { name: 'Orders', level: 1 }).waitFor();
    await page.getByRole('button', { name: 'New order' }).click();
    await page.getByRole('dialog').getByText(DEMO_PROJECT).waitFor();
    await page.getByRole('dialog').locator('.v-select').filter({ hasText: 'Supplier' }).click();
    await page.getByRole('option', { name: SUPPLIER }).click();
    await page.getByRole('button', { name: 'Plan the order' }).click();
    const detail = page.getByTestId('order-detail');
    await detail.waitFor({ timeout: 30_000 });
    await detail.getByText('Draft', { exact: true }).waitFor();
    expect(await detail.innerText()).toContain('Stock bars to buy');
    await page.screenshot({ path: screenshotPath('shop-order-draft.png'), fullPage: true });

    // Send shows the e-mail and the supplier's PDF first; cancelling sends nothing.
    await detail.getByRole('button', { name: 'Send to supplier' }).click();
    const preview = page.getByTestId('send-preview');
    await preview.getByTestId('send-preview-text').waitFor({ timeout: 30_000 });
    expect(await preview.getByTestId('send-preview-to').innerText()).toBe('orders@northgate.test');
    const previewText = await preview.getByTestId('send-preview-text').innerText();
    expect(previewText).toContain('Stock bars to buy');
    expect(previewText).not.toMatch(/comparison/i);
    const pdfUrl = await preview.getByRole('link', { name: /^order-.*\.pdf$/ }).getAttribute('href');
    const pdfType = await page.evaluate(async (u) => (await fetch(u!, { credentials: 'same-origin' })).headers.get('content-type'), pdfUrl);
    expect(pdfType).toBe('application/pdf');
    await page.screenshot({ path: screenshotPath('shop-send-preview.png'), fullPage: true });
    await preview.getByRole('button', { name: 'Cancel' }).click();
    await preview.waitFor({ state: 'hidden' });
    await detail.getByText('Draft', { exact: true }).waitFor();
    await detail.getByRole('button', { name: 'Send to supplier' }).click();
    await preview.getByTestId('send-preview-text').waitFor({ timeout: 30_000 });
    await preview.getByRole('button', { name: 'Send', exact: true }).click();
    await detail.getByText(/Sent .* to orders@northgate\.test/).waitFor({ timeout: 30_000 });
    expect(await detail.getByRole('button', { name: 'Send to supplier' }).count()).toBe(0);
    const reference = (await detail.getByRole('heading').first().innerText()).replace('Order ', '');

    await page.getByRole('link', { name: 'Outbox' }).click();
    await page.getByRole('heading', { name: 'Outbox', level: 1 }).waitFor();
    await page.getByRole('button', { name: new RegExp(`Order ${reference}`) }).click();
    const mail = page.getByTestId('outbox-mail');
    await mail.waitFor();
    expect(await mail.innerText()).toContain('Stock bars to buy');
    // What went out is what the preview showed.
    expect((await mail.innerText()).replace(/\s+/g, ' ')).toContain(previewText.trim().replace(/\s+/g, ' '));
    await mail.getByRole('link', { name: `order-${reference}.pdf` }).waitFor();
    await page.screenshot({ path: screenshotPath('shop-outbox.png'), fullPage: true });
  });

  it('a cutter does not get the outbox', async () => {
    const cutter = await newPage(browser);
    await signIn(cutter, DEMO.cutter);
    expect(await cutter.getByRole('link', { name: 'Outbox' }).count()).toBe(0);
    await cutter.getByRole('link', { name: 'Orders' }).click();
    await cutter.getByRole('heading', { name: 'Orders', level: 1 }).waitFor();
    expect(await cutter.getByRole('button', { name: 'New order' }).count()).toBe(0);
  });
});
