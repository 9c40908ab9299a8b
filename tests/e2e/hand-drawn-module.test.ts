import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { CURRENT_SCHEMA_VERSION, frameDocumentSchema } from '@shared/model/frame-document';
import { screenshotPath } from './support/browser';
import { fieldValue, toScreen, useScratchFrame } from './editor-helpers';

// A frame drawn by hand (members placed by plain offsets, no run, no datums): four uprights and two rails. A
// module added standing free and dragged onto the rails snaps its base to their top faces and bears on them.

const P = '40x40-s8';
const upright = (id: string, x: number, y: number) => ({ type: 'member', id, profile: P, axis: 'z', start: { offset_mm: 0 }, end: { offset_mm: 800 }, place: { x: { offset_mm: x }, y: { offset_mm: y } } });
const rail = (id: string, name: string, y: number) => ({ type: 'member', id, name, profile: P, axis: 'x', start: { offset_mm: 40 }, end: { offset_mm: 560 }, place: { y: { offset_mm: y }, z: { offset_mm: 300 } } });
const doc = frameDocumentSchema.parse({
  schemaVersion: CURRENT_SCHEMA_VERSION,
  name: 'Hand-drawn shelf',
  members: [upright('post-fl', 0, 0), upright('post-fr', 560, 0), upright('post-bl', 0, 360), upright('post-br', 560, 360), rail('rail-front', 'Front rail', 0), rail('rail-back', 'Back rail', 360)],
});
// The rails' top faces: 300 mm up plus the profile's 40 mm.
const RAIL_TOP = 340;

describe('a module seated on a hand-drawn frame', () => {
  let page: Page;
  useScratchFrame('hand-drawn', doc, (opened) => (page = opened));

  it('snaps onto the rails when dragged there, bears on them, and shows their load', async () => {
    await page.getByRole('tab', { name: 'Modules' }).click();
    await page.locator('.v-select').filter({ hasText: 'Type' }).click();
    await page.getByRole('option', { name: 'Water tank' }).click();
    await page.getByRole('button', { name: 'Add module' }).click();
    const z = () => fieldValue(page, 'module-position-z');
    await expect.poll(z).toBe('0 mm');
    // Standing free beside the frame it bears on nothing, and says what to do.
    await expect.poll(() => page.getByTestId('module-carried-by').innerText()).toMatch(/Bears on no member yet/);

    // Drag it from where it stands to just above the rails, between the posts: its base snaps to their top faces.
    const x0 = Number.parseFloat(await fieldValue(page, 'module-position-x'));
    const from = await toScreen(page, 'front', x0 + 150, 100);
    const to = await toScreen(page, 'front', 300, RAIL_TOP + 100 + 3);
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    for (let k = 1; k <= 12; k++) await page.mouse.move(from.x + ((to.x - from.x) * k) / 12, from.y + ((to.y - from.y) * k) / 12);
    await page.mouse.up();
    await expect.poll(z).toBe(`${RAIL_TOP} mm`);
    await page.screenshot({ path: screenshotPath('hand-drawn-module.png') });

    // It bears on both rails; Loads lists them under the tank with their utilisation.
    const carried = await page.getByTestId('module-carried-by').innerText();
    expect(carried).toMatch(/^Sits on: /);
    // By mark and the name the builder gave them, never the record's id.
    expect(carried).toMatch(/[A-Z]+ Front rail \(\d+ %\)/);
    expect(carried).toMatch(/[A-Z]+ Back rail \(\d+ %\)/);
    expect(carried).not.toMatch(/rail-front|rail-back/);
    await page.getByRole('tab', { name: /^Loads/ }).click();
    const list = page.getByRole('list', { name: 'What each module bears on' });
    const lines = (await list.locator('li li').allInnerTexts()).map((t) => t.replace(/\s+/g, ' ').trim());
    // Named as the builder knows them: kind, part mark and the name given, never the record id.
    expect(lines.some((l) => /^rail [A-Z]+ \(Front rail\) \d+ %$/.test(l))).toBe(true);
    expect(lines.some((l) => /^rail [A-Z]+ \(Back rail\) \d+ %$/.test(l))).toBe(true);
    expect(lines.join(' ')).not.toMatch(/rail-front|rail-back/);
    const pct = lines.map((l) => Number(/(\d+) %$/.exec(l)?.[1] ?? 0));
    expect(Math.max(...pct)).toBeGreaterThan(0);
  });

  it('Shift-click adds to the pick; duplicate puts the copies at a typed offset, picked', async () => {
    await page.getByRole('tab', { name: 'Part' }).click();
    const back = page.getByRole('button', { name: '← All members' });
    if (await back.count()) await back.click();
    const list = page.getByRole('list', { name: 'Members' });
    await list.locator('button[data-member-id="post-fl"]').click();
    await list.locator('button[data-member-id="post-fr"]').click({ modifiers: ['Shift'] });
    await expect.poll(() => page.getByText(/^2 members selected$/).count()).toBe(1);

    await page.locator('[data-view="front"]').focus();
    await page.keyboard.press('Control+d');
    const x = page.getByTestId('duplicate-x').locator('input');
    await x.fill('100 mm');
    await x.press('Enter');
    // Two copies, 100 mm along x, picked (and the originals not).
    await expect.poll(() => page.getByText(/^2 members selected$/).count()).toBe(1);
    const picked = await list.locator('[aria-pressed="true"]').evaluateAll((els) => els.map((e) => e.getAttribute('data-member-id')));
    expect(picked).not.toContain('post-fl');
    expect(picked).not.toContain('post-fr');
    expect(picked).toHaveLength(2);
    expect(await list.getByRole('button').count()).toBe(8);
  });
});
