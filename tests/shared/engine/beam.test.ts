import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { beam, beamDeflectionAt, beamMomentAt, beamStress, type BeamInput, type BeamLoad, type BeamSupport } from '@shared/engine/beam';
import { InputError } from '@shared/errors';

// Closed forms: AISC Steel Construction Manual Table 3-23 "Shears, Moments and Deflections"; American Wood Council
// Design Aid No. 6 (Fig. 1 simple beam UDL, Fig. 8 simple beam load at any point, Fig. 14 cantilever load at any
// point); Roark's Formulas for Stress and Strain, Table 8.1. Collected in REFERENCES.md [H].

const L = 2000;
const E = 68_900;
const I = 1.2e5;
const EI = E * I;
const P = 500;
const w = 0.4;

const run = (support: BeamSupport, loads: BeamLoad[]) => beam({ span_mm: L, E_MPa: E, I_mm4: I, support, loads });
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('simply supported (AWC DA6 Fig. 1 and Fig. 8; AISC 3-23)', () => {
  it('centre load: δ = PL³/48EI at mid-span, M = PL/4, R = P/2', () => {
    const r = run('simple', [{ kind: 'point', P_N: P, a_mm: L / 2 }]);
    expect(rel(r.deflection_mm, (P * L ** 3) / (48 * EI))).toBeLessThan(1e-9);
    expect(r.x_max_mm).toBeCloseTo(L / 2, 3);
    expect(rel(r.max_moment_Nmm, (P * L) / 4)).toBeLessThan(1e-12);
    expect(r.reactions_N[0]).toBeCloseTo(P / 2, 9);
    expect(r.reactions_N[1]).toBeCloseTo(P / 2, 9);
  });

  it('UDL: δ = 5wL⁴/384EI at mid-span, M = wL²/8', () => {
    const r = run('simple', [{ kind: 'udl', w_N_per_mm: w }]);
    expect(rel(r.deflection_mm, (5 * w * L ** 4) / (384 * EI))).toBeLessThan(1e-9);
    expect(r.x_max_mm).toBeCloseTo(L / 2, 3);
    expect(rel(r.max_moment_Nmm, (w * L ** 2) / 8)).toBeLessThan(1e-9);
    expect(r.reactions_N[0]).toBeCloseTo((w * L) / 2, 9);
  });

  it('load at a (a > b): δmax = Pb(L² − b²)^1.5/(9√3·EIL) at x = √((L² − b²)/3), M = Pab/L under the load', () => {
    const a = 1400;
    const b = L - a;
    const input: BeamInput = { span_mm: L, E_MPa: E, I_mm4: I, support: 'simple', loads: [{ kind: 'point', P_N: P, a_mm: a }] };
    const r = beam(input);
    expect(rel(r.deflection_mm, (P * b * (L * L - b * b) ** 1.5) / (9 * Math.sqrt(3) * EI * L))).toBeLessThan(1e-9);
    expect(Math.abs(r.x_max_mm - Math.sqrt((L * L - b * b) / 3))).toBeLessThan(0.05);
    expect(rel(r.max_moment_Nmm, (P * a * b) / L)).toBeLessThan(1e-12);
    expect(r.x_moment_mm).toBeCloseTo(a, 6);
    // Under the load: Pa²b²/(3EIL).
    expect(rel(beamDeflectionAt(input, a), (P * a * a * b * b) / (3 * EI * L))).toBeLessThan(1e-12);
    // Reactions Pb/L and Pa/L.
    expect(r.reactions_N[0]).toBeCloseTo((P * b) / L, 9);
    expect(r.reactions_N[1]).toBeCloseTo((P * a) / L, 9);
  });

  it('the same load nearer the left support (a < b) mirrors it', () => {
    const left = run('simple', [{ kind: 'point', P_N: P, a_mm: 600 }]);
    const right = run('simple', [{ kind: 'point', P_N: P, a_mm: 1400 }]);
    expect(rel(left.deflection_mm, right.deflection_mm)).toBeLessThan(1e-9);
    expect(Math.abs(left.x_max_mm - (L - right.x_max_mm))).toBeLessThan(0.05);
  });

  it('self-check from REFERENCES.md: a = b = L/2 in the any-position formula gives PL³/48EI', () => {
    const b = L / 2;
    const anyPosition = (P * b * (L * L - b * b) ** 1.5) / (9 * Math.sqrt(3) * EI * L);
    expect(rel(anyPosition, (P * L ** 3) / (48 * EI))).toBeLessThan(1e-12);
    expect(rel(run('simple', [{ kind: 'point', P_N: P, a_mm: b }]).deflection_mm, anyPosition)).toBeLessThan(1e-9);
  });

  it('partial UDL: reactions and Mmax = R1(a + R1/2w) (AISC 3-23 case 4, recalled [M])', () => {
    // Load w from x = a to a + b, c beyond it: R1 = wb(2c + b)/2L, Mmax at x = a + R1/w.
    const [a, b] = [300, 900];
    const c = L - a - b;
    const R1 = (w * b * (2 * c + b)) / (2 * L);
    const r = run('simple', [{ kind: 'udl', w_N_per_mm: w, from_mm: a, to_mm: a + b }]);
    expect(r.reactions_N[0]).toBeCloseTo(R1, 9);
    expect(r.reactions_N[1]).toBeCloseTo(w * b - R1, 9);
    expect(rel(r.max_moment_Nmm, R1 * (a + R1 / (2 * w)))).toBeLessThan(1e-9);
    expect(Math.abs(r.x_moment_mm - (a + R1 / w))).toBeLessThan(0.05);
  });
});

