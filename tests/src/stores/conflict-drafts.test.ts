import { describe, expect, it } from 'vitest';
import { emptyFrameDocument } from '@shared/model/frame-document';
import { ApiError } from '@/api/http';
import { dropDraft, keepDraft, loadDraft } from '@/stores/conflict-drafts';
import { useDocumentSaving } from '@/stores/document-saving';

// After a 409 the losing draft is kept in the browser until the builder chooses.

function memoryStorage() {
  const m = new Map<string, string>();
  return {
    getItem: (k: string) => m.get(k) ?? null,
    setItem: (k: string, v: string) => void m.set(k, v),
    removeItem: (k: string) => void m.delete(k),
    size: () => m.size,
  };
}

describe('conflict drafts', () => {
  it('keeps, reads back and drops a draft per frame; damaged entries read as none', () => {
    const s = memoryStorage();
    const document = emptyFrameDocument('Mine');
    expect(keepDraft({ frameId: 'f1', baseVersion: 3, document, keptAt: '2026-12-02T00:00:00Z' }, s)).toBe(true);
    expect(loadDraft('f1', s)?.document.name).toBe('Mine');
    expect(loadDraft('f2', s)).toBeNull();
    s.setItem('slotwright.conflict-draft.f3', '{broken');
    expect(loadDraft('f3', s)).toBeNull();
    dropDraft('f1', s);
    expect(loadDraft('f1', s)).toBeNull();
  });

  it('a full storage is reported, not thrown', () => {
    const full = { getItem: () => null, setItem: () => { throw new Error('QuotaExceededError'); }, removeItem: () => undefined };
    expect(keepDraft({ frameId: 'f', baseVersion: 1, document: emptyFrameDocument(), keptAt: '' }, full)).toBe(false);
  });

  it('autosave hands the refused draft over on a 409, with the version it was based on', async () => {
    let doc = emptyFrameDocument('v1');
    const kept: { frameId: string; baseVersion: number; name: string }[] = [];
    const saving = useDocumentSaving({
      save: async () => {
        throw new ApiError(409, 'version_conflict', 'saved by someone else', {}, { version: 4, document: {}, savedAt: '2026-12-02T00:00:00.000Z', savedBy: null });
      },
      current: () => ({ frameId: 'frame-a', doc }),
      onConflict: (frameId, baseVersion, d) => kept.push({ frameId, baseVersion, name: d.name }),
    });
    saving.reset(3, doc);
    doc = emptyFrameDocument('my edit');
    await saving.saveNow();
    expect(saving.state).toBe('conflict');
    expect(kept).toEqual([{ frameId: 'frame-a', baseVersion: 3, name: 'my edit' }]);
  });
});
