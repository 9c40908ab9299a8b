import type { Vec3 } from '../model/axis';
import { boxCentre, type Box } from './box';
import type { MemberLength } from './lengths';
import type { ModuleGeometry } from './resolve-modules';
import type { MemberGeometry } from './resolve-members';

export type MassResult = {
  member_kg: number[];
  frame_kg: number;
  hardware_kg: number;
  modules_kg: number;
  total_kg: number;
  /** Centre of gravity of everything; null for an empty frame. */
  cog: Vec3 | null;
  frame_cog: Vec3 | null;
};

/**
 * Masses and the centre of gravity: each member its finished length × mass per metre at its box centre, each
 * module at its box centre, the hardware where it is fitted (moments from the hardware step).
 */
export function massAndCentre(
  members: readonly MemberGeometry[],
  lengths: readonly MemberLength[],
  effective: readonly Box[],
  modules: readonly ModuleGeometry[],
  hardware: { mass_kg: number; moment: Vec3 },
): MassResult {
  const frame = { m: 0, x: 0, y: 0, z: 0 };
  const member_kg = members.map((m, i) => {
    const kg = (lengths[i].length_mm / 1000) * m.info.section.mass_kg_per_m;
    const c = boxCentre(effective[i]);
    frame.m += kg;
    frame.x += kg * c.x;
    frame.y += kg * c.y;
    frame.z += kg * c.z;
    return kg;
  });
  const mods = { m: 0, x: 0, y: 0, z: 0 };
  for (const g of modules) {
    const c = boxCentre(g.box);
    mods.m += g.mass_kg;
    mods.x += g.mass_kg * c.x;
    mods.y += g.mass_kg * c.y;
    mods.z += g.mass_kg * c.z;
  }
  const total = frame.m + mods.m + hardware.mass_kg;
  const centre = (m: number, x: number, y: number, z: number): Vec3 | null => (m > 0 ? { x: x / m, y: y / m, z: z / m } : null);
  return {
    member_kg,
    frame_kg: frame.m,
    hardware_kg: hardware.mass_kg,
    modules_kg: mods.m,
    total_kg: total,
    cog: centre(total, frame.x + mods.x + hardware.moment.x, frame.y + mods.y + hardware.moment.y, frame.z + mods.z + hardware.moment.z),
    frame_cog: centre(frame.m, frame.x, frame.y, frame.z),
  };
}
