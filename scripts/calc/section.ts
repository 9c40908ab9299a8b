import { resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { principalAxes } from '@shared/geometry/polygon';

export type SectionOutput = {
  profile: string;
  area_mm2: number;
  Ix_mm4: number;
  Iy_mm4: number;
  Wx_mm3: number;
  Wy_mm3: number;
  mass_kg_per_m: number;
  E_MPa: number;
  alloy: string;
  /** Product of inertia ∫xy dA about the centroid (zero for a section symmetric about x or y). */
  Ixy_mm4: number;
  /** Principal second moments, I1 ≥ I2, and the angle from the x axis to the major axis (degrees). */
  I1_mm4: number;
  I2_mm4: number;
  angle_deg: number;
};

const USAGE = 'usage: calc section <profile>  (a catalogue id from `calc profiles`, or rect:WxH, tube:WxHxT, angle:AxBxT in mm)';

/** `calc section <profile>`: section properties of a catalogue profile or plain section. */
export async function run(args: string[]): Promise<SectionOutput> {
  if (args.length !== 1) throw new Error(`profile: give exactly one profile. ${USAGE}`);
  const profile = resolveProfile(args[0]);
  const s = sectionOf(profile);
  const p = principalAxes(s.Ix_mm4, s.Iy_mm4, s.Ixy_mm4);
  return {
    profile: profile.id,
    area_mm2: s.area_mm2,
    Ix_mm4: s.Ix_mm4,
    Iy_mm4: s.Iy_mm4,
    Wx_mm3: s.Wx_mm3,
    Wy_mm3: s.Wy_mm3,
    mass_kg_per_m: s.mass_kg_per_m,
    E_MPa: s.E_MPa,
    alloy: s.alloy,
    Ixy_mm4: s.Ixy_mm4,
    I1_mm4: p.I1,
    I2_mm4: p.I2,
    angle_deg: (p.theta * 180) / Math.PI,
  };
}
