import { AXES, type Axis, type Vec3 } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import { memberSchema, type Member, type MemberEnd, type MemberInput } from '../model/member';
import { moduleSchema, type Module, type ModuleInput } from '../model/module';
import type { Position } from '../model/position';
import type { Bay, Run } from '../model/run';
import { AXIS_INDEX } from '../model/axis';
import { freshId, usedIds } from './ids';
import type { Scene, SceneMember } from './scene';
import type { SnapRef } from './snap';

// Edits are document → document functions. They never mutate: a touched record is replaced, untouched ones are
// shared, so `diffDocuments` can turn the result into a Change for the history.

/** Round to a micrometre so repeated moves do not pile up float noise in saved offsets. */
const tidy = (v: number): number => {
  const r = Math.round(v * 1000) / 1000;
  return Object.is(r, -0) ? 0 : r;
};

const shift = <P extends Position>(p: P | undefined, d: number): P => ({ ...(p ?? {}), offset_mm: tidy((p?.offset_mm ?? 0) + d) }) as P;

/** A position from a snap reference, keeping what the old position said about joining and alignment. */
function fromRef<P extends Position>(old: P | undefined, ref: SnapRef): P {
  const { datum: _d, member: _m, face: _f, offset_mm: _o, ...keep } = (old ?? {}) as Position & Record<string, unknown>;
  void _d;
  void _m;
  void _f;
  void _o;
  return ('datum' in ref
    ? { ...keep, datum: ref.datum, offset_mm: tidy(ref.offset_mm) }
    : { ...keep, member: ref.member, face: ref.face, offset_mm: tidy(ref.offset_mm) }) as unknown as P;
}

/** A position pinned to an absolute coordinate (its reference dropped), keeping join, allowance and alignment. */
function absolute<P extends Position>(old: P | undefined, value: number): P {
  const { datum: _d, member: _m, face: _f, ...keep } = (old ?? {}) as Position & Record<string, unknown>;
  void _d;
  void _m;
  void _f;
  return { ...keep, offset_mm: tidy(value) } as unknown as P;
}

function replaceById<T extends { id: string }>(list: readonly T[], id: string, f: (r: T) => T): T[] {
  return list.map((r) => (r.id === id ? f(r) : r));
}

const memberOf = (scene: Scene, id: string): SceneMember | undefined => scene.members.find((m) => m.id === id);

// ---------------------------------------------------------------------------------------------------- members

/**
 * Move members by `delta` (mm). References are kept and their offsets changed, so a rail hung off an upright's face
 * stays attached; a position that refers to another member being moved needs no change (it moves with it).
 */
export function moveMembers(doc: FrameDocument, ids: ReadonlySet<string>, delta: Vec3): FrameDocument {
  if (ids.size === 0 || (delta.x === 0 && delta.y === 0 && delta.z === 0)) return doc;
  const moves = (p: Position | undefined) => !(p?.member !== undefined && ids.has(p.member));
  const members = doc.members.map((m) => {
    if (!ids.has(m.id)) return m;
    const next: Member = { ...m, place: { ...m.place } };
    const d = delta[m.axis];
    if (d !== 0) {
      if (moves(m.start)) next.start = shift(m.start, d);
      if (m.end && moves(m.end)) next.end = shift(m.end, d);
    }
    for (const a of AXES) {
      if (a === m.axis || delta[a] === 0 || !moves(m.place[a])) continue;
      next.place[a] = shift(m.place[a], delta[a]);
    }
    return next;
  });
  return { ...doc, members };
}

/**
 * Put one end of a member at `value` (mm on its axis), given where the references put it now (`sm.drawn`).
 * With a snap reference the end attaches to it; otherwise the end keeps its reference and its offset changes.
 */
