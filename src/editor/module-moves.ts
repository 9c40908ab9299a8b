import { bayOfModule, moveModules, swapModules } from '@shared/editing/edits';
import type { Scene } from '@shared/editing/scene';
import type { FrameDocument } from '@shared/model/frame-document';

// Swapping two modules wherever they are, with the reason in plain words when it cannot be done. Two modules in
// bays change bays (the frame re-lays); two free-standing ones change places (each one's base centre goes where
// the other's was).

const nameOf = (doc: FrameDocument, id: string): string => {
  const m = doc.modules.find((x) => x.id === id);
  return m?.name?.trim() ? `“${m.name.trim()}”` : 'the module';
};
const runName = (doc: FrameDocument, id: string): string => {
  const p = bayOfModule(doc, id);
  return p ? `bay ${p.index + 1} of ${p.run.name ?? 'the run'}` : 'no bay';
};

export type SwapResult = { ok: true; doc: FrameDocument; label: string } | { ok: false; reason: string };

/** Swap the picked modules, or say why not. */
export function swapPicked(doc: FrameDocument, scene: Scene, picked: readonly string[]): SwapResult {
  if (picked.length < 2) {
    return {
      ok: false,
      reason:
        picked.length === 0
          ? 'pick two modules first: click one, Shift-click the other (or drag one module onto the other).'
          : `${nameOf(doc, picked[0])} is picked; Shift-click the module to swap it with (or drag it onto that module).`,
    };
  }
  if (picked.length > 2) return { ok: false, reason: `${picked.length} modules are picked; a swap takes exactly two.` };
  const [a, b] = picked;
  const label = `Swap ${nameOf(doc, a)} and ${nameOf(doc, b)}`.replace(/[“”]/g, '');
  const pa = bayOfModule(doc, a);
  const pb = bayOfModule(doc, b);
  if (pa && pb) {
    if (pa.bay.id === pb.bay.id) return { ok: false, reason: `${nameOf(doc, a)} and ${nameOf(doc, b)} are in the same bay.` };
    return { ok: true, doc: swapModules(doc, a, b), label };
  }
  if (pa || pb) {
    const [inBay, free] = pa ? [a, b] : [b, a];
    return {
      ok: false,
      reason:
        `${nameOf(doc, inBay)} is in ${runName(doc, inBay)} and ${nameOf(doc, free)} stands free, so there is no bay to trade. ` +
        `Put ${nameOf(doc, free)} into a bay first (select it, then "Put it in a bay" on the Modules tab), or move it by hand.`,
    };
  }
  const ma = scene.modules.find((m) => m.id === a);
  const mb = scene.modules.find((m) => m.id === b);
  if (!ma || !mb) return { ok: false, reason: 'one of the modules is not in the drawing any more.' };
  const base = (m: typeof ma) => ({ x: (m.box.min[0] + m.box.max[0]) / 2, y: (m.box.min[1] + m.box.max[1]) / 2, z: m.box.min[2] });
  const qa = base(ma);
  const qb = base(mb);
  const toB = { x: qb.x - qa.x, y: qb.y - qa.y, z: qb.z - qa.z };
  const toA = { x: -toB.x, y: -toB.y, z: -toB.z };
  return { ok: true, doc: moveModules(moveModules(doc, new Set([a]), toB), new Set([b]), toA), label };
}