describe('fixed at both ends (AISC 3-23; Roark Table 8.1)', () => {
  it('centre load: δ = PL³/192EI, M = PL/8', () => {
    const r = run('fixed', [{ kind: 'point', P_N: P, a_mm: L / 2 }]);
    expect(rel(r.deflection_mm, (P * L ** 3) / (192 * EI))).toBeLessThan(1e-9);
    expect(rel(r.max_moment_Nmm, (P * L) / 8)).toBeLessThan(1e-9);
  });

  it('UDL: δ = wL⁴/384EI, M = wL²/12 at the ends', () => {
    const r = run('fixed', [{ kind: 'udl', w_N_per_mm: w }]);
    expect(rel(r.deflection_mm, (w * L ** 4) / (384 * EI))).toBeLessThan(1e-9);
    expect(rel(r.max_moment_Nmm, (w * L ** 2) / 12)).toBeLessThan(1e-9);
    expect([0, L]).toContain(r.x_moment_mm);
  });

  it('load at a (a > b): end moment Pab²/L², δ under the load Pa³b³/3EIL³, δmax 2Pa³b²/3EI(3a+b)² (AISC 3-23 case 18, recalled [M])', () => {
    const a = 1300;
    const b = L - a;
    const input: BeamInput = { span_mm: L, E_MPa: E, I_mm4: I, support: 'fixed', loads: [{ kind: 'point', P_N: P, a_mm: a }] };
    const r = beam(input);
    // The larger end moment is at the nearer end: Pa²b/L² at x = L since a > b.
    expect(rel(Math.abs(beamMomentAt(input, 0)), (P * a * b * b) / L ** 2)).toBeLessThan(1e-12);
    expect(rel(r.max_moment_Nmm, (P * a * a * b) / L ** 2)).toBeLessThan(1e-9);
    expect(rel(beamMomentAt(input, a), (2 * P * a * a * b * b) / L ** 3)).toBeLessThan(1e-12);
    expect(rel(beamDeflectionAt(input, a), (P * a ** 3 * b ** 3) / (3 * EI * L ** 3))).toBeLessThan(1e-12);
    expect(rel(r.deflection_mm, (2 * P * a ** 3 * b * b) / (3 * EI * (3 * a + b) ** 2))).toBeLessThan(1e-9);
    expect(Math.abs(r.x_max_mm - (2 * a * L) / (3 * a + b))).toBeLessThan(0.05);
    // R1 = Pb²(3a + b)/L³.
    expect(r.reactions_N[0]).toBeCloseTo((P * b * b * (3 * a + b)) / L ** 3, 9);
  });
});

