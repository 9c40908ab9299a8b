import { describe, expect, it } from 'vitest';
import { resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { checkColumn, eulerLoad, reductionFactor } from '@shared/engine/column';
import { computeReport } from '@shared/engine/report';
import { parseFrameDocument } from '@shared/model/parse';
import { member, module } from './frames';

// Euler critical load N_cr = π²EI/(KL)² (any strength of materials text); effective length factors from the AISC
// Specification Commentary Table C-A-7.1 (recalled from memory, REFERENCES.md [M]): pinned–pinned 1, fixed–free 2.
// EN 1999-1-1 §6.3.1 flexural buckling (recalled [M], REFERENCES.md): χ = 1/(φ + √(φ² − λ̄²)),
// φ = 0.5·(1 + α(λ̄ − λ̄₀) + λ̄²), class A α 0.20 λ̄₀ 0.10, class B α 0.32 λ̄₀ 0; N_b,Rd = χ·A·f_o/1.10.
const g = 9.80665;
const s20 = sectionOf(resolveProfile('20x20-s6'));

describe('Euler and the EN 1999-1-1 column curve', () => {
  it('Euler with K: π²EI/(KL)², a quarter of it when the length doubles in effect', () => {
    const I = Math.min(s20.Ix_mm4, s20.Iy_mm4);
    const k1 = eulerLoad(s20.E_MPa, I, 1, 2000);
    expect(k1).toBeCloseTo((Math.PI ** 2 * s20.E_MPa * I) / 2000 ** 2, 9);
    expect(eulerLoad(s20.E_MPa, I, 2, 2000)).toBeCloseTo(k1 / 4, 9);
    expect(eulerLoad(s20.E_MPa, I, 0.7, 2000)).toBeCloseTo(k1 / 0.49, 9);
  });

  it('χ recomputed from the formula of §6.3.1.2 for both classes, 1 up to λ̄₀', () => {
    const chi = (l: number, a: number, l0: number) => {
      const phi = 0.5 * (1 + a * (l - l0) + l * l);
      return Math.min(1, 1 / (phi + Math.sqrt(phi * phi - l * l)));
    };
    for (const l of [0.05, 0.1, 0.3, 0.6, 1, 1.5, 2.5, 4]) {
      expect(reductionFactor(l, 'A')).toBeCloseTo(chi(l, 0.2, 0.1), 12);
      expect(reductionFactor(l, 'B')).toBeCloseTo(chi(l, 0.32, 0), 12);
    }
    expect(reductionFactor(0.1, 'A')).toBe(1);
    // At λ̄ = 1, class A: φ = 0.5·(1 + 0.2·0.9 + 1) = 1.09, χ = 1/(1.09 + √(1.09² − 1)) = 0.6563 (hand arithmetic).
    expect(reductionFactor(1, 'A')).toBeCloseTo(0.6563, 4);
    // Class B is never above class A (the lower curve).
    for (const l of [0.2, 0.5, 1, 2]) expect(reductionFactor(l, 'B')).toBeLessThanOrEqual(reductionFactor(l, 'A'));
  });

  it('capacity χ·A·f_o/γ_M1 never exceeds the Euler load', () => {
    for (const L of [200, 500, 1000, 2000, 4000]) {
      const r = checkColumn({ length_mm: L, K: 1, E_MPa: s20.E_MPa, I_mm4: s20.Ix_mm4, area_mm2: s20.area_mm2, fo_MPa: s20.yield_MPa, bucklingClass: 'B', load_N: 100 });
      expect(r.capacity_N).toBeLessThanOrEqual(r.euler_N);
      expect(r.capacity_N).toBeCloseTo((r.chi * s20.area_mm2 * s20.yield_MPa) / 1.1, 9);
      expect(r.slenderness).toBeCloseTo(L / Math.sqrt(s20.Ix_mm4 / s20.area_mm2), 9);
      expect(r.utilisation).toBeCloseTo(100 / r.capacity_N, 12);
    }
  });
});

/**
 * Four 2 m legs of 20×20 at the corners of a 500 mm square, rails between them at the top, 70 kg on top, set on
 * the front and back rails (two supports: the lever rule, determinate). On all four it would be indeterminate and
 * each rail is given the most it could take (see the statics tests).
 */
function table(extra: Parameters<typeof member>[] = [], settings: Record<string, unknown> = {}, bearsOn: string[] | null = ['F', 'B']) {
  const p = { profile: '20x20-s6' };
  return parseFrameDocument({
    schemaVersion: 1,
    settings: { shockFactor: 2.5, inVehicle: false, ...settings },
    members: [
      member('L1', 'z', 0, 2000, { x: 0, y: 0 }, p),
      member('L2', 'z', 0, 2000, { x: 480, y: 0 }, p),
      member('L3', 'z', 0, 2000, { x: 0, y: 480 }, p),
      member('L4', 'z', 0, 2000, { x: 480, y: 480 }, p),
      member('F', 'x', 20, 480, { y: 0, z: 1980 }, p),
      member('B', 'x', 20, 480, { y: 480, z: 1980 }, p),
      member('Lt', 'y', 20, 480, { x: 0, z: 1980 }, p),
      member('Rt', 'y', 20, 480, { x: 480, z: 1980 }, p),
      ...extra.map((a) => member(...a)),
    ],
    modules: [module('load', [500, 500, 200], 70, [0, 0, 2000], bearsOn ? { bearsOn } : {})],
  });
}

describe('uprights as columns in the report (the worked legs of the load review)', () => {
  it('2 m legs of 20×20, 70 kg × 2.5: 429 N each (plus their share of the frame) against Euler 320 N at K = 2', () => {
    const r = computeReport(table());
    expect(r.loads.column_K.value).toBe(2);
    expect(r.loads.column_K.reason).toMatch(/sway/);
    expect(r.loads.columns).toHaveLength(4);
    // Half of each of its two 460 mm rails, and its own 2 m, all × 2.5 (self-weight, AISC Manual Table 3-23).
    const frameShare = 2.5 * g * s20.mass_kg_per_m * (0.46 + 2.0);
    for (const c of r.loads.columns) {
      expect(c.axial_N).toBeCloseTo((70 * g * 2.5) / 4 + frameShare, 1);
      expect(Math.round((70 * g * 2.5) / 4)).toBe(429);
      expect(c.euler_N).toBeCloseTo((Math.PI ** 2 * Math.min(s20.Ix_mm4, s20.Iy_mm4) * s20.E_MPa) / (2 * 2000) ** 2, 2);
      expect(Math.round(c.euler_N / 10) * 10).toBe(320);
      expect(c.utilisation).toBeGreaterThan(1);
      expect(c.source).toMatch(/EN 1999-1-1 §6\.3\.1/);
    }
    expect(r.loads.governing_check).toBe('column');
    expect(r.warnings.filter((w) => w.code === 'column-over-utilised')).toHaveLength(4);
  });

  it('on all four top rails (indeterminate) each leg is given at least the determinate quarter', () => {
    const four = computeReport(table([], {}, null));
    const two = computeReport(table());
    expect(four.modules[0].bears_on).toHaveLength(4);
    four.loads.columns.forEach((c, k) => expect(c.axial_N).toBeGreaterThanOrEqual(two.loads.columns[k].axial_N - 1e-6));
  });

  it('braced (K = 1): Euler 1280 N; the user may set K', () => {
    const braced = computeReport(table([['X', 'x', 20, 480, { y: 0, z: 1000 }, { profile: '20x20-s6', role: 'brace' }]]));
    expect(braced.loads.column_K.value).toBe(1);
    for (const c of braced.loads.columns) expect(Math.round(c.euler_N / 10) * 10).toBe(1280);
    const set = computeReport(table([], { columnK: 0.7 }));
    expect(set.loads.column_K).toEqual({ value: 0.7, reason: 'set by the user' });
    expect(set.loads.columns[0].K).toBe(0.7);
  });
});
