import { crossAxes, type Axis } from '../model/axis';
import { DEFAULT_SIDE_GAP_MM, moduleLabel, type Bearing } from '../model/module';
import { ai, overlapOn, type Box } from './box';
import { faceName, type FaceName } from './faces';
import { memberRef } from './names';
import type { ModuleGeometry } from './resolve-modules';
import type { MemberGeometry } from './resolve-members';
import type { ReportWarning } from './warnings';

/**
 * A module whose base (or top, when hung) is within this much of a member face bears on it (mm). Not a hair's
 * breadth: a builder places a module by typing a round figure, dragging on a 5 mm grid or snapping to a face that
 * later moves by a profile's tolerance, and a real unit stands on its feet or a rubber pad a few millimetres deep,
 * so a gap of 1 or 2 mm is a module resting there. Further off than 3 mm it is meant to stand clear (a shelf over
 * a tank), and the loads must not be put on a member that does not carry them. Common practice, no source.
 */
export const BEAR_TOLERANCE_MM = 3;
/** A member only bears a module it reaches under (or beside) by more than this (mm): touching edges do not bear. */
const OVERLAP_MM = 0.5;

/** One member a module bears on: the face it bears on and the stretch of the member under it. */
export type BearingContact = {
  member: number;
  face: FaceName;
  /** Along the member, from its start face (effective). */
  from_mm: number;
  to_mm: number;
};

export type ModuleBearing = { module: number; bearing: Bearing; contacts: BearingContact[] };

const horizontal = (a: Axis) => a !== 'z';

const NOTHING: Readonly<Record<Bearing, string>> = {
  base: 'sits on no member',
  hung: 'hangs from no member',
  'side-rails': 'runs on no side rails',
};
const FIX: Readonly<Record<Bearing, string>> = {
  base: 'snap its base onto the top of rails or bearers, or add bearers under it',
  hung: 'snap its top to the underside of rails, or add rails over it to hang it from',
  'side-rails': 'put it between two rails, one each side, or choose “sits on” if it stands on the rails below',
};

const memberLabel = (m: MemberGeometry): string => memberRef(m.member.id);

function contactOn(mod: Box, m: MemberGeometry, box: Box, face: FaceName): BearingContact {
  const a = ai(m.axis);
  const lo = Math.max(mod.min[a], box.min[a]) - box.min[a];
  const hi = Math.min(mod.max[a], box.max[a]) - box.min[a];
  const len = box.max[a] - box.min[a];
  // A module named as bearing on a member it does not overlap bears at the nearest point.
  const from = Math.min(Math.max(lo, 0), len);
  const to = Math.max(Math.min(hi, len), from);
  return { member: m.index, face, from_mm: from, to_mm: to };
}

function faceFor(bearing: Bearing, mod: Box, m: MemberGeometry, box: Box): FaceName {
  if (bearing === 'base') return 'top';
  if (bearing === 'hung') return 'bottom';
  const side = crossAxes(m.axis).find((c) => c !== 'z') as Axis;
  const k = ai(side);
  return faceName(side, (box.min[k] + box.max[k]) / 2 < (mod.min[k] + mod.max[k]) / 2 ? 'max' : 'min');
}

/**
 * The members each module bears on: the ones it names, or else those found from the geometry — horizontal
 * members whose top face is at the module's base (`base`), whose underside is at its top (`hung`), or the nearest
 * horizontal member on each side within the slide gap (`side-rails`, one pair along x or y).
 */
export function findBearings(
  modules: readonly ModuleGeometry[],
  members: readonly MemberGeometry[],
  effective: readonly Box[],
): { bearings: ModuleBearing[]; warnings: ReportWarning[] } {
  const warnings: ReportWarning[] = [];
  const byId = new Map(members.map((m) => [m.member.id, m]));
  const bearings = modules.map((g): ModuleBearing => {
    const mod = g.box;
    const { bearing } = g.module;
    if (g.module.bearsOn !== undefined) {
      const contacts = g.module.bearsOn.map((id) => {
        const m = byId.get(id) as MemberGeometry;
        return contactOn(mod, m, effective[m.index], faceFor(bearing, mod, m, effective[m.index]));
      });
      return { module: g.index, bearing, contacts };
    }
    const found: BearingContact[] = [];
    if (bearing === 'base' || bearing === 'hung') {
      for (const m of members) {
        if (!horizontal(m.axis)) continue;
        const box = effective[m.index];
        const level = bearing === 'base' ? box.max[2] - mod.min[2] : mod.max[2] - box.min[2];
        if (Math.abs(level) > BEAR_TOLERANCE_MM) continue;
        if (overlapOn(mod, box, 0) <= OVERLAP_MM || overlapOn(mod, box, 1) <= OVERLAP_MM) continue;
        found.push(contactOn(mod, m, box, bearing === 'base' ? 'top' : 'bottom'));
      }
    } else {
      const gap = g.module.sideGap_mm ?? DEFAULT_SIDE_GAP_MM;
      // Per side axis, the nearest member on the low side and on the high side.
      const pairs = (['x', 'y'] as const).map((side) => {
        const k = ai(side);
        let low: { m: MemberGeometry; gap: number } | null = null;
        let high: { m: MemberGeometry; gap: number } | null = null;
        for (const m of members) {
          if (!horizontal(m.axis) || m.axis === side) continue;
          const box = effective[m.index];
          if (overlapOn(mod, box, 2) <= OVERLAP_MM || overlapOn(mod, box, ai(m.axis)) <= OVERLAP_MM) continue;
          const below = mod.min[k] - box.max[k];
          const above = box.min[k] - mod.max[k];
          if (below >= -BEAR_TOLERANCE_MM && below <= gap && (!low || below < low.gap - 1e-9)) low = { m, gap: below };
          if (above >= -BEAR_TOLERANCE_MM && above <= gap && (!high || above < high.gap - 1e-9)) high = { m, gap: above };
        }
        return [low, high].filter((c): c is { m: MemberGeometry; gap: number } => c !== null).map((c) => c.m);
      });
      const chosen = pairs[0].length === 2 ? pairs[0] : pairs[1].length === 2 ? pairs[1] : pairs[0].length > 0 ? pairs[0] : pairs[1];
      for (const m of chosen) found.push(contactOn(mod, m, effective[m.index], faceFor(bearing, mod, m, effective[m.index])));
      if (chosen.length === 1) {
        warnings.push({
          code: 'module-unsupported',
          module_id: g.module.id,
          message: `${moduleLabel(g.module)} has a side rail on one side only (${memberLabel(chosen[0])}): add a rail on the other side, or move it so both sides are within ${gap} mm of a rail`,
        });
      }
    }
    if (found.length === 0) {
      warnings.push({
        code: 'module-unsupported',
        module_id: g.module.id,
        message: `${moduleLabel(g.module)} ${NOTHING[bearing]}, so its weight is not checked: ${FIX[bearing]}`,
      });
    }
    found.sort((p, q) => p.member - q.member);
    return { module: g.index, bearing, contacts: found };
  });
  return { bearings, warnings };
}
