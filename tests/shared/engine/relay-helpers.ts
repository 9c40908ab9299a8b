// Re-lay edits as the editor makes them, written out here so the tests do not depend on the editor's code.
import type { FrameDocument } from '@shared/model/frame-document';

/** Swap two bays of a run (the modules in them change places; no member record is touched). */
export function swapBays(doc: FrameDocument, runId: string, i: number, j: number): FrameDocument {
  return {
    ...doc,
    runs: doc.runs.map((r) => {
      if (r.id !== runId) return r;
      const bays = [...r.bays];
      [bays[i], bays[j]] = [bays[j], bays[i]];
      return { ...r, bays };
    }),
  };
}

/** Change a module's size. */
export function resizeModule(doc: FrameDocument, id: string, size: Partial<{ w_mm: number; d_mm: number; h_mm: number }>): FrameDocument {
  return { ...doc, modules: doc.modules.map((m) => (m.id === id ? { ...m, size: { ...m.size, ...size } } : m)) };
}
