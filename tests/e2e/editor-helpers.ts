import type { Page } from 'playwright-core';
import { projectBox, VIEWS, type ViewId } from '@shared/editing/views';
import type { FrameReport } from '@shared/engine/report';
import { DEMO, signIn, useBrowserPage } from './support/browser';

// Browser-test helpers for the frame editor: a scratch project holding the test's own copies of frames (so the
// tests never change the seeded demo frame others read), and the front view's mapping from millimetres to the
// screen, read from the camera the canvas publishes.

/** Runs a script in the page as text (the TypeScript loader's helpers for named functions do not exist there). */
async function inPage<T>(page: Page, body: string): Promise<T> {
  return (await page.evaluate(`(async () => {
    const call = async (method, url, body) => {
      const csrf = method === 'GET' ? null : (await (await fetch('/api/auth/csrf', { credentials: 'same-origin' })).json()).token;
      const r = await fetch(url, {
        method,
        credentials: 'same-origin',
        headers: csrf ? { 'Content-Type': 'application/json', 'X-CSRF-Token': csrf } : {},
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      if (!r.ok) throw new Error(method + ' ' + url + ': ' + r.status + ' ' + (await r.text()));
      return r.status === 204 ? null : r.json();
    };
    ${body}
  })()`)) as T;
}

export type ScratchProject = { workshopId: string; projectId: string };

/** A project of the signed-in owner's workshop for this test file's frames. */
export function createScratchProject(page: Page, name: string): Promise<ScratchProject> {
  return inPage(
    page,
    `const [w] = await call('GET', '/api/workshops');
     const p = await call('POST', '/api/workshops/' + w.id + '/projects', { name: ${JSON.stringify(name)} });
     return { workshopId: w.id, projectId: p.id };`,
  );
}

export function deleteScratchProject(page: Page, p: ScratchProject): Promise<void> {
  return inPage(page, `await call('DELETE', '/api/projects/${p.projectId}'); return null;`);
}

/** Creates a frame holding `document` in the scratch project and opens it in the editor; returns its address. */
export async function openFrameCopy(page: Page, p: ScratchProject, name: string, document: unknown): Promise<string> {
  const id = await inPage<string>(
    page,
    `const f = await call('POST', '/api/projects/${p.projectId}/frames', { name: ${JSON.stringify(name)}, document: ${JSON.stringify(document)} });
     return f.id;`,
  );
  const path = `/w/${p.workshopId}/projects/${p.projectId}/frames/${id}`;
  await page.goto(path);
  await page.getByTestId('frame-editor').waitFor();
  // Let the canvas measure itself and fit the frame.
  await page.waitForTimeout(500);
  return path;
}

/**
 * For a describe block: the owner signed in on a copy of `document`, opened in the editor from a scratch project
 * of its own ("Editor <what> test ..."), deleted after the tests. `ready` receives the page and the frame's address.
 */
export function useScratchFrame(what: string, document: unknown, ready: (page: Page, path: string) => void): void {
  let project: ScratchProject | undefined;
  useBrowserPage(
    async (page) => {
      await signIn(page, DEMO.owner);
      project = await createScratchProject(page, `Editor ${what} test ${Date.now().toString(36)}`);
      ready(page, await openFrameCopy(page, project, `Kitchen pod, ${what} test`, document));
    },
    async (page) => {
      if (project) await deleteScratchProject(page, project).catch(() => undefined);
    },
  );
}

/** Screen point (page pixels) of a point given in a view's millimetres. */
export async function toScreen(page: Page, view: ViewId, h: number, v: number): Promise<{ x: number; y: number }> {
  const canvas = page.locator(`[data-view="${view}"]`).first();
  const box = await canvas.boundingBox();
  if (!box) throw new Error(`the ${view} view is not on screen`);
  const [scale, ox, oy] = ((await canvas.getAttribute('data-camera')) ?? '').split(' ').map(Number);
  return { x: box.x + ox + h * scale, y: box.y + oy - v * scale };
}

