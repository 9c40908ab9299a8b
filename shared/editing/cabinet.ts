import type { Vec3 } from '../model/axis';
import { buildCabinetRun, parseCabinetSpec, type CabinetSpec } from '../model/cabinet-run';
import type { FrameDocument } from '../model/frame-document';
import { parseFrameDocument } from '../model/parse';
import { freshId, usedIds } from './ids';
import { refuse, type EditOutcome } from './outcome';
import { renameDatumRefs } from './references';

/** The datums every cabinet layout makes for itself (see buildCabinetRun). */
const LAYOUT_DATUMS = ['floor', 'seat', 'top', 'front', 'back'];

/**
 * "Add a cabinet run" on an existing frame: the layout built as buildCabinetRun builds it, with its low front left
 * corner at `at`, its own datums (floor, seat, top, front and back, named after the run) and ids that do not clash
 * with the frame's. Bad input is refused naming the field, as the form shows it.
 */
export function addCabinetRun(doc: FrameDocument, input: CabinetSpec, at: Vec3 = { x: 0, y: 0, z: 0 }): EditOutcome<{ runId: string }> {
  let spec;
  try {
    spec = parseCabinetSpec(input);
  } catch (e) {
    return refuse(e instanceof Error ? e.message : String(e));
  }
  const used = usedIds(doc);
  for (const d of doc.datums) used.add(d.id);
  const fresh = (id: string) => (used.has(id) ? freshId(used, id) : (used.add(id), id));
  const runId = freshId(used, 'cabinet');
  const renamed = {
    ...spec,
    runId,
    bays: spec.bays.map((b) => ({
      ...b,
      id: fresh(b.id),
      ...(b.module ? { module: { ...b.module, id: fresh(b.module.id) } } : {}),
      ...(b.stack ? { stack: b.stack.map((m) => ({ ...m, id: fresh(m.id) })) } : {}),
    })),
  };
  let built = buildCabinetRun(renamed);
  const own = new Map(LAYOUT_DATUMS.map((d) => [d, `${runId}-${d}`]));
  built = renameDatumRefs(built, (id) => own.get(id) ?? id);
  built = {
    ...built,
    datums: built.datums.map((d) => {
      const id = own.get(d.id) ?? d.id;
      if (d.id === 'floor') return { ...d, id, offset_mm: at.z };
      if (d.id === 'front') return { ...d, id, offset_mm: at.y };
      return id === d.id ? d : { ...d, id };
    }),
    runs: built.runs.map((r) => ({ ...r, start: { offset_mm: at.x } })),
  };
  const next: FrameDocument = {
    ...doc,
    datums: [...doc.datums, ...built.datums],
    members: [...doc.members, ...built.members],
    modules: [...doc.modules, ...built.modules],
    runs: [...doc.runs, ...built.runs],
  };
  try {
    parseFrameDocument(next);
  } catch (e) {
    return refuse(`The cabinet cannot be added to this frame: ${e instanceof Error ? e.message : String(e)}`);
  }
  return { ok: true, doc: next, label: `Add the cabinet “${spec.name || 'run'}”`, runId };
}
