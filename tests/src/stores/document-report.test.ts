import { afterEach, describe, expect, it, vi } from 'vitest';
import { createApp } from 'vue';
import { createPinia, setActivePinia } from 'pinia';
import type { Frame } from '@shared/api';
import { diffDocuments } from '@shared/editing/change';
import { moveMembers } from '@shared/editing/edits';
import { demoFrameDocument } from '@shared/model/demo-frame';
import type { FrameDocument } from '@shared/model/frame-document';
import { apiKey, type Api } from '@/api';
import { useDocumentStore } from '@/stores/document';

// The document store with the report engine answering after the current task (in process: there are no Web
// Workers here), as the worker does after its message round trip.

function openStore(doc: FrameDocument) {
  const app = createApp({});
  const saved: unknown[] = [];
  const api = { frames: { saveDocument: async (_id: string, body: unknown) => (saved.push(body), { version: 2, updatedAt: new Date().toISOString() }) } } as unknown as Api;
  app.provide(apiKey, api);
  const pinia = createPinia();
  app.use(pinia);
  setActivePinia(pinia);
  const store = app.runWithContext(() => useDocumentStore());
  const frame = {
    id: '00000000-0000-4000-8000-000000000001',
    projectId: '00000000-0000-4000-8000-000000000002',
    workshopId: '00000000-0000-4000-8000-000000000003',
    name: 'Kitchen pod',
    version: 1,
    document: doc as unknown as Frame['document'],
    memberCount: doc.members.length,
    role: 'designer',
    updatedAt: new Date().toISOString(),
    updatedBy: null,
    deletedAt: null,
  } as Frame;
  store.open(frame, true);
  return store;
}

const answered = () => vi.waitFor(() => new Promise((r) => setTimeout(r, 0)));
async function untilChecked(store: ReturnType<typeof useDocumentStore>): Promise<void> {
  await vi.waitFor(() => expect(store.checking).toBe(false), { timeout: 5000, interval: 5 });
}

afterEach(() => {
  vi.useRealTimers();
});

describe('the document store with the report worker', () => {
  it('draws a frame as soon as it opens; the report follows', async () => {
    const store = openStore(demoFrameDocument());
    expect(store.scene.members.length).toBe(demoFrameDocument().members.length);
    expect(store.report).toBeNull();
    expect(store.checking).toBe(true);
    await untilChecked(store);
    expect(store.report?.members.length).toBe(store.scene.members.length);
    // Part marks come with the report, and the scene takes them.
    expect(store.scene.members.every((m) => m.mark !== null)).toBe(true);
  });

  it('draws an edit made while a report is in flight at once, and shows the report on the edited frame', async () => {
    const doc = demoFrameDocument();
    const store = openStore(doc);
    await untilChecked(store);
    const id = 'galley-u2-f';
    const x0 = store.scene.members.find((m) => m.id === id)!.drawn.min[0];
    const move = (d: FrameDocument, dx: number) => diffDocuments(d, moveMembers(d, new Set([id]), { x: dx, y: 0, z: 0 }), 'Move member');
    expect(store.apply(move(store.doc!, 20))).toBe(true);
    // Drawn already, before any report on it.
    expect(store.scene.members.find((m) => m.id === id)!.drawn.min[0]).toBeCloseTo(x0 + 20, 6);
    expect(store.checking).toBe(true);
    // A second edit while the first one's report is being worked out.
    expect(store.apply(move(store.doc!, 15))).toBe(true);
    expect(store.scene.members.find((m) => m.id === id)!.drawn.min[0]).toBeCloseTo(x0 + 35, 6);
    await untilChecked(store);
    const reported = store.report!.members.find((m) => m.id === id)!;
    expect(reported.min_mm.x).toBeCloseTo(x0 + 35, 3);
    expect(store.scene.members.find((m) => m.id === id)!.box.min[0]).toBeCloseTo(x0 + 35, 3);
    await answered();
    // The stale answer (for the first move) did not come back afterwards and overwrite it.
    expect(store.report!.members.find((m) => m.id === id)!.min_mm.x).toBeCloseTo(x0 + 35, 3);
    expect(store.engineError).toBeNull();
  });

  it('shows an engine error for a frame the engine cannot check, and clears it when an edit is undone', async () => {
    const store = openStore(demoFrameDocument());
    await untilChecked(store);
    const good = store.report;
    const ok = store.edit('Move the cross-member', (d) => ({
      ...d,
      members: d.members.map((m) => (m.id === 'galley-x0-top' ? { ...m, start: { datum: 'front', offset_mm: 0 }, end: { datum: 'front', offset_mm: 30 } } : m)),
    }));
    expect(ok).toBe(true);
    await untilChecked(store);
    expect(store.engineError?.message).toMatch(/^members\[2\]: the cross-member “[^”]+” is cut back/);
    // The results stay those of the last frame that could be checked.
    expect(store.report).toBe(good);
    store.undo();
    await untilChecked(store);
    expect(store.engineError).toBeNull();
  });

  it('refuses at once an edit whose references cannot be resolved, keeping the document', async () => {
    const store = openStore(demoFrameDocument());
    await untilChecked(store);
    const before = store.doc;
    const ok = store.edit('Break a member', (d) => ({
      ...d,
      members: d.members.map((m) => (m.id === 'galley-x0-top' ? { ...m, start: { datum: 'front', offset_mm: 400 }, end: { datum: 'back', offset_mm: -300 } } : m)),
    }));
    expect(ok).toBe(false);
    expect(store.refusal?.message).toMatch(/galley-x0-top/);
    expect(store.doc).toBe(before);
    expect(store.checking).toBe(false);
  });
});