export function stretchMember(doc: FrameDocument, sm: SceneMember, which: 'start' | 'end', value: number, ref: SnapRef | null = null): FrameDocument {
  const k = AXIS_INDEX[sm.axis];
  const current = which === 'start' ? sm.drawn.min[k] : sm.drawn.max[k];
  const d = value - current;
  if (Math.abs(d) < 1e-9 && !ref) return doc;
  const members = replaceById(doc.members, sm.id, (m) => {
    const next: Member = { ...m };
    if (which === 'start') {
      next.start = ref ? fromRef<MemberEnd>(m.start, ref) : shift(m.start, d);
      if (m.length_mm !== undefined) next.length_mm = tidy(m.length_mm - d);
    } else if (m.end) {
      next.end = ref ? fromRef<MemberEnd>(m.end, ref) : shift(m.end, d);
    } else {
      next.length_mm = tidy((m.length_mm ?? 0) + d);
    }
    return next;
  });
  return { ...doc, members };
}

/** Make a member `length` long between its drawn ends, moving its end (the start stays where it is). */
export function setMemberLength(doc: FrameDocument, sm: SceneMember, length: number): FrameDocument {
  const k = AXIS_INDEX[sm.axis];
  return stretchMember(doc, sm, 'end', sm.drawn.min[k] + length);
}

/** Put a member's low face on `axis` at `value` (mm), moving the whole member. */
export function setMemberPosition(doc: FrameDocument, sm: SceneMember, axis: Axis, value: number): FrameDocument {
  const d = value - sm.drawn.min[AXIS_INDEX[axis]];
  return moveMembers(doc, new Set([sm.id]), { x: 0, y: 0, z: 0, [axis]: d });
}

export function updateMember(doc: FrameDocument, id: string, patch: Partial<Pick<Member, 'profile' | 'rotation_deg' | 'role' | 'name'>>): FrameDocument {
  return { ...doc, members: replaceById(doc.members, id, (m) => ({ ...m, ...patch })) };
}

/** Set (or with undefined, clear back to the frame's default) the join method at one end. */
export function setEndJoin(doc: FrameDocument, id: string, which: 'start' | 'end', join: string | undefined): FrameDocument {
  return {
    ...doc,
    members: replaceById(doc.members, id, (m) => {
      const e = m[which];
      if (!e) return m;
      const { join: _old, ...rest } = e;
      void _old;
      return { ...m, [which]: join === undefined ? rest : { ...rest, join } };
    }),
  };
}

/** Marks or clears one end of a member as bolted to the vehicle's wall. */
export function setWallFixing(doc: FrameDocument, id: string, which: 'start' | 'end', fixed: boolean): FrameDocument {
  return {
    ...doc,
    members: replaceById(doc.members, id, (m) => {
      const ends = new Set(m.wallFixing === 'both' ? ['start', 'end'] : m.wallFixing ? [m.wallFixing] : []);
      if (fixed) ends.add(which);
      else ends.delete(which);
      const { wallFixing: _old, ...rest } = m;
      void _old;
      if (ends.size === 0) return rest;
      return { ...rest, wallFixing: ends.size === 2 ? 'both' : ([...ends][0] as 'start' | 'end') };
    }),
  };
}

export type NewMember = {
  axis: Axis;
  profile: string;
  /** Start and end on the member's axis, each an absolute value or attached to what it snapped to. */
  start: { value: number; ref: SnapRef | null };
  end: { value: number; ref: SnapRef | null };
  /** Low face on each cross axis (mm). */
  place: Partial<Record<Axis, number>>;
  role?: Member['role'];
};

/** Add a member; returns the document and the new member's id. */
export function addMember(doc: FrameDocument, spec: NewMember): { doc: FrameDocument; id: string } {
  const used = usedIds(doc);
  const prefix = spec.axis === 'z' ? 'upright' : spec.axis === 'x' ? 'rail' : 'cross';
  const id = freshId(used, prefix);
  const pos = (p: { value: number; ref: SnapRef | null }) => (p.ref ? fromRef<MemberEnd>(undefined, p.ref) : { offset_mm: tidy(p.value) });
  const place: Record<string, { offset_mm: number }> = {};
  for (const a of AXES) if (a !== spec.axis) place[a] = { offset_mm: tidy(spec.place[a] ?? 0) };
  const input: MemberInput = { type: 'member', id, profile: spec.profile, axis: spec.axis, start: pos(spec.start), end: pos(spec.end), place, ...(spec.role ? { role: spec.role } : {}) };
  const member = memberSchema.parse(input);
  return { doc: { ...doc, members: [...doc.members, member] }, id };
}

