import { BEAR_TOLERANCE_MM } from '../engine/bearing';
import { overlapOn, type Box } from '../engine/box';
import type { FaceName } from '../engine/faces';
import type { FrameReport } from '../engine/report-types';
import { AXES, AXIS_INDEX, type Axis } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import { moduleLabel, type Bearing } from '../model/module';
import type { Position } from '../model/position';
import { placeOfModule } from './bays';
import { moveModules } from './edits';
import { capital, refuse, type EditOutcome } from './outcome';
import type { Scene } from './scene';
import type { SnapRef } from './snap';

/** Below this a module barely touches a member and is not over it (mm). */
const OVER_MM = 0.5;

/**
 * One face of a module snapped to a face of a member or of another module: the module's `side` face on `axis`
 * lands on the target's opposite face, so `low_mm` is where the module's low face goes. A member face gives a
 * reference (`ref`), so the module follows when the member moves; another module's face is a plain position,
 * since modules are not placed against each other.
 */
export type ModuleSnap = {
  axis: Axis;
  side: 'min' | 'max';
  low_mm: number;
  /** How far the module moves to get there (mm). */
  moved_mm: number;
  ref: SnapRef | null;
  target: { kind: 'member' | 'module'; id: string };
  /** The target's face, for the snap cue: a flat box on the face. */
  cue: Box;
  label: string;
};

const faceWord: Readonly<Record<Axis, [string, string]>> = { x: ['left side', 'right side'], y: ['front', 'back'], z: ['underside', 'top'] };

function faceCue(b: Box, axis: Axis, side: 'min' | 'max'): Box {
  const k = AXIS_INDEX[axis];
  const v = side === 'min' ? b.min[k] : b.max[k];
  const cue: Box = { min: [...b.min] as Box['min'], max: [...b.max] as Box['max'] };
  cue.min[k] = v;
  cue.max[k] = v;
  return cue;
}

/**
 * Snaps for a module whose box (as it is being dragged, or as typed) is `box`: on each axis, the nearest face
 * within `tol_mm` of its base, top or sides among the members and the other modules it overlaps on the other two
 * axes — its base onto a rail's top, its top to a rail's underside, a side against an upright or a neighbour.
 * Pure: the caller draws `cue` and, on drop, applies the snaps with `seatModule`.
 */
export function snapModule(scene: Scene, moduleId: string, box: Box, tol_mm: number, axes: readonly Axis[] = AXES): ModuleSnap[] {
  const out: ModuleSnap[] = [];
  for (const axis of axes) {
    const k = AXIS_INDEX[axis];
    const others = [0, 1, 2].filter((i) => i !== k);
    let best: ModuleSnap | null = null;
    const consider = (target: Box, kind: 'member' | 'module', id: string, name: string) => {
      // Base and top need the target under or over the module; a side may line up with a face a little in
      // front or behind it (an upright at the corner of its opening), so near is enough across, height must overlap.
      if (axis === 'z' ? others.some((i) => overlapOn(box, target, i) <= OVER_MM) : overlapOn(box, target, 2) <= OVER_MM || others.some((i) => i !== 2 && overlapOn(box, target, i) < -tol_mm)) return;
      // The module's low face onto the target's high face, and its high face onto the target's low face.
      for (const side of ['min', 'max'] as const) {
        const face = side === 'min' ? target.max[k] : target.min[k];
        const mine = side === 'min' ? box.min[k] : box.max[k];
        const d = face - mine;
        if (Math.abs(d) > tol_mm) continue;
        const better = !best || Math.abs(d) < Math.abs(best.moved_mm) - 1e-9 || (Math.abs(Math.abs(d) - Math.abs(best.moved_mm)) <= 1e-9 && kind === 'member' && best.target.kind === 'module');
        if (!better) continue;
        const targetSide = side === 'min' ? 'max' : 'min';
        best = {
          axis,
          side,
          low_mm: box.min[k] + d,
          moved_mm: d,
          ref: kind === 'member' ? { member: id, face: targetSide, offset_mm: 0 } : null,
          target: { kind, id },
          cue: faceCue(target, axis, targetSide),
          label: `${faceWord[axis][targetSide === 'min' ? 0 : 1]} of ${name}`,
        };
      }
    };
    for (const m of scene.members) consider(m.box, 'member', m.id, m.mark ? `part ${m.mark}` : m.profileName);
    for (const m of scene.modules) if (m.id !== moduleId) consider(m.box, 'module', m.id, m.name);
    if (best) out.push(best);
  }
  return out;
}

