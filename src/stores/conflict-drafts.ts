import type { FrameDocument } from '@shared/model/frame-document';

/**
 * A draft that lost a save race (409) stays in this browser, per frame, until the builder chooses what to keep:
 * closing the tab or reloading the page brings the choice back instead of losing their changes.
 */
export interface ConflictDraft {
  frameId: string;
  /** The version the draft was based on when the save was refused. */
  baseVersion: number;
  document: FrameDocument;
  keptAt: string;
}

const key = (frameId: string) => `slotwright.conflict-draft.${frameId}`;

type StorageLike = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;
const storage = (): StorageLike | null => (typeof localStorage === 'undefined' ? null : localStorage);

/** Returns false when the browser would not keep it (storage full or off); the dialog's download still works. */
export function keepDraft(draft: ConflictDraft, store: StorageLike | null = storage()): boolean {
  try {
    store?.setItem(key(draft.frameId), JSON.stringify(draft));
    return store !== null;
  } catch {
    return false;
  }
}

export function loadDraft(frameId: string, store: StorageLike | null = storage()): ConflictDraft | null {
  try {
    const raw = store?.getItem(key(frameId));
    if (!raw) return null;
    const d = JSON.parse(raw) as Partial<ConflictDraft>;
    if (d.frameId !== frameId || typeof d.baseVersion !== 'number' || typeof d.document !== 'object' || d.document === null) return null;
    return d as ConflictDraft;
  } catch {
    return null;
  }
}

export function dropDraft(frameId: string, store: StorageLike | null = storage()): void {
  try {
    store?.removeItem(key(frameId));
  } catch {
    // Nothing to do: a draft that cannot be removed is offered again and can be dismissed again.
  }
}
