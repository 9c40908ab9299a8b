import { crossAxes, type Axis } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import { DEFAULT_SIDE_GAP_MM, moduleLabel, moduleSchema, type Module, type ModuleInput } from '../model/module';
import type { Member } from '../model/member';
import type { Position } from '../model/position';
import { addBay, carryingMembers, findBay, moveModuleOutOfRun, moveModuleToBay, placeOfModule, spanningRails, type BayWhere } from './bays';
import { deleteItems } from './edits';
import { bayModuleIds } from '../model/run';
import { freshId, usedIds } from './ids';
import { layoutOf } from './layout';
import { bayWords, capital, refuse, type EditOutcome } from './outcome';

const tidy = (v: number): number => Math.round(v * 1000) / 1000;

/**
 * The members that carry a module in an open bay, made from the bay's own rails, as a cabinet layout makes them:
 * for a module that sits, two bearers between the lowest front and back rails, level with their tops; for one
 * that hangs, two hangers between the highest rails, level with their undersides; for one on slides, a rail
 * either side in line with the uprights, at the module's mid-height. The module is placed against those rails
 * (its front at the front rail's back face), so all of it follows when the frame re-lays. Null when the bay has
 * no pair of rails front and back to build on.
 */
function carriersInBay(doc: FrameDocument, bayId: string, mod: Module): { members: Member[]; place: Module['place']; sideGap_mm?: number } | null {
  const where = findBay(doc, bayId);
  if (!where) return null;
  const { run, bay, index } = where;
  const layout = layoutOf(doc);
  const box = new Map(layout.scene.members.map((m) => [m.id, m.drawn]));
  const c: Axis = crossAxes(run.axis).find((a) => a !== 'z') as Axis;
  const ci = { x: 0, y: 1, z: 2 }[c];
  const rails = spanningRails(doc, run, bay).filter((m) => box.has(m.id));
  // Rails by height, front to back at each height.
  const levels = new Map<number, Member[]>();
  for (const r of rails) {
    const z = tidy((box.get(r.id) as { min: number[] }).min[2]);
    levels.set(z, [...(levels.get(z) ?? []), r]);
  }
  const pairs = [...levels.entries()]
    .filter(([, list]) => list.length >= 2)
    .sort((p, q) => p[0] - q[0])
    .map(([, list]) => {
      const sorted = [...list].sort((p, q) => (box.get(p.id) as { min: number[] }).min[ci] - (box.get(q.id) as { min: number[] }).min[ci]);
      return { front: sorted[0], back: sorted[sorted.length - 1] };
    });
  if (pairs.length === 0) return null;
  const low = pairs[0];
  const high = pairs[pairs.length - 1];
  const lowBox = box.get(low.front.id) as { min: number[]; max: number[] };
  const t = lowBox.max[2] - lowBox.min[2];
  const clearance = bay.clearance_mm ?? run.clearance_mm;
  const used = usedIds(doc);
  const name = mod.name?.trim() || mod.kind;
  const label = capital(bayWords(run, index));
  const face = (member: string, f: 'min' | 'max', offset_mm = 0, align?: 'min' | 'center' | 'max'): Position => ({ member, face: f, offset_mm, ...(align ? { align } : {}) });
  const across = (id: string, what: string, pair: { front: Member; back: Member }, x: Position, z: Position): Member => ({
    type: 'member',
    id: freshId(used, `${bay.id}-${id}`),
    name: `${label}: ${what} for ${name}`,
    profile: low.front.profile,
    axis: c,
    rotation_deg: 0,
    start: face(pair.front.id, 'max'),
    end: face(pair.back.id, 'min'),
    place: { [run.axis]: x, z },
  });
  const inset = clearance + t / 4;
  const atStart = (align: 'min' | 'max', offset_mm: number): Position => ({ datum: `${bay.id}.start`, offset_mm: tidy(offset_mm), align });
  const atEnd = (align: 'min' | 'max', offset_mm: number): Position => ({ datum: `${bay.id}.end`, offset_mm: tidy(offset_mm), align });
  const y = face(low.front.id, 'max');
  switch (mod.bearing) {
    case 'base': {
      const z = face(low.front.id, 'max', 0, 'max');
      return {
        members: [across('bearer-l', 'bearer', low, atStart('min', inset), z), across('bearer-r', 'bearer', low, atEnd('max', -inset), z)].map((m, k) => ({ ...m, name: `${m.name}, ${k === 0 ? 'left' : 'right'}` })),
        place: { [c]: y, z: face(low.front.id, 'max') },
      };
    }
    case 'hung': {
      const z = face(high.front.id, 'min', 0, 'min');
      return {
        members: [across('hanger-l', 'hanger', high, atStart('min', inset), z), across('hanger-r', 'hanger', high, atEnd('max', -inset), z)].map((m, k) => ({ ...m, name: `${m.name}, ${k === 0 ? 'left' : 'right'}` })),
        place: { [c]: face(high.front.id, 'max'), z: face(high.front.id, 'min', 0, 'max') },
      };
    }
    case 'side-rails': {
      const z = face(low.front.id, 'max', tidy(clearance + mod.size.h_mm / 2), 'center');
      return {
        members: [across('slide-l', 'slide rail', low, atStart('max', 0), z), across('slide-r', 'slide rail', low, atEnd('min', 0), z)].map((m, k) => ({ ...m, name: `${m.name}, ${k === 0 ? 'left' : 'right'}` })),
        place: { [c]: y, z: face(low.front.id, 'max', tidy(clearance)) },
        ...(clearance > DEFAULT_SIDE_GAP_MM ? { sideGap_mm: tidy(clearance + 1) } : {}),
      };
    }
  }
}

