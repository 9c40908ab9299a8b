import type { FrameDocument } from '../model/frame-document';
import { moduleLabel, type Module } from '../model/module';
import { bayModuleIds } from '../model/run';
import { placeOfModule, refersToBay, renameByPlace } from './bays';
import { capital, refuse, type EditOutcome } from './outcome';
import { swapInStack } from './stack';

/**
 * Swap two modules. In one run their bays change places (with whatever else each bay holds above or below, and
 * the members that carry them); the uprights between re-lay. In two runs, two modules alone in their bays and
 * carried the same way change bays; two modules of one stack exchange levels. Otherwise the reason is given in plain words.
 */
export function trySwapModules(doc: FrameDocument, a: string, b: string): EditOutcome {
  const ma = doc.modules.find((m) => m.id === a);
  const mb = doc.modules.find((m) => m.id === b);
  if (!ma || !mb) return refuse('One of those modules is no longer in the frame.');
  const na = moduleLabel(ma);
  const nb = moduleLabel(mb);
  if (a === b) return refuse(`Pick two different modules to swap; both picks are ${na}.`);
  const pa = placeOfModule(doc, a);
  const pb = placeOfModule(doc, b);
  const free = !pa ? na : !pb ? nb : null;
  if (free) {
    return refuse(`${capital(free)} stands free, in no bay of a run, so the frame cannot re-lay around it. Make bays from the frame’s uprights, or move it into an open bay, then swap.`);
  }
  const A = pa as NonNullable<typeof pa>;
  const B = pb as NonNullable<typeof pb>;
  if (A.bay.id === B.bay.id) return swapInStack(doc, a, b);
  if (A.run.id === B.run.id) {
    const bays = A.run.bays.slice();
    bays[A.index] = B.bay;
    bays[B.index] = A.bay;
    const stacked = bayModuleIds(A.bay).length > 1 || bayModuleIds(B.bay).length > 1;
    const run = { ...A.run, bays };
    return {
      ok: true,
      // Names that say which bay a member belongs to follow the bays to their new places.
      doc: renameByPlace({ ...doc, runs: doc.runs.map((r) => (r.id === A.run.id ? run : r)) }, run),
      label: stacked ? `Swap the bays of ${na} and ${nb}` : `Swap ${na} and ${nb}`,
    };
  }
  if (bayModuleIds(A.bay).length > 1 || bayModuleIds(B.bay).length > 1) {
    return refuse(`${capital(na)} and ${nb} are in different runs and one of them is stacked with other modules; only a module alone in its bay can change runs.`);
  }
  if (ma.bearing !== mb.bearing) {
    const how = { base: 'sits on bearers', hung: 'hangs from the top', 'side-rails': 'runs on side rails' } as const;
    return refuse(`${capital(na)} ${how[ma.bearing]} and ${nb} ${how[mb.bearing]}; in different runs their bays carry them differently. Move each into an open bay instead.`);
  }
  const runs = doc.runs.map((r) => {
    if (r.id !== A.run.id && r.id !== B.run.id) return r;
    return { ...r, bays: r.bays.map((bay) => (bay.id === A.bay.id ? { ...bay, module: b } : bay.id === B.bay.id ? { ...bay, module: a } : bay)) };
  });
  // The members stay in their bays and now carry the other module: names that say whom they carry follow.
  const plain = (m: Module) => moduleLabel(m).replace(/[“”]/g, '');
  const members = doc.members.map((m) => {
    if (!m.name) return m;
    const inA = refersToBay(m, A.bay.id);
    if (!inA && !refersToBay(m, B.bay.id)) return m;
    const [from, to] = inA ? [plain(ma), plain(mb)] : [plain(mb), plain(ma)];
    const name = m.name.replace(` for ${from}`, ` for ${to}`);
    return name === m.name ? m : { ...m, name };
  });
  return { ok: true, doc: { ...doc, members, runs }, label: `Swap ${na} and ${nb}` };
}
