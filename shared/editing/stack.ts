import { buildCabinetRun, moduleBaseDatum, moduleDatumIds, type CabinetModule } from '../model/cabinet-run';
import type { FrameDocument } from '../model/frame-document';
import type { Member } from '../model/member';
import { moduleLabel, moduleSchema, type Module, type ModuleInput } from '../model/module';
import { parseFrameDocument } from '../model/parse';
import { bayModuleIds, MAX_STACK, type Bay, type Run } from '../model/run';
import { findBay, placeOfModule, refersToBay, renameByPlace, spanningRails } from './bays';
import { deleteItems } from './edits';
import { freshId, usedIds } from './ids';
import { layoutOf } from './layout';
import { bayWords, capital, refuse, type EditOutcome } from './outcome';
import { datumsOfMember, renameDatumRefs } from './references';

// Editing one bay's stack (modules one above another): the bay's modules are laid out again as a cabinet layout
// lays them (see buildCabinetRun), in the new order, so every module gets the members that carry it and each
// stacked module's base stays chained to the one below. The bay's own rails, the uprights and everything else in
// the frame are left as they are.

/** A level of a stack: its module and the room under it (null: what a cabinet layout gives by default). */
type Level = { module: Module; room: number | null };

const LAYOUT_DATUMS = ['floor', 'seat', 'top', 'front', 'back'] as const;
const tidy = (v: number): number => Math.round(v * 1000) / 1000;

/**
 * The datums the bay's layout stands on (its seat, top, front and back), found from its rails: a run made by a
 * cabinet layout names them plainly, a run added beside a frame after itself. Null when the bay was not laid out
 * that way (a hand-drawn or converted bay), whose members are the builder's own.
 */
function layoutDatums(doc: FrameDocument, run: Run, bay: Bay): Map<string, string> | null {
  const rails = spanningRails(doc, run, bay);
  for (const prefix of [`${run.id}-`, '']) {
    const map = new Map(LAYOUT_DATUMS.map((d) => [d, `${prefix}${d}`]));
    if (!LAYOUT_DATUMS.every((d) => doc.datums.some((x) => x.id === map.get(d)))) continue;
    if (rails.some((m) => m.place.z?.datum === map.get('seat'))) return map;
  }
  return null;
}

/** The room under a module as its layout set it; undefined when it is not placed by a layout (by hand). */
function roomOf(doc: FrameDocument, m: Module, seat: string, top: string): number | null | undefined {
  const z = m.place.z;
  if (m.bearing === 'hung') return z?.datum === top ? null : undefined;
  if (z?.datum === seat && (z.offset_mm ?? 0) === 0) return 0;
  const base = doc.datums.find((d) => d.id === moduleBaseDatum(m.id));
  return base && z?.datum === base.id && (z.offset_mm ?? 0) === 0 ? base.offset_mm : undefined;
}

const plainName = (m: Module): string => moduleLabel(m).replace(/[“”]/g, '');

function asLayoutModule(l: Level): CabinetModule {
  const m = l.module;
  return {
    id: m.id,
    name: plainName(m),
    kind: m.kind,
    bearing: m.bearing,
    size: m.size,
    mass_kg: m.mass_kg,
    ...(l.room !== null ? { raise_mm: l.room } : {}),
  };
}

/** The levels of a bay as they stand, bottom to top, or the reason its stack cannot be edited. */
function levelsOf(doc: FrameDocument, run: Run, bay: Bay): { levels: Level[]; datums: Map<string, string> } | string {
  const datums = layoutDatums(doc, run, bay);
  const where = bayWords(run, run.bays.indexOf(bay));
  if (!datums) return `${capital(where)} was not laid out from a cabinet layout (its rails are drawn by hand), so its modules cannot be stacked for you; place them with their position fields instead.`;
  const levels: Level[] = [];
  for (const id of bayModuleIds(bay)) {
    const module = doc.modules.find((m) => m.id === id);
    if (!module) return `${capital(where)} names a module that is no longer in the frame; remove the bay or put a module in it.`;
    const room = roomOf(doc, module, datums.get('seat') as string, datums.get('top') as string);
    if (room === undefined) return `${capital(moduleLabel(module))} has been placed by hand in ${where}, so the stack cannot be laid out around it. Take it out of the run first.`;
    levels.push({ module, room });
  }
  return { levels, datums };
}