/** A member's or module's box as the report gives it, seen in a view (mm). */
export function itemInView(report: FrameReport, view: ViewId, id: string) {
  const m = report.members.find((x) => x.id === id) ?? report.modules.find((x) => x.id === id);
  if (!m) throw new Error(`no member or module "${id}" in the report`);
  return projectBox(VIEWS[view], { min: [m.min_mm.x, m.min_mm.y, m.min_mm.z], max: [m.max_mm.x, m.max_mm.y, m.max_mm.z] });
}

/** Waits until the results are worked out for the frame as drawn (they follow each edit from a Web Worker). */
export async function resultsSettled(page: Page): Promise<void> {
  await page.locator('.frame-editor__status').filter({ hasText: /checked in/ }).waitFor();
}

/** The cut list's rows as [mark, profile, cut length, qty]. */
export async function cutListRows(page: Page): Promise<string[][]> {
  await resultsSettled(page);
  await page.getByRole('tab', { name: 'Cut list' }).click();
  const rows = page.getByRole('table', { name: 'Cut list' }).locator('tbody tr');
  await rows.first().waitFor();
  return (await rows.allInnerTexts()).map((t) => t.split('\t').map((c) => c.trim()));
}

/** Picks a member from the part panel's list (the keyboard and screen-reader way) and reads a field of it. */
export async function pickMember(page: Page, id: string): Promise<void> {
  await resultsSettled(page);
  await page.getByRole('tab', { name: 'Part' }).click();
  const back = page.getByRole('button', { name: '← All members' });
  if (await back.count()) await back.click();
  // Entries read "<mark> <title> <cut length>", as the builder knows the part; the test finds it by its record.
  await page.getByRole('list', { name: 'Members' }).locator(`button[data-member-id="${id}"]`).click();
}

export async function fieldValue(page: Page, testid: string): Promise<string> {
  return page.getByTestId(testid).locator('input').inputValue();
}

/** The Loads tab's list of modules, each with the members it bears on: { module name → member lines }. */
export async function bearingByModule(page: Page): Promise<Map<string, string[]>> {
  await page.getByRole('tab', { name: /^Loads/ }).click();
  const list = page.getByRole('list', { name: 'What each module bears on' });
  await list.waitFor();
  const out = new Map<string, string[]>();
  for (const item of await list.locator(':scope > li').all()) {
    const name = (await item.getByTestId('bearing-module').innerText()).trim();
    out.set(name, (await item.locator('li').allInnerTexts()).map((t) => t.replace(/\s+/g, ' ').trim()));
  }
  return out;
}

/**
 * Draws a rail by hand in the front view across the opening between two uprights, at height `z`: it starts and
 * ends a little inside the opening, so its ends snap to the uprights' faces. Leaves the Pick tool on.
 */
export async function drawRailBetween(page: Page, report: FrameReport, leftId: string, rightId: string, z: number): Promise<void> {
  const left = itemInView(report, 'front', leftId);
  const right = itemInView(report, 'front', rightId);
  await page.getByRole('button', { name: 'Draw', exact: true }).click();
  await dragAcrossOpening(page, left, right, z);
  await page.getByRole('button', { name: 'Pick', exact: true }).click();
}

/**
 * With the Draw tool on, drags along the front view from just inside the left item's face to just inside the right
 * one's at height `z`, so the new member's ends snap to those faces.
 */
export async function dragAcrossOpening(page: Page, left: { x1: number }, right: { x0: number }, z: number): Promise<void> {
  const a = await toScreen(page, 'front', left.x1 + 4, z);
  const b = await toScreen(page, 'front', right.x0 - 4, z);
  await page.mouse.move(a.x, a.y);
  await page.mouse.down();
  for (let k = 1; k <= 10; k++) await page.mouse.move(a.x + ((b.x - a.x) * k) / 10, a.y);
  await page.mouse.up();
}

/** Swaps two modules as a builder does: pick one in the Modules list, Shift-click the other, press S. */
export async function swapModules(page: Page, first: RegExp, second: RegExp): Promise<void> {
  await page.getByRole('tab', { name: 'Modules' }).click();
  const modules = page.getByRole('list', { name: 'Modules in this frame' });
  await modules.getByRole('button', { name: first }).click();
  await modules.getByRole('button', { name: second }).click({ modifiers: ['Shift'] });
  await page.locator('[data-view="front"]').focus();
  await page.keyboard.press('s');
}
