import { placeOfModule } from '@shared/editing/bays';
import { trySwapModules } from '@shared/editing/swap';
import { moveModules } from '@shared/editing/edits';
import type { Scene } from '@shared/editing/scene';
import type { FrameDocument } from '@shared/model/frame-document';

// Swapping the picked modules wherever they are, with the reason in plain words when it cannot be done. Modules in
// bays change bays (the frame re-lays); two free-standing ones change places (each one's base centre goes where
// the other's was).

const nameOf = (doc: FrameDocument, id: string): string => {
  const m = doc.modules.find((x) => x.id === id);
  return m?.name?.trim() ? `“${m.name.trim()}”` : 'the module';
};

export type SwapResult = { ok: true; doc: FrameDocument; label: string } | { ok: false; reason: string };

/** Swap the picked modules, or say why not. */
export function swapPicked(doc: FrameDocument, scene: Scene, picked: readonly string[]): SwapResult {
  if (picked.length < 2) {
    return {
      ok: false,
      reason:
        picked.length === 0
          ? 'Pick two modules first: click one, Shift-click the other (or drag one module onto the other).'
          : `Only ${nameOf(doc, picked[0])} is picked; Shift-click the module to swap it with (or drag it onto that module).`,
    };
  }
  if (picked.length > 2) return { ok: false, reason: `${picked.length} modules are picked; a swap takes exactly two.` };
  const [a, b] = picked;
  const label = `Swap ${nameOf(doc, a)} and ${nameOf(doc, b)}`.replace(/[“”]/g, '');
  // In bays the engine swaps (or says why not); two free-standing modules change places here.
  if (placeOfModule(doc, a) || placeOfModule(doc, b)) return trySwapModules(doc, a, b);
  const ma = scene.modules.find((m) => m.id === a);
  const mb = scene.modules.find((m) => m.id === b);
  if (!ma || !mb) return { ok: false, reason: 'One of the modules is not in the drawing any more.' };
  const base = (m: typeof ma) => ({ x: (m.box.min[0] + m.box.max[0]) / 2, y: (m.box.min[1] + m.box.max[1]) / 2, z: m.box.min[2] });
  const qa = base(ma);
  const qb = base(mb);
  const toB = { x: qb.x - qa.x, y: qb.y - qa.y, z: qb.z - qa.z };
  const toA = { x: -toB.x, y: -toB.y, z: -toB.z };
  return { ok: true, doc: moveModules(moveModules(doc, new Set([a]), toB), new Set([b]), toA), label };
}