// ---------------------------------------------------------------------------------------------------- delete

/**
 * Delete members and modules. Whatever referred to a deleted member is pinned where it is now (so nothing else
 * moves); joint records naming it go; a module's bay stays open at its current width so the frame keeps its shape.
 */
export function deleteItems(doc: FrameDocument, scene: Scene, memberIds: ReadonlySet<string>, moduleIds: ReadonlySet<string>): FrameDocument {
  if (memberIds.size === 0 && moduleIds.size === 0) return doc;
  const faceValue = (p: Position, axis: Axis): number => {
    const sm = memberOf(scene, p.member as string);
    const k = AXIS_INDEX[axis];
    return (sm ? (p.face === 'max' ? sm.drawn.max[k] : sm.drawn.min[k]) : 0) + p.offset_mm;
  };
  const unpin = <P extends Position>(p: P | undefined, axis: Axis): P | undefined =>
    p && p.member !== undefined && memberIds.has(p.member) ? absolute(p, faceValue(p, axis)) : p;

  const members = doc.members
    .filter((m) => !memberIds.has(m.id))
    .map((m) => {
      let changed = false;
      const next: Member = { ...m, place: { ...m.place } };
      for (const end of ['start', 'end'] as const) {
        const e = m[end];
        const u = unpin(e, m.axis);
        if (u !== e) {
          next[end] = u as MemberEnd;
          changed = true;
        }
      }
      for (const a of AXES) {
        const u = unpin(m.place[a], a);
        if (u !== m.place[a]) {
          next.place[a] = u;
          changed = true;
        }
      }
      return changed ? next : m;
    });

  const modules = doc.modules
    .filter((m) => !moduleIds.has(m.id))
    .map((m) => {
      let next = m;
      for (const a of AXES) {
        const u = unpin(m.place[a], a);
        if (u !== m.place[a]) next = { ...next, place: { ...next.place, [a]: u } };
      }
      if (m.bearsOn?.some((id) => memberIds.has(id))) {
        const left = m.bearsOn.filter((id) => !memberIds.has(id));
        next = { ...next, bearsOn: left.length > 0 ? left : undefined };
      }
      return next;
    });

  const runs = doc.runs.map((r) => {
    if (!r.bays.some((b) => b.module !== undefined && moduleIds.has(b.module))) return r;
    const bays = r.bays.map((b): Bay => {
      if (b.module === undefined || !moduleIds.has(b.module)) return b;
      const layout = scene.bays.find((x) => x.id === b.id);
      const { module: _m, ...rest } = b;
      void _m;
      return { ...rest, width_mm: b.width_mm ?? tidy(layout ? layout.end_mm - layout.start_mm : 100) };
    });
    return { ...r, bays };
  });

  const datums = doc.datums.map((d) => {
    if (!d.plus.some((t) => moduleIds.has(t.module))) return d;
    let offset = d.offset_mm;
    for (const t of d.plus) {
      if (!moduleIds.has(t.module)) continue;
      const mod = doc.modules.find((m) => m.id === t.module);
      if (mod) offset += t.factor * { w: mod.size.w_mm, d: mod.size.d_mm, h: mod.size.h_mm }[t.size];
    }
    return { ...d, offset_mm: tidy(offset), plus: d.plus.filter((t) => !moduleIds.has(t.module)) };
  });

  const joints = doc.joints.some((j) => j.members.some((id) => memberIds.has(id)))
    ? doc.joints.filter((j) => !j.members.some((id) => memberIds.has(id)))
    : doc.joints;

  return { ...doc, members, modules, runs, datums, joints };
}

// ---------------------------------------------------------------------------------------------------- copies

/**
 * Copies of members moved by `delta`. A copy's reference to another copied member points at that member's copy;
 * other references are kept. Part marks are not copied (the engine gives each distinct part its mark).
 */
