import { describe, expect, it } from 'vitest';
import { ALLOYS } from '@shared/catalog/alloys';
import { FASTENER_THREADS, tapDrill } from '@shared/catalog/fasteners';
import { PROFILE_DISCLAIMER, listProfiles, resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { bounds, sectionProblem } from '@shared/geometry/polygon';
import { errorOf } from '../../support/input-error';

const fieldOf = (fn: () => unknown): string => errorOf(fn).field;

describe('catalogue of generic slotted profiles', () => {
  const profiles = listProfiles();

  it('lists the metric and inch series with stable ids', () => {
    expect(profiles.map((p) => p.id)).toEqual(['20x20-s6', '30x30-s8', '40x40-s8', '40x80-s8', '45x45-s10', '1x1', '1x2', '1.5x1.5', '1.5x3']);
    expect(resolveProfile('40x40-s8').name).toBe('40×40 slot 8');
    expect(resolveProfile('1.5x3').name).toBe('1.5×3 in');
    expect(PROFILE_DISCLAIMER).toMatch(/generic/);
  });

  it.each(profiles.map((p) => [p.id, p] as const))('%s has a valid outline: simple rings, holes inside and apart', (_id, p) => {
    expect(sectionProblem(p.outline.outer, p.outline.holes)).toBeNull();
    const b = bounds(p.outline.outer);
    expect([b.minX, b.minY]).toEqual([0, 0]);
    expect(b.maxX).toBeCloseTo(p.width_mm, 9);
    expect(b.maxY).toBeCloseTo(p.height_mm, 9);
  });

  it.each(profiles.map((p) => [p.id, p] as const))('%s: area below the outer rectangle, mass = area × density', (_id, p) => {
    const s = sectionOf(p);
    expect(s.area_mm2).toBeGreaterThan(0);
    expect(s.area_mm2).toBeLessThan(p.width_mm * p.height_mm);
    // mm² × 10⁻⁶ m²/mm² × kg/m³ = kg/m
    expect(s.mass_kg_per_m).toBeCloseTo(s.area_mm2 * 1e-6 * ALLOYS[p.alloy].density_kg_m3, 12);
    // Sanity bound of our own (no source): a slotted section is neither nearly solid nor nearly empty.
    const fill = s.area_mm2 / (p.width_mm * p.height_mm);
    expect(fill).toBeGreaterThan(0.25);
    expect(fill).toBeLessThan(0.6);
  });

  it.each(profiles.map((p) => [p.id, p] as const))('%s: doubly symmetric, so centroid at the middle and Ixy = 0', (_id, p) => {
    const s = sectionOf(p);
    expect(s.cx_mm).toBeCloseTo(p.width_mm / 2, 9);
    expect(s.cy_mm).toBeCloseTo(p.height_mm / 2, 9);
    expect(Math.abs(s.Ixy_mm4)).toBeLessThan(1e-6 * s.Ix_mm4);
    if (p.width_mm === p.height_mm) expect(s.Iy_mm4).toBeCloseTo(s.Ix_mm4, 3);
    // W = I / c with c half the depth for a symmetric section [H].
    expect(s.Wx_mm3).toBeCloseTo(s.Ix_mm4 / (p.height_mm / 2), 6);
    expect(s.Wy_mm3).toBeCloseTo(s.Iy_mm4 / (p.width_mm / 2), 6);
  });

  it('puts one slot per cell on each face: a double profile has two slots on each long face', () => {
    // Each slot adds 10 outline points to the 4 corners (our construction).
    expect(resolveProfile('40x40-s8').outline.outer).toHaveLength(4 + 10 * 4);
    expect(resolveProfile('40x80-s8').outline.outer).toHaveLength(4 + 10 * 6);
    expect(resolveProfile('1.5x3').outline.outer).toHaveLength(4 + 10 * 6);
  });

  it('a double profile is stiffer about x (height 2u) than about y, and stiffer than the single one', () => {
    const single = sectionOf(resolveProfile('40x40-s8'));
    const double = sectionOf(resolveProfile('40x80-s8'));
    expect(double.Ix_mm4).toBeGreaterThan(3 * double.Iy_mm4);
    // Two single sections side by side would give 2·(I + A·20²) about the shared axis (parallel axis [H]); the
    // double section has extra web at the joint and fewer slots, so it is at least in that region.
    const twoSingles = 2 * (single.Ix_mm4 + single.area_mm2 * 20 ** 2);
    expect(double.Ix_mm4 / twoSingles).toBeGreaterThan(0.8);
    expect(double.Ix_mm4 / twoSingles).toBeLessThan(1.5);
  });

  it('end bores are the tap drill for the fastener [H]', () => {
    // REFERENCES.md: M5 4.2, M6 5.0, M8 6.8 mm; 1/4-20 UNC: #7 drill (5.11 mm).
    expect(tapDrill('M5')).toBe(4.2);
    expect(tapDrill('M6')).toBe(5);
    expect(tapDrill('M8')).toBe(6.8);
    expect(tapDrill('1/4-20')).toBe(5.11);
    // The rule behind them, major diameter minus pitch, to within a stock drill size.
    for (const [f, t] of Object.entries(FASTENER_THREADS)) {
      expect(Math.abs(t.tapDrill_mm - (t.major_mm - t.pitch_mm)), f).toBeLessThan(0.1);
    }
    expect(resolveProfile('40x40-s8').bore_mm).toBe(6.8);
    expect(resolveProfile('1x1').bore_mm).toBe(5.11);
  });
});

describe('plain sections from their dimensions', () => {
  it('rect:WxH is a solid bar: I = bh³/12, W = bh²/6 [H]', () => {
    const p = resolveProfile('rect:40x10');
    const s = sectionOf(p);
    expect(s.area_mm2).toBeCloseTo(400, 9);
    expect(s.Ix_mm4).toBeCloseTo((40 * 10 ** 3) / 12, 6);
    expect(s.Iy_mm4).toBeCloseTo((10 * 40 ** 3) / 12, 6);
    expect(s.Wx_mm3).toBeCloseTo((40 * 10 ** 2) / 6, 6);
    expect(s.Wy_mm3).toBeCloseTo((10 * 40 ** 2) / 6, 6);
  });

  it('tube:WxHxT is a hollow rectangle: I = (BH³ − bh³)/12 [H]', () => {
    const s = sectionOf(resolveProfile('tube:40x20x2'));
    expect(s.area_mm2).toBeCloseTo(40 * 20 - 36 * 16, 9);
    expect(s.Ix_mm4).toBeCloseTo((40 * 20 ** 3 - 36 * 16 ** 3) / 12, 6);
    expect(s.Iy_mm4).toBeCloseTo((20 * 40 ** 3 - 16 * 36 ** 3) / 12, 6);
    expect(s.Wx_mm3).toBeCloseTo(s.Ix_mm4 / 10, 6);
  });

  it('angle:AxBxT matches two rectangles joined by the parallel-axis theorem [H]', () => {
    const [A, B, T] = [40, 30, 4];
    const r1 = { a: A * T, y: T / 2, i: (A * T ** 3) / 12 };
    const r2 = { a: T * (B - T), y: T + (B - T) / 2, i: (T * (B - T) ** 3) / 12 };
    const area = r1.a + r2.a;
    const cy = (r1.a * r1.y + r2.a * r2.y) / area;
    const Ix = r1.i + r1.a * (r1.y - cy) ** 2 + r2.i + r2.a * (r2.y - cy) ** 2;
    const s = sectionOf(resolveProfile('angle:40x30x4'));
    expect(s.area_mm2).toBeCloseTo(area, 9);
    expect(s.cy_mm).toBeCloseTo(cy, 9);
    expect(s.Ix_mm4).toBeCloseTo(Ix, 6);
    // The extreme fibre is the tip of the vertical leg, B − cy from the axis.
    expect(s.Wx_mm3).toBeCloseTo(Ix / (B - cy), 6);
  });

  it('normalises the id and accepts decimals and ×', () => {
    expect(resolveProfile('TUBE:40×20×2.0').id).toBe('tube:40x20x2');
    expect(resolveProfile('rect:25.4x6.35').width_mm).toBe(25.4);
  });

  it.each([['nope'], [''], ['tube:40x20'], ['rect:40x20x2'], ['tube:40x20x10'], ['angle:40x40x40'], ['rect:0x10'], ['rect:5000x10'], ['tube:axbxc']])(
    'rejects %j as a profile with field "profile"',
    (id) => {
      expect(fieldOf(() => resolveProfile(id))).toBe('profile');
    },
  );
});

describe('sectionOf overrides', () => {
  const p = resolveProfile('40x40-s8');
  const base = sectionOf(p);

  it('lets supplier figures replace ours, and derived figures follow', () => {
    const s = sectionOf(p, { Ix_mm4: 70_000, area_mm2: 500 });
    expect(s.Ix_mm4).toBe(70_000);
    expect(s.Wx_mm3).toBeCloseTo(70_000 / 20, 9);
    expect(s.mass_kg_per_m).toBeCloseTo(500 * 1e-6 * 2700, 12);
    expect(s.Iy_mm4).toBe(base.Iy_mm4);
  });

  it('an explicit W or mass wins over the derived one', () => {
    const s = sectionOf(p, { Ix_mm4: 70_000, Wx_mm3: 3_400, mass_kg_per_m: 1.4 });
    expect(s.Wx_mm3).toBe(3_400);
    expect(s.mass_kg_per_m).toBe(1.4);
  });

  it('a different alloy brings its modulus and design-minimum proof stress', () => {
    const s = sectionOf(p, { alloy: '6061-T6' });
    expect(s.alloy).toBe('6061-T6');
    expect(s.yield_MPa).toBe(ALLOYS['6061-T6'].yield_MPa);
    expect(sectionOf(p, { alloy: '6061-T6', E_MPa: 70_000 }).E_MPa).toBe(70_000);
  });

  it('rejects nonsense overrides naming the figure', () => {
    expect(fieldOf(() => sectionOf(p, { Ix_mm4: -1 }))).toBe('Ix_mm4');
    expect(fieldOf(() => sectionOf(p, { E_MPa: Number.NaN }))).toBe('E_MPa');
    expect(fieldOf(() => sectionOf(p, { alloy: 'steel' as never }))).toBe('alloy');
  });
});
