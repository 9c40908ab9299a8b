import { crossAxes, type Axis } from '../model/axis';
import { DEFAULT_SIDE_GAP_MM, type Bearing } from '../model/module';
import { ai, overlapOn, type Box } from './box';
import { faceName, type FaceName } from './faces';
import type { ModuleGeometry } from './resolve-modules';
import type { MemberGeometry } from './resolve-members';
import type { ReportWarning } from './warnings';

/** A module resting on (or hanging from) a member face within this much is bearing on it (mm). */
const BEAR_MM = 0.5;

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
        if (Math.abs(level) > BEAR_MM) continue;
        if (overlapOn(mod, box, 0) <= BEAR_MM || overlapOn(mod, box, 1) <= BEAR_MM) continue;
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
          if (overlapOn(mod, box, 2) <= BEAR_MM || overlapOn(mod, box, ai(m.axis)) <= BEAR_MM) continue;
          const below = mod.min[k] - box.max[k];
          const above = box.min[k] - mod.max[k];
          if (below >= -BEAR_MM && below <= gap && (!low || below < low.gap - 1e-9)) low = { m, gap: below };
          if (above >= -BEAR_MM && above <= gap && (!high || above < high.gap - 1e-9)) high = { m, gap: above };
        }
        return [low, high].filter((c): c is { m: MemberGeometry; gap: number } => c !== null).map((c) => c.m);
      });
      const chosen = pairs[0].length === 2 ? pairs[0] : pairs[1].length === 2 ? pairs[1] : pairs[0].length > 0 ? pairs[0] : pairs[1];
      for (const m of chosen) found.push(contactOn(mod, m, effective[m.index], faceFor(bearing, mod, m, effective[m.index])));
      if (chosen.length === 1) {
        warnings.push({
          code: 'module-unsupported',
          module_id: g.module.id,
          message: `${g.module.id}: side rails found on one side only (${chosen[0].member.id}); check the other side is within ${gap} mm`,
        });
      }
    }
    if (found.length === 0) {
      warnings.push({
        code: 'module-unsupported',
        module_id: g.module.id,
        message: `${g.module.id}: bears on no member (${bearing}); its weight is not checked — place it on members or name them in bearsOn`,
      });
    }
    found.sort((p, q) => p.member - q.member);
    return { module: g.index, bearing, contacts: found };
  });
  return { bearings, warnings };
}