export function copyMembers(doc: FrameDocument, ids: readonly string[], delta: Vec3): { doc: FrameDocument; ids: string[] } {
  const used = usedIds(doc);
  const idMap = new Map<string, string>();
  const originals = doc.members.filter((m) => ids.includes(m.id));
  for (const m of originals) idMap.set(m.id, freshId(used, m.id.replace(/-\d+$/, '')));
  const remap = <P extends Position>(p: P | undefined): P | undefined =>
    p && p.member !== undefined && idMap.has(p.member) ? ({ ...p, member: idMap.get(p.member) } as P) : p;
  const copies = originals.map((m) => {
    const { mark: _mark, ...rest } = m;
    void _mark;
    const c: Member = {
      ...rest,
      id: idMap.get(m.id) as string,
      start: remap(m.start) as MemberEnd,
      end: remap(m.end),
      place: { x: remap(m.place.x), y: remap(m.place.y), z: remap(m.place.z) },
    };
    if (c.end === undefined) delete c.end;
    for (const a of AXES) if (c.place[a] === undefined) delete c.place[a];
    return c;
  });
  const moved = moveMembers({ ...doc, members: [...doc.members, ...copies] }, new Set(copies.map((c) => c.id)), delta);
  return { doc: moved, ids: copies.map((c) => c.id) };
}

/** `count` further copies, each `spacing` mm further along `axis` than the last. */
export function arrayMembers(doc: FrameDocument, ids: readonly string[], count: number, spacing: number, axis: Axis): { doc: FrameDocument; ids: string[] } {
  let out = doc;
  const all: string[] = [];
  for (let k = 1; k <= count; k++) {
    const r = copyMembers(out, ids, { x: 0, y: 0, z: 0, [axis]: spacing * k });
    out = r.doc;
    all.push(...r.ids);
  }
  return { doc: out, ids: all };
}

/**
 * Mirrored copies of members across the plane `axis = centre` (e.g. the left uprights give the right ones). On the
 * mirror axis the copies are placed by absolute values; their other references are kept. A member lying across
 * the plane symmetrically is its own mirror image and is not copied.
 */
export function mirrorCopy(doc: FrameDocument, scene: Scene, ids: readonly string[], axis: Axis, centre: number): { doc: FrameDocument; ids: string[] } {
  const used = usedIds(doc);
  const k = AXIS_INDEX[axis];
  const copies: Member[] = [];
  for (const m of doc.members) {
    if (!ids.includes(m.id)) continue;
    const sm = memberOf(scene, m.id);
    if (!sm) continue;
    const lo = tidy(2 * centre - sm.drawn.max[k]);
    const hi = tidy(2 * centre - sm.drawn.min[k]);
    if (Math.abs(lo - sm.drawn.min[k]) < 1e-6) continue;
    const { mark: _mark, ...rest } = m;
    void _mark;
    const c: Member = { ...rest, id: freshId(used, m.id.replace(/-\d+$/, '')), place: { ...m.place } };
    if (m.axis === axis) {
      c.start = absolute(m.start, lo);
      delete c.length_mm;
      c.end = absolute(m.end, hi);
    } else {
      const { align: _a, ...p } = absolute(m.place[axis], lo);
      void _a;
      c.place[axis] = p;
    }
    copies.push(c);
  }
  return { doc: { ...doc, members: [...doc.members, ...copies] }, ids: copies.map((c) => c.id) };
}

// ---------------------------------------------------------------------------------------------------- modules

/** Where a module sits: its run and bay, or null when it stands free. */
export function bayOfModule(doc: FrameDocument, moduleId: string): { run: Run; bay: Bay; index: number } | null {
  for (const run of doc.runs) {
    const index = run.bays.findIndex((b) => b.module === moduleId);
    if (index >= 0) return { run, bay: run.bays[index], index };
  }
  return null;
}

/**
 * Swap two modules. In one run their bays change places (the bays keep their ids, so whatever refers to a bay
 * edge moves with it and the uprights between re-lay); in two runs the modules change bays.
 */