/**
 * Put a module where the snaps (and, on other axes, `low` values) say, as one edit. A snap to a member face
 * attaches the module to it; a typed or module-snapped value is a plain position. The run's axis of a module in
 * a bay is the bay's to decide and is left alone.
 */
export function seatModule(doc: FrameDocument, moduleId: string, snaps: readonly ModuleSnap[], low: Partial<Record<Axis, number>> = {}): EditOutcome {
  const mod = doc.modules.find((m) => m.id === moduleId);
  if (!mod) return refuse('That module is no longer in the frame.');
  const inBay = placeOfModule(doc, moduleId);
  const place = { ...mod.place };
  let touched = false;
  for (const axis of AXES) {
    if (inBay && inBay.run.axis === axis) continue;
    const s = snaps.find((x) => x.axis === axis);
    let p: Position | undefined;
    if (s?.ref && 'member' in s.ref) {
      p = { member: s.ref.member, face: s.ref.face, offset_mm: 0, ...(s.side === 'max' ? { align: 'max' as const } : {}) };
    } else if (s) {
      p = { offset_mm: Math.round(s.low_mm * 1000) / 1000 };
    } else if (low[axis] !== undefined) {
      p = { offset_mm: Math.round((low[axis] as number) * 1000) / 1000 };
    }
    if (p) {
      place[axis] = p;
      touched = true;
    }
  }
  if (!touched) return { ok: true, doc, label: `Place ${moduleLabel(mod)}` };
  return { ok: true, doc: { ...doc, modules: doc.modules.map((m) => (m.id === moduleId ? { ...m, place } : m)) }, label: `Place ${moduleLabel(mod)}` };
}

/**
 * A position field of a module: put its low face on `axis` at `value_mm`, keeping what it is placed against (its
 * offset changes). Along its run a module in a bay is placed by the bay, which is said.
 */
export function setModulePosition(doc: FrameDocument, scene: Scene, moduleId: string, axis: Axis, value_mm: number): EditOutcome {
  const mod = doc.modules.find((m) => m.id === moduleId);
  const sm = scene.modules.find((m) => m.id === moduleId);
  if (!mod || !sm) return refuse('That module is no longer in the frame.');
  if (!Number.isFinite(value_mm) || Math.abs(value_mm) > 100_000) return refuse('A position must be a length within 100 m of the origin.');
  const inBay = placeOfModule(doc, moduleId);
  if (inBay && inBay.run.axis === axis) {
    return refuse(`${capital(moduleLabel(mod))} sits in a bay, which places it along the run: move or resize the bay, or take the module out of the run to place it freely.`);
  }
  const d = value_mm - sm.box.min[AXIS_INDEX[axis]];
  return { ok: true, doc: moveModules(doc, new Set([moduleId]), { x: 0, y: 0, z: 0, [axis]: d }), label: `Move ${moduleLabel(mod)}` };
}

/** How a module bears, as the editor offers it (sits on / hangs from / runs on side rails). */
export function setBearing(doc: FrameDocument, moduleId: string, bearing: Bearing): EditOutcome {
  const mod = doc.modules.find((m) => m.id === moduleId);
  if (!mod) return refuse('That module is no longer in the frame.');
  const words = { base: 'sits on the members under it', hung: 'hangs from the members over it', 'side-rails': 'runs on side rails' }[bearing];
  return { ok: true, doc: { ...doc, modules: doc.modules.map((m) => (m.id === moduleId ? { ...m, bearing } : m)) }, label: `${capital(moduleLabel(mod))} ${words}` };
}

export type BearingMember = {
  member_id: string;
  name: string | null;
  mark: string;
  face: FaceName;
  /** Highest load check against its limit; null when nothing is checked on it. */
  utilisation: number | null;
  deflection_mm: number | null;
};

/** The members a module bears on, from a report, with their loads (what the editor highlights and lists). */
export function bearingMembers(report: FrameReport, moduleId: string): BearingMember[] {
  const mod = report.modules.find((m) => m.id === moduleId);
  if (!mod) return [];
  return mod.bears_on.map((c) => {
    const m = report.members.find((x) => x.id === c.member_id);
    const check = report.loads.members.find((x) => x.member_id === c.member_id);
    const deflection = check && check.spans.length > 0 ? Math.max(...check.spans.map((s) => s.deflection_mm)) : null;
    return { member_id: c.member_id, name: m?.name ?? null, mark: m?.mark ?? '', face: c.face, utilisation: check?.utilisation ?? null, deflection_mm: deflection };
  });
}

/** The tolerance within which a module's base, top or side is taken to bear on a member face (mm). */
export const SEAT_TOLERANCE_MM = BEAR_TOLERANCE_MM;