/** The members that carry the bay's modules now: at their own datums, or across the run from the bay's edges. */
function carriersOf(doc: FrameDocument, run: Run, bay: Bay): Member[] {
  const own = new Set(bayModuleIds(bay).flatMap(moduleDatumIds));
  const rails = new Set(spanningRails(doc, run, bay).map((m) => m.id));
  const boundary = new RegExp(`^${run.id.replace(/-/g, '\\-')}\\.u\\d+$`);
  return doc.members.filter((m) => {
    if (rails.has(m.id)) return false;
    const ds = datumsOfMember(m);
    if (ds.some((d) => own.has(d))) return true;
    return refersToBay(m, bay.id) && m.axis !== run.axis && ds.every((d) => !boundary.test(d));
  });
}

/** `list` without the `old` items, with `fresh` where the first of them stood in `was` (else at the end). */
function spliceIn<T extends { id: string }>(was: readonly T[], list: readonly T[], old: ReadonlySet<string>, fresh: readonly T[]): T[] {
  const at = was.findIndex((x) => old.has(x.id));
  const kept = list.filter((x) => !old.has(x.id));
  const i = at < 0 ? kept.length : was.slice(0, at).filter((x) => !old.has(x.id)).length;
  return [...kept.slice(0, i), ...fresh, ...kept.slice(i)];
}

/**
 * Lay a bay's stack out again with `levels` bottom to top (modules not yet in `doc` are added): the members that
 * carried the old stack go, those for the new one come, and each module's height follows the one below.
 */
