import { computed, reactive, ref, shallowRef } from 'vue';
import type { SaveFrameDocumentResponse, VersionConflictCurrent } from '@shared/api';
import type { FrameDocument } from '@shared/model/frame-document';
import { isApiError } from '@/api';

export type SaveState = 'saved' | 'pending' | 'saving' | 'error' | 'conflict';

type Deps = {
  save: (frameId: string, baseVersion: number, document: FrameDocument) => Promise<SaveFrameDocumentResponse>;
  current: () => { frameId: string; doc: FrameDocument } | null;
  /** Called with the refused draft on a 409, so it can outlive the page. */
  onConflict?: (frameId: string, baseVersion: number, doc: FrameDocument) => void;
};

/** Quiet time after the last edit before saving (ms): a burst of edits goes as one save. */
export const AUTOSAVE_DELAY_MS = 1200;
const RETRY_MS = [2000, 5000, 15000, 30000];

/**
 * Autosave with the version the document was based on. The server refuses a save made on an old version (409):
 * saving then stops and `conflict` holds what was saved meanwhile, until the builder chooses; nothing is
 * overwritten either way. Network failures retry with growing pauses.
 */
export function useDocumentSaving(deps: Deps) {
  const baseVersion = ref(0);
  const savedDoc = shallowRef<FrameDocument | null>(null);
  const state = ref<SaveState>('saved');
  const error = ref<string | null>(null);
  const conflict = shallowRef<VersionConflictCurrent | null>(null);
  const lastSavedAt = ref<string | null>(null);
  let timer: ReturnType<typeof setTimeout> | null = null;
  let inFlight: Promise<void> | null = null;
  let retries = 0;

  const dirty = computed(() => {
    void state.value;
    const cur = deps.current();
    return cur !== null && cur.doc !== savedDoc.value;
  });

  function reset(version: number, doc: FrameDocument | null): void {
    if (timer) clearTimeout(timer);
    timer = null;
    baseVersion.value = version;
    savedDoc.value = doc;
    state.value = 'saved';
    error.value = null;
    conflict.value = null;
    retries = 0;
  }

  function schedule(delay = AUTOSAVE_DELAY_MS): void {
    if (conflict.value) return;
    if (timer) clearTimeout(timer);
    state.value = state.value === 'saving' ? 'saving' : 'pending';
    timer = setTimeout(() => {
      timer = null;
      void saveNow();
    }, delay);
  }

  async function saveNow(): Promise<void> {
    if (inFlight) {
      await inFlight;
      if (dirtyNow()) schedule(0);
      return;
    }
    const cur = deps.current();
    if (!cur || conflict.value) return;
    if (cur.doc === savedDoc.value) {
      state.value = 'saved';
      return;
    }
    state.value = 'saving';
    const sent = cur.doc;
    inFlight = (async () => {
      try {
        const reply = await deps.save(cur.frameId, baseVersion.value, sent);
        baseVersion.value = reply.version;
        savedDoc.value = sent;
        lastSavedAt.value = reply.updatedAt;
        error.value = null;
        retries = 0;
        state.value = dirtyNow() ? 'pending' : 'saved';
      } catch (e) {
        if (isApiError(e) && e.status === 409 && e.current) {
          deps.onConflict?.(cur.frameId, baseVersion.value, sent);
          conflict.value = e.current;
          state.value = 'conflict';
          error.value = null;
        } else {
          state.value = 'error';
          error.value = e instanceof Error ? e.message : String(e);
          // A refusal of the content (422) will not go away by retrying; anything else may.
          if (!(isApiError(e) && (e.status === 422 || e.status === 403 || e.status === 413))) {
            const wait = RETRY_MS[Math.min(retries, RETRY_MS.length - 1)];
            retries += 1;
            if (timer) clearTimeout(timer);
            timer = setTimeout(() => {
              timer = null;
              void saveNow();
            }, wait);
          }
        }
      } finally {
        inFlight = null;
      }
    })();
    await inFlight;
    // The reply may have found newer edits waiting.
    if ((state.value as SaveState) === 'pending') schedule();
  }

  function dirtyNow(): boolean {
    const cur = deps.current();
    return cur !== null && cur.doc !== savedDoc.value;
  }

  /** Save whatever is waiting, now (leaving the page, closing the frame). */
  async function flush(): Promise<void> {
    if (timer) {
      clearTimeout(timer);
      timer = null;
    }
    if (dirtyNow() && !conflict.value) await saveNow();
    else if (inFlight) await inFlight;
  }

  /** Base further saves on `version` (after a conflict); `doc` is what the server holds at it, if known. */
  function adoptVersion(version: number, doc: FrameDocument | null): void {
    baseVersion.value = version;
    conflict.value = null;
    if (doc) savedDoc.value = doc;
    state.value = dirtyNow() ? 'pending' : 'saved';
  }

  /** Shows a conflict again (a draft kept from before a reload): saving waits until the builder chooses. */
  function restoreConflict(current: VersionConflictCurrent): void {
    if (timer) clearTimeout(timer);
    timer = null;
    conflict.value = current;
    state.value = 'conflict';
  }

  function markSaved(doc: FrameDocument | null): void {
    savedDoc.value = doc;
    state.value = 'saved';
  }

  return reactive({ baseVersion, state, error, conflict, lastSavedAt, dirty, reset, schedule, saveNow, flush, adoptVersion, restoreConflict, markSaved });
}