describe('cantilever, fixed at x = 0 (AWC DA6 Fig. 14; AISC 3-23)', () => {
  it('end load: δ = PL³/3EI at the free end, M = PL at the fixed end, R = P', () => {
    const r = run('cantilever', [{ kind: 'point', P_N: P, a_mm: L }]);
    expect(rel(r.deflection_mm, (P * L ** 3) / (3 * EI))).toBeLessThan(1e-9);
    expect(r.x_max_mm).toBeCloseTo(L, 6);
    expect(rel(r.max_moment_Nmm, P * L)).toBeLessThan(1e-12);
    expect(r.x_moment_mm).toBe(0);
    expect(r.reactions_N).toEqual([P, 0]);
  });

  it('UDL: δ = wL⁴/8EI, M = wL²/2', () => {
    const r = run('cantilever', [{ kind: 'udl', w_N_per_mm: w }]);
    expect(rel(r.deflection_mm, (w * L ** 4) / (8 * EI))).toBeLessThan(1e-9);
    expect(rel(r.max_moment_Nmm, (w * L ** 2) / 2)).toBeLessThan(1e-12);
  });

  it('load at a from the fixed end: free-end δ = Pa²(3L − a)/6EI (AWC DA6 Fig. 14, recalled [M])', () => {
    const a = 1200;
    const r = run('cantilever', [{ kind: 'point', P_N: P, a_mm: a }]);
    expect(rel(r.deflection_mm, (P * a * a * (3 * L - a)) / (6 * EI))).toBeLessThan(1e-9);
    expect(rel(r.max_moment_Nmm, P * a)).toBeLessThan(1e-12);
  });
});

describe('worked example (REFERENCES.md, recalled [M]; arithmetic re-done there: 2.979 mm, 34.31 MPa)', () => {
  it('simply supported steel beam, L = 5000 mm, q = 6 N/mm, I = 81.96e6 mm⁴, E = 200,000 MPa, c = 150 mm', () => {
    const Iw = 81.96e6;
    const r = beam({ span_mm: 5000, E_MPa: 200_000, I_mm4: Iw, support: 'simple', loads: [{ kind: 'udl', w_N_per_mm: 6 }] });
    expect(r.deflection_mm).toBeCloseTo(2.979, 3);
    // σ = M·c/I = (6 × 5000²/8) × 150 / 81.96e6 = 34.3155 MPa; the quoted 34.31 is truncated, hence ±0.01.
    expect(Math.abs(beamStress(r.max_moment_Nmm, Iw / 150) - 34.31)).toBeLessThan(0.01);
  });
});