function relayStack(doc: FrameDocument, run: Run, bay: Bay, levels: readonly Level[], datumMap: Map<string, string>, gone: ReadonlySet<string>, label: string): EditOutcome {
  if (levels.length > MAX_STACK + 1) return refuse(`${capital(bayWords(run, run.bays.indexOf(bay)))} already holds ${levels.length - 1} modules, the most one bay may stack.`);
  const rail = spanningRails(doc, run, bay)[0];
  const width = layoutOf(doc).datums.bays.get(bay.id)?.width_mm ?? bay.width_mm ?? 100;
  const nextBay: Bay = { id: bay.id, ...(bay.name !== undefined ? { name: bay.name } : {}) };
  if (levels.length > 0) nextBay.module = levels[0].module.id;
  if (levels.length > 1) nextBay.stack = levels.slice(1).map((l) => l.module.id);
  // A fixed width stays while the bay can hold its widest module; an open bay too narrow follows its modules.
  const clearance = bay.clearance_mm ?? run.clearance_mm;
  const need = Math.max(0, ...levels.map((l) => l.module.size.w_mm)) + 2 * clearance;
  if (levels.length === 0 || (bay.width_mm !== undefined && (bay.width_mm + 1e-6 >= need || bayModuleIds(bay).length > 0))) nextBay.width_mm = bay.width_mm ?? tidy(width);
  if (levels.length > 0 && bay.width_mm !== undefined && bay.width_mm + 1e-6 < need && bayModuleIds(bay).length > 0) {
    return refuse(`${capital(bayWords(run, run.bays.indexOf(bay)))} is ${tidy(bay.width_mm)} mm wide; its widest module needs ${tidy(need)} mm with the clearance either side. Widen the bay or let it follow its module first.`);
  }
  if (bay.clearance_mm !== undefined) nextBay.clearance_mm = bay.clearance_mm;

  let built = buildCabinetRun({
    name: 'stack',
    runId: run.id,
    profile: rail?.profile ?? '40x40-s8',
    depth_mm: 600,
    height_mm: 1000,
    seat_mm: 0,
    clearance_mm: clearance,
    bays: [{ id: bay.id, ...(nextBay.width_mm !== undefined || levels.length === 0 ? { width_mm: nextBay.width_mm ?? tidy(width) } : {}), ...(levels.length > 0 ? { module: asLayoutModule(levels[0]), stack: levels.slice(1).map(asLayoutModule) } : {}) }],
  });
  built = renameDatumRefs(built, (id) => datumMap.get(id) ?? id);
  const frameMembers = new RegExp(`^(${run.id.replace(/-/g, '\\-')}-[ux]\\d+-|${bay.id.replace(/-/g, '\\-')}-(top|low)-[fb]$)`);
  // The layout built for this bay alone calls it bay 1; its members take the bay's place in the run.
  const bayName = `Bay ${run.bays.indexOf(bay) + 1}`;
  const members = built.members
    .filter((m) => !frameMembers.test(m.id))
    .map((m) => ({ ...m, profile: rail?.profile ?? m.profile, ...(m.name ? { name: m.name.replace(/^Bay 1\b/, bayName) } : {}) }));
  const ids = new Set(levels.map((l) => l.module.id));
  const ownDatums = new Set([...ids, ...gone].flatMap(moduleDatumIds));
  const datums = built.datums.filter((d) => ownDatums.has(d.id));

  const old = carriersOf(doc, run, bay);
  const fresh = new Set(members.map((m) => m.id));
  // What referred to a carrier that is not made again is pinned where it is now.
  let next = deleteItems(doc, layoutOf(doc).scene, new Set(old.filter((m) => !fresh.has(m.id)).map((m) => m.id)), new Set(gone));
  const clash = next.members.find((m) => fresh.has(m.id) && !old.some((o) => o.id === m.id));
  if (clash) return refuse(`A part drawn by hand in ${bayWords(run, run.bays.indexOf(bay))} is in the way of the members this stack needs; remove it, then try again.`);
  next = {
    ...next,
    members: spliceIn(doc.members, next.members, new Set(old.map((m) => m.id)), members),
    datums: spliceIn(doc.datums, next.datums, ownDatums, datums),
    modules: [...next.modules, ...levels.filter((l) => !next.modules.some((m) => m.id === l.module.id)).map((l) => l.module)].map((m) => {
      if (!ids.has(m.id)) return m;
      const b = built.modules.find((x) => x.id === m.id) as Module;
      const { sideGap_mm: _g, ...rest } = m;
      void _g;
      return { ...rest, place: { ...m.place, z: b.place.z, ...(m.place.y ? {} : { y: b.place.y }) }, ...(b.sideGap_mm !== undefined ? { sideGap_mm: b.sideGap_mm } : {}) };
    }),
    runs: next.runs.map((r) => (r.id === run.id ? { ...r, bays: r.bays.map((b) => (b.id === bay.id ? nextBay : b)) } : r)),
  };
  next = renameByPlace(next, next.runs.find((r) => r.id === run.id) as Run);
  try {
    next = parseFrameDocument(next);
  } catch {
    return refuse(`The modules of ${bayWords(run, run.bays.indexOf(bay))} could not be laid out in that order; nothing was changed.`);
  }
  return { ok: true, doc: next, label };
}

/** A module for a stack: what the library or the builder gives (no id, no place). */
export type NewStackModule = Omit<ModuleInput, 'type' | 'id' | 'place'>;
export type StackWhere = 'top' | 'bottom' | { above: string } | { below: string };

