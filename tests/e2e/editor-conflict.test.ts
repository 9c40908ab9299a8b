import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { screenshotPath } from './support/browser';
import { pickMember, useScratchFrame } from './editor-helpers';

/** Someone else's save, made through the API behind the editor's back: the document without one cross-member. */
async function saveBehindTheEditor(page: Page, frameId: string, baseVersion: number, document: unknown): Promise<number> {
  return (await page.evaluate(`(async () => {
    const { token } = await (await fetch('/api/auth/csrf', { credentials: 'same-origin' })).json();
    const r = await fetch('/api/frames/${frameId}/document', {
      method: 'PUT',
      credentials: 'same-origin',
      headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': token },
      body: JSON.stringify({ baseVersion: ${baseVersion}, document: ${JSON.stringify(document)} }),
    });
    if (!r.ok) throw new Error('save: ' + r.status + ' ' + (await r.text()));
    return (await r.json()).version;
  })()`)) as number;
}

async function serverFrame(page: Page, frameId: string): Promise<{ version: number; document: { members: { id: string; place: { x?: { offset_mm: number } } }[] } }> {
  return (await page.evaluate(`fetch('/api/frames/${frameId}', { credentials: 'same-origin' }).then((r) => r.json())`)) as never;
}

const statusText = (page: Page) => page.locator('.frame-editor__status').innerText();

describe('two people save the same frame', () => {
  let page: Page;
  let frameId = '';
  const doc = demoFrameDocument();
  const theirs = { ...doc, members: doc.members.filter((m) => m.id !== 'galley-x0-top') };

  useScratchFrame('conflict', doc, (opened, path) => {
    page = opened;
    frameId = path.split('/').pop() as string;
  });

  async function nudgeAnUpright(): Promise<void> {
    await pickMember(page, 'galley-u4-f');
    await page.locator('[data-view="front"]').focus();
    await page.keyboard.press('ArrowRight');
  }

  it('keeping mine saves it on top, and theirs stays among the saved versions', async () => {
    const v2 = await saveBehindTheEditor(page, frameId, 1, theirs);
    expect(v2).toBe(2);
    await nudgeAnUpright();
    await page.getByRole('heading', { name: 'Someone else saved this frame' }).waitFor();
    await page.waitForTimeout(400); // let the dialog finish opening before the picture
    await page.screenshot({ path: screenshotPath('editor-conflict.png') });
    await page.getByRole('button', { name: 'Keep mine' }).click();
    await page.getByTestId('save-state').getByText('All changes saved').waitFor();

    const saved = await serverFrame(page, frameId);
    expect(saved.version).toBe(3);
    // Mine: all 44 members, the upright 10 mm further right than in the demo.
    expect(saved.document.members).toHaveLength(doc.members.length);
    const demoX = doc.members.find((m) => m.id === 'galley-u4-f')!.place.x!.offset_mm;
    expect(saved.document.members.find((m) => m.id === 'galley-u4-f')!.place.x!.offset_mm).toBe(demoX + 10);
    // Theirs is version 2 in the saved versions.
    const revision = (await page.evaluate(`fetch('/api/frames/${frameId}/revisions/2', { credentials: 'same-origin' }).then((r) => r.json())`)) as {
      document: { members: unknown[] };
    };
    expect(revision.document.members).toHaveLength(theirs.members.length);
  });

  it('taking theirs loads their version, and mine is one undo away', async () => {
    await saveBehindTheEditor(page, frameId, 3, theirs);
    await nudgeAnUpright();
    await page.getByRole('button', { name: 'Take theirs' }).click();
    await expect.poll(() => statusText(page)).toContain(`${theirs.members.length} members`);

    await page.locator('[data-view="front"]').focus();
    await page.keyboard.press('Control+z');
    await expect.poll(() => statusText(page)).toContain(`${doc.members.length} members`);
    await page.getByTestId('save-state').getByText('All changes saved').waitFor();
    const saved = await serverFrame(page, frameId);
    expect(saved.version).toBe(5);
    expect(saved.document.members).toHaveLength(doc.members.length);
  });

  it('a reload while the choice is open brings it back with my version, kept by this browser', async () => {
    await saveBehindTheEditor(page, frameId, 5, theirs);
    await nudgeAnUpright();
    await page.getByRole('heading', { name: 'Someone else saved this frame' }).waitFor();
    await page.reload();
    await page.getByRole('heading', { name: 'Someone else saved this frame' }).waitFor();
    await expect.poll(() => statusText(page)).toContain(`${doc.members.length} members`);
    await page.getByRole('button', { name: 'Keep mine' }).click();
    await page.getByTestId('save-state').getByText('All changes saved').waitFor();
    const saved = await serverFrame(page, frameId);
    expect(saved.version).toBe(7);
    expect(saved.document.members).toHaveLength(doc.members.length);
    // Chosen: the draft is gone, a further reload opens the frame without the dialog.
    await page.reload();
    await expect.poll(() => statusText(page)).toContain(`${doc.members.length} members`);
    expect(await page.getByRole('heading', { name: 'Someone else saved this frame' }).count()).toBe(0);
  });
});