describe('superposition and partial loads', () => {
  const support = fc.constantFrom<BeamSupport>('simple', 'fixed', 'cantilever');
  const point = fc.record({ kind: fc.constant('point' as const), P_N: fc.double({ min: -2000, max: 2000, noNaN: true }), a_mm: fc.double({ min: 0, max: L, noNaN: true }) });
  const udl = fc
    .record({ w: fc.double({ min: -2, max: 2, noNaN: true }), p: fc.double({ min: 0, max: L, noNaN: true }), q: fc.double({ min: 0, max: L, noNaN: true }) })
    .filter(({ p, q }) => Math.abs(p - q) > 1)
    .map(({ w: ww, p, q }): BeamLoad => ({ kind: 'udl', w_N_per_mm: ww, from_mm: Math.min(p, q), to_mm: Math.max(p, q) }));
  const load = fc.oneof(point, udl);

  it('two loads together deflect and bend as the sum of each alone at the same x (linear elasticity)', () => {
    fc.assert(
      fc.property(support, load, load, fc.double({ min: 0, max: L, noNaN: true }), (s, l1, l2, x) => {
        const input = (loads: BeamLoad[]): BeamInput => ({ span_mm: L, E_MPa: E, I_mm4: I, support: s, loads });
        const both = beamDeflectionAt(input([l1, l2]), x);
        const sum = beamDeflectionAt(input([l1]), x) + beamDeflectionAt(input([l2]), x);
        const m = beamMomentAt(input([l1, l2]), x);
        const msum = beamMomentAt(input([l1]), x) + beamMomentAt(input([l2]), x);
        return Math.abs(both - sum) <= 1e-9 * (1 + Math.abs(sum)) && Math.abs(m - msum) <= 1e-6 * (1 + Math.abs(msum));
      }),
    );
  });

  it('the largest deflection is never below the value at any other point', () => {
    fc.assert(
      fc.property(support, fc.array(load, { minLength: 1, maxLength: 4 }), fc.double({ min: 0, max: L, noNaN: true }), (s, loads, x) => {
        const input: BeamInput = { span_mm: L, E_MPa: E, I_mm4: I, support: s, loads };
        const r = beam(input);
        return Math.abs(r.deflection_mm) >= Math.abs(beamDeflectionAt(input, x)) * (1 - 1e-9) - 1e-12 &&
          r.max_moment_Nmm >= Math.abs(beamMomentAt(input, x)) * (1 - 1e-9) - 1e-9;
      }),
    );
  });

  it('a UDL split into two partial UDLs gives the full-span closed form', () => {
    for (const s of ['simple', 'fixed', 'cantilever'] as const) {
      const full = run(s, [{ kind: 'udl', w_N_per_mm: w }]);
      const split = run(s, [
        { kind: 'udl', w_N_per_mm: w, from_mm: 0, to_mm: 700 },
        { kind: 'udl', w_N_per_mm: w, from_mm: 700, to_mm: L },
      ]);
      expect(rel(split.deflection_mm, full.deflection_mm), s).toBeLessThan(1e-9);
      expect(rel(split.max_moment_Nmm, full.max_moment_Nmm), s).toBeLessThan(1e-9);
    }
  });

  it('a partial UDL equals many small point loads (midpoint rule, converging as 1/n²)', () => {
    const [from, to] = [250, 1100];
    const n = 2000;
    const h = (to - from) / n;
    const points: BeamLoad[] = Array.from({ length: n }, (_, i) => ({ kind: 'point', P_N: w * h, a_mm: from + (i + 0.5) * h }));
    for (const s of ['simple', 'fixed', 'cantilever'] as const) {
      const input = (loads: BeamLoad[]): BeamInput => ({ span_mm: L, E_MPa: E, I_mm4: I, support: s, loads });
      const udl = input([{ kind: 'udl', w_N_per_mm: w, from_mm: from, to_mm: to }]);
      for (const x of [100, 700, 1500, 1900]) {
        expect(rel(beamDeflectionAt(udl, x), beamDeflectionAt(input(points), x)), `${s} x=${x}`).toBeLessThan(1e-6);
      }
    }
  });
});

describe('bad input', () => {
  const fieldOf = (input: Partial<BeamInput>): string => {
    try {
      beam({ span_mm: L, E_MPa: E, I_mm4: I, support: 'simple', loads: [], ...input });
    } catch (e) {
      if (e instanceof InputError) return e.field;
      throw e;
    }
    throw new Error('expected an InputError');
  };

  it('names the field at fault', () => {
    expect(fieldOf({ span_mm: 0 })).toBe('span_mm');
    expect(fieldOf({ E_MPa: -1 })).toBe('E_MPa');
    expect(fieldOf({ I_mm4: Number.NaN })).toBe('I_mm4');
    expect(fieldOf({ support: 'pinned' as BeamSupport })).toBe('support');
    expect(fieldOf({ loads: [{ kind: 'point', P_N: 1, a_mm: 1 }, { kind: 'point', P_N: 1, a_mm: L + 1 }] })).toBe('loads[1].a_mm');
    expect(fieldOf({ loads: [{ kind: 'udl', w_N_per_mm: 1, from_mm: 500, to_mm: 400 }] })).toBe('loads[0].from_mm');
    expect(() => beamStress(1, 0)).toThrow(InputError);
  });

  it('no load, no deflection', () => {
    expect(run('simple', [])).toMatchObject({ deflection_mm: 0, max_moment_Nmm: 0, reactions_N: [0, 0] });
  });

  it('σ = M/W', () => {
    expect(beamStress(1_000_000, 4_000)).toBe(250);
    expect(beamStress(-1_000_000, 4_000)).toBe(250);
  });
});