/** Add a module (or a shelf) to a bay's stack, above or below one of its modules; what is above it moves up. */
export function addToStack(doc: FrameDocument, bayId: string, input: NewStackModule, where: StackWhere = 'top'): EditOutcome<{ moduleId: string }> {
  const found = findBay(doc, bayId);
  if (!found) return refuse('That bay is no longer in the frame.');
  const { run, bay } = found;
  const now = levelsOf(doc, run, bay);
  if (typeof now === 'string') return refuse(now);
  const used = usedIds(doc);
  for (const d of doc.datums) used.add(d.id);
  const id = freshId(used, input.kind);
  const parsed = moduleSchema.safeParse({ ...input, type: 'module', id, place: {} });
  if (!parsed.success) return refuse(`The new module cannot be added: its ${String(parsed.error.issues[0].path[0] ?? 'figures')} ${parsed.error.issues[0].message}.`);
  let i = where === 'top' ? now.levels.length : where === 'bottom' ? 0 : now.levels.findIndex((l) => l.module.id === ('above' in where ? where.above : where.below));
  if (i < 0) return refuse('That module is not in this bay any more.');
  if (typeof where === 'object' && 'above' in where) i += 1;
  const levels = now.levels.slice();
  // A module slid in at the bottom takes the bottom's room (none, on the seat); the one it lifts gets a stack's.
  if (i === 0 && levels.length > 0) {
    levels.splice(0, 1, { ...levels[0], room: null });
    levels.unshift({ module: parsed.data, room: now.levels[0].room });
  } else levels.splice(i, 0, { module: parsed.data, room: null });
  const place = typeof where === 'object' ? `${'above' in where ? 'above' : 'below'} ${moduleLabel(now.levels[i - ('above' in where ? 1 : 0)]?.module ?? parsed.data)}` : `to ${bayWords(run, found.index)}`;
  const r = relayStack(doc, run, bay, levels, now.datums, new Set(), `Add ${moduleLabel(parsed.data)} ${place}`);
  return r.ok ? { ...r, moduleId: id } : r;
}

/** Remove a module from its bay's stack (it goes from the frame, with its members); what was above comes down. */
export function removeFromStack(doc: FrameDocument, moduleId: string): EditOutcome {
  const at = placeOfModule(doc, moduleId);
  const mod = doc.modules.find((m) => m.id === moduleId);
  if (!mod) return refuse('That module is no longer in the frame.');
  if (!at) return refuse(`${capital(moduleLabel(mod))} stands free, in no bay; delete it instead.`);
  const now = levelsOf(doc, at.run, at.bay);
  if (typeof now === 'string') return refuse(now);
  const levels = now.levels.filter((l) => l.module.id !== moduleId);
  // The module that comes down to the bottom takes the bottom's room.
  if (at.level === 0 && levels.length > 0) levels[0] = { ...levels[0], room: now.levels[0].room };
  return relayStack(doc, at.run, at.bay, levels, now.datums, new Set([moduleId]), `Remove ${moduleLabel(mod)} from ${bayWords(at.run, at.index)}`);
}

/**
 * Swap two modules of one stack: they exchange levels and the stack is laid out again (the room under each level
 * stays with the level, so swapping twice gives the stack back).
 */
export function swapInStack(doc: FrameDocument, a: string, b: string): EditOutcome {
  const pa = placeOfModule(doc, a);
  const pb = placeOfModule(doc, b);
  const ma = doc.modules.find((m) => m.id === a);
  const mb = doc.modules.find((m) => m.id === b);
  if (!pa || !pb || !ma || !mb) return refuse('One of those modules is no longer in the frame.');
  if (pa.bay.id !== pb.bay.id) return refuse(`${capital(moduleLabel(ma))} and ${moduleLabel(mb)} are in different bays.`);
  const now = levelsOf(doc, pa.run, pa.bay);
  if (typeof now === 'string') return refuse(now);
  const levels = now.levels.slice();
  levels[pa.level] = { module: mb, room: now.levels[pa.level].room };
  levels[pb.level] = { module: ma, room: now.levels[pb.level].room };
  return relayStack(doc, pa.run, pa.bay, levels, now.datums, new Set(), `Swap ${moduleLabel(ma)} and ${moduleLabel(mb)} in ${bayWords(pa.run, pa.index)}`);
}