export function swapModules(doc: FrameDocument, a: string, b: string): FrameDocument {
  const pa = bayOfModule(doc, a);
  const pb = bayOfModule(doc, b);
  if (!pa || !pb || a === b) return doc;
  if (pa.run.id === pb.run.id) {
    const bays = pa.run.bays.slice();
    bays[pa.index] = pb.bay;
    bays[pb.index] = pa.bay;
    return { ...doc, runs: replaceById(doc.runs, pa.run.id, (r) => ({ ...r, bays })) };
  }
  const runs = doc.runs.map((r) => {
    if (r.id !== pa.run.id && r.id !== pb.run.id) return r;
    return { ...r, bays: r.bays.map((bay) => (bay.id === pa.bay.id ? { ...bay, module: b } : bay.id === pb.bay.id ? { ...bay, module: a } : bay)) };
  });
  return { ...doc, runs };
}

/** Move a module's bay one place along its run (−1 towards the start). */
export function shiftModule(doc: FrameDocument, moduleId: string, step: -1 | 1): FrameDocument {
  const p = bayOfModule(doc, moduleId);
  if (!p) return doc;
  const j = p.index + step;
  if (j < 0 || j >= p.run.bays.length) return doc;
  const bays = p.run.bays.slice();
  bays[p.index] = p.run.bays[j];
  bays[j] = p.bay;
  return { ...doc, runs: replaceById(doc.runs, p.run.id, (r) => ({ ...r, bays })) };
}

export function updateModule(
  doc: FrameDocument,
  id: string,
  patch: Partial<Pick<Module, 'name' | 'mass_kg' | 'contents_kg' | 'litres' | 'bearing'>> & { size?: Partial<Module['size']> },
): FrameDocument {
  return {
    ...doc,
    modules: replaceById(doc.modules, id, (m) => {
      const { size, ...rest } = patch;
      const next = { ...m, ...rest, size: size ? { ...m.size, ...size } : m.size };
      if (next.litres === undefined) delete next.litres;
      return next;
    }),
  };
}

/** Move free-standing modules, or a bay module across its run. */
export function moveModules(doc: FrameDocument, ids: ReadonlySet<string>, delta: Vec3): FrameDocument {
  if (ids.size === 0) return doc;
  const modules = doc.modules.map((m) => {
    if (!ids.has(m.id)) return m;
    const bay = bayOfModule(doc, m.id);
    const place = { ...m.place };
    for (const a of AXES) {
      if (delta[a] === 0 || (bay && bay.run.axis === a)) continue;
      place[a] = shift(m.place[a], delta[a]);
    }
    return { ...m, place };
  });
  return { ...doc, modules };
}

export type ModulePlacement = { run: string; bay?: string } | { at: Vec3 };

/**
 * Add a module. Into a run: into the named open bay (which then takes the module's width), or as a new bay at
 * the run's end. Otherwise free-standing with its low corner at `at`.
 */
export function addModule(doc: FrameDocument, input: Omit<ModuleInput, 'type' | 'id' | 'place'> & { place?: ModuleInput['place'] }, placement: ModulePlacement): { doc: FrameDocument; id: string } {
  const used = usedIds(doc);
  const id = freshId(used, input.kind);
  const place =
    'at' in placement
      ? { x: { offset_mm: tidy(placement.at.x) }, y: { offset_mm: tidy(placement.at.y) }, z: { offset_mm: tidy(placement.at.z) } }
      : (input.place ?? {});
  const module = moduleSchema.parse({ ...input, type: 'module', id, place });
  let runs = doc.runs;
  if ('run' in placement) {
    runs = doc.runs.map((r) => {
      if (r.id !== placement.run) return r;
      if (placement.bay) {
        return {
          ...r,
          bays: r.bays.map((b) => {
            if (b.id !== placement.bay) return b;
            const { width_mm: _w, ...rest } = b;
            void _w;
            return { ...rest, module: id };
          }),
        };
      }
      const bay: Bay = { id: freshId(used, `bay-${input.kind}`), module: id };
      return { ...r, bays: [...r.bays, bay] };
    });
  }
  if ('at' in placement) {
    // A free module is placed on every axis by `place`; strip the run axis only when it sits in a run.
    for (const a of AXES) if (!module.place[a]) module.place[a] = { offset_mm: 0 };
  }
  return { doc: { ...doc, modules: [...doc.modules, module], runs }, id };
}