/**
 * Put a module that stands free (or a new one) into an open bay, with the members that carry it made from the
 * bay's rails (see carriersInBay). When the bay has no rails front and back to build on, the module goes in as it
 * is and the report says what it bears on.
 */
export function fitModuleInBay(doc: FrameDocument, moduleId: string, bayId: string): EditOutcome<{ notes: string[] }> {
  const where = findBay(doc, bayId);
  const mod = doc.modules.find((m) => m.id === moduleId);
  if (!where || !mod) return refuse('That module or bay is no longer in the frame.');
  if (where.bay.module !== undefined || (where.bay.stack?.length ?? 0) > 0) {
    return refuse(`${capital(bayWords(where.run, where.index))} already holds a module: pick an open bay, or add one.`);
  }
  if (doc.runs.some((r) => r.bays.some((b) => b.module === moduleId || b.stack?.includes(moduleId)))) {
    return refuse(`${capital(moduleLabel(mod))} is already in a bay; move it from there instead.`);
  }
  const carriers = carriersInBay(doc, bayId, mod);
  const notes = carriers ? [] : [`${capital(bayWords(where.run, where.index))} has no rails front and back to carry ${moduleLabel(mod)}; place it on members by hand.`];
  const { width_mm: _w, ...bay } = where.bay;
  void _w;
  const next: Module = carriers ? { ...mod, place: { ...mod.place, ...carriers.place }, ...(carriers.sideGap_mm !== undefined ? { sideGap_mm: carriers.sideGap_mm } : {}) } : mod;
  return {
    ok: true,
    doc: {
      ...doc,
      members: carriers ? [...doc.members, ...carriers.members] : doc.members,
      modules: doc.modules.map((m) => (m.id === moduleId ? next : m)),
      runs: doc.runs.map((r) => (r.id === where.run.id ? { ...r, bays: r.bays.map((b) => (b.id === bayId ? { ...bay, module: moduleId } : b)) } : r)),
    },
    label: `Put ${moduleLabel(mod)} in ${bayWords(where.run, where.index)}`,
    notes,
  };
}

export type NewModule = Omit<ModuleInput, 'type' | 'id' | 'place'>;

/**
 * Add a new module (from the library or typed in) to a run: into an open bay, or into a new bay (with its
 * uprights and rails, see addBay) before, after or at the end; with the members that carry it. One edit.
 */
export function addModuleToRun(
  doc: FrameDocument,
  input: NewModule,
  runId: string,
  where: BayWhere | { bay: string } = 'end',
): EditOutcome<{ moduleId: string; bayId: string; notes: string[] }> {
  const parsed = moduleSchema.safeParse({ ...input, type: 'module', id: 'new', place: {} });
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const words: Record<string, string> = { size: 'size', mass_kg: 'mass', contents_kg: 'contents', litres: 'litres', name: 'name', kind: 'kind', bearing: 'way of bearing' };
    return refuse(`The module’s ${words[String(issue.path[0])] ?? 'value'} ${issue.message}.`);
  }
  let next = doc;
  let bayId: string;
  if (typeof where === 'object' && 'bay' in where) bayId = where.bay;
  else {
    const added = addBay(doc, runId, where);
    if (!added.ok) return added;
    next = added.doc;
    bayId = added.bayId;
  }
  const moduleId = freshId(usedIds(next), input.kind);
  const mod: Module = { ...parsed.data, id: moduleId };
  next = { ...next, modules: [...next.modules, mod] };
  const fitted = fitModuleInBay(next, moduleId, bayId);
  if (!fitted.ok) return fitted;
  return { ...fitted, label: `Add ${moduleLabel(mod)}`, moduleId, bayId };
}

/**
 * Move a module into an open bay, whichever way it stands now: from another bay of the same run its carrying
 * members go with it (moveModuleToBay); from another run, or standing free, it gets members made from the new
 * bay's rails (fitModuleInBay), and the members that carried it in another run go.
 */
export function putModuleInBay(doc: FrameDocument, moduleId: string, bayId: string): EditOutcome {
  const from = placeOfModule(doc, moduleId);
  if (!from) return fitModuleInBay(doc, moduleId, bayId);
  const target = findBay(doc, bayId);
  if (!target || target.run.id === from.run.id || bayModuleIds(from.bay).length > 1) return moveModuleToBay(doc, moduleId, bayId);
  if (bayModuleIds(target.bay).length > 0) return moveModuleToBay(doc, moduleId, bayId);
  const carriers = new Set(carryingMembers(doc, moduleId).map((m) => m.id));
  const out = moveModuleOutOfRun(doc, moduleId);
  if (!out.ok) return out;
  const bare = deleteItems(out.doc, layoutOf(out.doc).scene, carriers, new Set());
  const fitted = fitModuleInBay(bare, moduleId, bayId);
  if (!fitted.ok) return fitted;
  const mod = doc.modules.find((m) => m.id === moduleId) as Module;
  return { ok: true, doc: fitted.doc, label: `Move ${moduleLabel(mod)} into ${bayWords(target.run, target.index)}` };
}
