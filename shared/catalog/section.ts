import { InputError } from '../errors';
import { bounds, polygonSection, type PolygonSection } from '../geometry/polygon';
import { ALLOYS, isAlloyId, type AlloyId } from './alloys';
import type { Outline } from './outlines';
import type { Profile } from './profile-types';

/**
 * Section properties of a profile. Axes: x along the profile's width, y along its height, both through the
 * centroid. `Ix_mm4` is about the horizontal (x) axis, so it governs a member bending under a load in the height
 * direction; `Wx_mm3 = Ix / (largest distance from that axis to an extreme fibre)`. `cx_mm`, `cy_mm` locate the
 * centroid from the lower-left corner of the bounding box.
 */
export type SectionProps = {
  area_mm2: number;
  Ix_mm4: number;
  Iy_mm4: number;
  /** Product of inertia; zero for sections symmetric about either axis. */
  Ixy_mm4: number;
  Wx_mm3: number;
  Wy_mm3: number;
  cx_mm: number;
  cy_mm: number;
  mass_kg_per_m: number;
  alloy: AlloyId;
  E_MPa: number;
  /** Design-minimum 0.2 % proof stress of the alloy (see ALLOYS). */
  yield_MPa: number;
};

const geometryCache = new WeakMap<Outline, { s: PolygonSection; cX: number; cY: number }>();

function geometry(outline: Outline) {
  let g = geometryCache.get(outline);
  if (!g) {
    const s = polygonSection(outline.outer, outline.holes);
    const b = bounds(outline.outer);
    g = { s, cX: Math.max(s.cx - b.minX, b.maxX - s.cx), cY: Math.max(s.cy - b.minY, b.maxY - s.cy) };
    geometryCache.set(outline, g);
  }
  return g;
}

const NUMERIC_KEYS = ['area_mm2', 'Ix_mm4', 'Iy_mm4', 'Wx_mm3', 'Wy_mm3', 'mass_kg_per_m', 'E_MPa', 'yield_MPa'] as const;

/**
 * Section properties computed from the profile's outline, with the user's figures (e.g. from their supplier)
 * taking precedence. Figures that follow from an overridden one follow it: a new alloy brings its E, proof stress
 * and density; a new area brings its mass per metre; a new I brings its W, unless those are overridden too.
 */
export function sectionOf(profile: Profile, overrides: Partial<SectionProps> = {}): SectionProps {
  for (const k of NUMERIC_KEYS) {
    const v = overrides[k];
    if (v !== undefined && !(typeof v === 'number' && Number.isFinite(v) && v > 0)) {
      throw new InputError(k, `${k}: must be a positive number`);
    }
  }
  if (overrides.alloy !== undefined && !isAlloyId(overrides.alloy)) {
    throw new InputError('alloy', `alloy: "${String(overrides.alloy)}" is not one of ${Object.keys(ALLOYS).join(', ')}`);
  }
  const { s, cX, cY } = geometry(profile.outline);
  const alloy = ALLOYS[overrides.alloy ?? profile.alloy];
  const area = overrides.area_mm2 ?? s.area;
  const Ix = overrides.Ix_mm4 ?? s.Ix;
  const Iy = overrides.Iy_mm4 ?? s.Iy;
  return {
    area_mm2: area,
    Ix_mm4: Ix,
    Iy_mm4: Iy,
    Ixy_mm4: overrides.Ixy_mm4 ?? s.Ixy,
    Wx_mm3: overrides.Wx_mm3 ?? Ix / cY,
    Wy_mm3: overrides.Wy_mm3 ?? Iy / cX,
    cx_mm: overrides.cx_mm ?? s.cx,
    cy_mm: overrides.cy_mm ?? s.cy,
    // mm² × 1e-6 m²/mm² × kg/m³ = kg/m
    mass_kg_per_m: overrides.mass_kg_per_m ?? area * 1e-6 * alloy.density_kg_m3,
    alloy: alloy.id,
    E_MPa: overrides.E_MPa ?? alloy.E_MPa,
    yield_MPa: overrides.yield_MPa ?? alloy.yield_MPa,
  };
}
