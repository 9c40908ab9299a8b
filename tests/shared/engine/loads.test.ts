import { describe, expect, it } from 'vitest';
import { resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { computeReport } from '@shared/engine/report';
import type { FrameReport } from '@shared/engine/report-types';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { emptyFrameDocument } from '@shared/model/frame-document';
import { parseFrameDocument } from '@shared/model/parse';
import { boxFrame, member, module } from './frames';

// Beam formulas: American Wood Council Design Aid No. 6 (Fig. 1 simple beam UDL, Fig. 9 two equal loads
// symmetrically placed, Fig. 14 cantilever load at any point) and AISC Steel Construction Manual Table 3-23
// (cases 1, 9, 15, 22). Standard gravity 9.80665 m/s² (CGPM 1901).
const g = 9.80665;
const s40 = sectionOf(resolveProfile('40x40-s8'));
const EI = s40.E_MPa * s40.Ix_mm4;
const check = (r: FrameReport, id: string) => r.loads.members.find((m) => m.member_id === id);
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
// Every member carries its own weight as a UDL (AISC Manual Table 3-23): mass per metre × g, N/mm.
const sw40 = (s40.mass_kg_per_m / 1000) * g;

describe('a module on the top rails of the hand-worked box', () => {
  // A 20 kg module 920 mm wide over the whole top: shared by the two rails R1, R2 (equal share), each carrying
  // a UDL over its full 920 mm span between the uprights, times the shock factor 2.5. A frame that never moves, so
  // the vertical case alone is checked (braking and cornering have their own tests).
  const doc = boxFrame({ settings: { inVehicle: false }, modules: [module('box', [920, 500, 100], 20, [40, 0, 800])] });
  const r = computeReport(doc);
  const L = 920;
  const W = (20 * g * 2.5) / 2;
  const w = W / L + 2.5 * sw40;

  it('reproduces the simply supported UDL by hand: δ = 5wL⁴/384EI, M = wL²/8 (fixed ends: wL⁴/384EI, wL²/12)', () => {
    const c = check(r, 'R1');
    expect(c?.load_N).toBeCloseTo(w * L, 2);
    expect(c?.self_weight_N).toBeCloseTo(sw40 * L, 2);
    expect(c?.governing_case).toBe('shock');
    const [span] = c?.spans ?? [];
    expect(span.span_mm).toBe(L);
    expect(rel(span.deflection_mm, (5 * w * L ** 4) / (384 * EI))).toBeLessThan(1e-4);
    expect(rel(span.moment_Nmm, (w * L * L) / 8)).toBeLessThan(1e-4);
    expect(rel(span.deflection_fixed_mm as number, (w * L ** 4) / (384 * EI))).toBeLessThan(1e-4);
    expect(rel(span.moment_fixed_Nmm as number, (w * L * L) / 12)).toBeLessThan(1e-4);
    // Stress σ = M/W; limits span/240 and yield/1.65 (6063-T5 design minimum 16 ksi ≈ 110 MPa, ADM Table A.3.4).
    expect(rel(span.stress_MPa, (w * L * L) / 8 / s40.Wx_mm3)).toBeLessThan(1e-4);
    expect(span.limit_mm).toBeCloseTo(L / 240, 3);
    expect(span.allowable_MPa).toBeCloseTo(110 / 1.65, 3);
    const u = Math.max(span.deflection_mm / (L / 240), span.stress_MPa / (110 / 1.65));
    expect(c?.utilisation).toBeCloseTo(u, 4);
  });

  it('passes the reactions down to the uprights: each takes a quarter of the factored weight, and its own', () => {
    const axial = r.loads.uprights.map((u) => u.axial_N);
    expect(axial).toHaveLength(4);
    // Each upright: a quarter of the module, half of a rail (920 mm) and half of a cross-member (420 mm), and
    // its own 800 mm, all × 2.5.
    for (const a of axial) expect(a).toBeCloseTo(2.5 * ((20 * g) / 4 + sw40 * (460 + 210 + 800)), 2);
  });

  it('scales with the shock factor', () => {
    const still = computeReport(boxFrame({ settings: { shockFactor: 1, inVehicle: false }, modules: [module('box', [920, 500, 100], 20, [40, 0, 800])] }));
    // Module and self-weight both scale: the vertical shock case is the static case times 2.5.
    expect(check(r, 'R1')?.spans[0].deflection_mm).toBeCloseTo(2.5 * (check(still, 'R1')?.spans[0].deflection_mm as number), 4);
  });
});

describe('other load cases against the tables', () => {
  it('a module hung from a rail: two equal loads symmetrically placed, δ = Pa(3L² − 4a²)/24EI (AWC DA6 Fig. 9)', () => {
    // A 300 mm wide module hung centrally under R1 (L = 920): hangers at a = (920 − 300)/2 = 310 from each end.
    const doc = parseFrameDocument({
      schemaVersion: 1,
      settings: { shockFactor: 1, inVehicle: false },
      members: [member('U1', 'z', 0, 800, { x: 0, y: 0 }), member('U2', 'z', 0, 800, { x: 960, y: 0 }), member('R1', 'x', 40, 960, { y: 0, z: 760 })],
      modules: [module('sink', [300, 40, 150], 12, [350, 0, 610], { bearing: 'hung' })],
    });
    const r = computeReport(doc);
    const [L, a, P] = [920, 310, (12 * g) / 2];
    const c = check(r, 'R1');
    // Plus the rail's own weight, a UDL (AWC DA6 Fig. 1): both give their largest figures at midspan.
    const d = (P * a * (3 * L * L - 4 * a * a)) / (24 * EI) + (5 * sw40 * L ** 4) / (384 * EI);
    expect(rel(c?.spans[0].deflection_mm as number, d)).toBeLessThan(1e-4);
    expect(rel(c?.spans[0].moment_Nmm as number, P * a + (sw40 * L * L) / 8)).toBeLessThan(1e-4);
  });

  it('a bracket arm with a load at its tip: a cantilever, δ = PL³/3EI (AWC DA6 Fig. 14), limit 2L/N', () => {
    // Arm R butts into upright U at its start and is free at the end, 400 mm out; a narrow 5 kg module at the tip.
    const doc = parseFrameDocument({
      schemaVersion: 1,
      settings: { shockFactor: 1, inVehicle: false },
      members: [member('U', 'z', 0, 800, { x: 0, y: 0 }), member('R', 'x', 40, 440, { y: 0, z: 500 })],
      modules: [module('lamp', [0.8, 40, 50], 5, [439.2, 0, 540])],
    });
    const r = computeReport(doc);
    const c = check(r, 'R');
    // Narrower than 1 mm, it bears as a point load at the centre of its contact: 399.6 mm from the support.
    const [P, a] = [5 * g, 399.6];
    expect(c?.spans[0].support).toBe('cantilever');
    // Deflection at the free end, load at a from the fixed end: Pa²(3L − a)/6EI; at a = L this is PL³/3EI.
    // Plus the arm's own weight: wL⁴/8EI at the tip and wL²/2 at the root (AWC DA6 Fig. 12).
    const d = (P * a ** 2 * (3 * 400 - a)) / (6 * EI) + (sw40 * 400 ** 4) / (8 * EI);
    expect(rel(c?.spans[0].deflection_mm as number, d)).toBeLessThan(1e-4);
    expect(rel(c?.spans[0].moment_Nmm as number, P * a + (sw40 * 400 * 400) / 2)).toBeLessThan(1e-5);
    expect(c?.spans[0].limit_mm).toBeCloseTo((2 * 400) / 240, 3);
  });

  it('bearers pass their reactions to the rails they butt into (statics: a module centred between them)', () => {
    // Two bearers along y between the front and back rails, carrying a centred module: each rail gets half of
    // each bearer's load; everything reaches the uprights.
    const doc = parseFrameDocument({
      schemaVersion: 1,
      settings: { shockFactor: 1, inVehicle: false },
      members: [
        member('U1', 'z', 0, 800, { x: 0, y: 0 }),
        member('U2', 'z', 0, 800, { x: 960, y: 0 }),
        member('U3', 'z', 0, 800, { x: 0, y: 460 }),
        member('U4', 'z', 0, 800, { x: 960, y: 460 }),
        member('F', 'x', 40, 960, { y: 0, z: 300 }),
        member('B', 'x', 40, 960, { y: 460, z: 300 }),
        member('b1', 'y', 40, 460, { x: 300, z: 300 }),
        member('b2', 'y', 40, 460, { x: 660, z: 300 }),
      ],
      modules: [module('tank', [400, 300, 300], 40, [280, 100, 340])],
    });
    const r = computeReport(doc);
    const total = 40 * g;
    expect(r.modules[0].bears_on.map((b) => b.member_id)).toEqual(['b1', 'b2']);
    // Each rail: half the module, half of each 420 mm bearer's own weight, and its own 920 mm.
    const rail = total / 2 + sw40 * (420 + 920);
    expect(check(r, 'F')?.load_N).toBeCloseTo(rail, 2);
    expect(check(r, 'B')?.load_N).toBeCloseTo(rail, 2);
    // Everything reaches the uprights: the module and every member's weight (4 × 800 + 2 × 920 + 2 × 420 mm).
    expect(r.loads.uprights.reduce((s, u) => s + u.axial_N, 0)).toBeCloseTo(total + sw40 * (3200 + 1840 + 840), 2);
  });

  it('flags a member over its limit and a module that bears on nothing', () => {
    const heavy = computeReport(boxFrame({ modules: [module('anvil', [920, 500, 100], 900, [40, 0, 800])] }));
    expect(heavy.warnings.find((w) => w.code === 'over-utilised' && w.member_id === 'R1')).toBeDefined();
    expect(heavy.loads.max_utilisation).toBeGreaterThan(1);
    const floating = computeReport(boxFrame({ modules: [module('cloud', [100, 100, 100], 5, [300, 200, 1500])] }));
    expect(floating.warnings.find((w) => w.code === 'module-unsupported')?.module_id).toBe('cloud');
  });

  it('carries the cautions with every report', () => {
    const r = computeReport(boxFrame());
    expect(r.cautions.join(' ')).toMatch(/not an engineering approval/);
    expect(r.cautions.join(' ')).toMatch(/vehicle regulations/);
    expect(r.cautions.join(' ')).toMatch(/vehicle maker allows/);
    expect(r.loads.shock_factor_note).toMatch(/common practice/);
  });

  it('finds what each module bears on: slides beside a drawer, bearers under a tank (demo pod)', () => {
    const r = computeReport(demoFrameDocument());
    const on = (id: string) => r.modules.find((m) => m.id === id)?.bears_on.map((b) => [b.member_id, b.face]);
    // The slide rails stand 12.7 mm off the pantry's sides (side-mount slides, common practice); they carry it
    // on the faces towards it.
    expect(on('pantry')).toEqual([
      ['bay-pantry-slide-l', 'right'],
      ['bay-pantry-slide-r', 'left'],
    ]);
    expect(on('tank')).toEqual([
      ['bay-tank-bearer-l', 'top'],
      ['bay-tank-bearer-r', 'top'],
    ]);
    // A 30 L tank counts full: 3 kg + 30 L × 1 kg/L = 33 kg.
    expect(r.modules.find((m) => m.id === 'tank')?.mass_kg).toBe(33);
  });

  it('reports an empty frame without failing', () => {
    const r = computeReport(emptyFrameDocument());
    expect(r.mass).toMatchObject({ total_kg: 0, cog_mm: null });
    expect(r.loads.max_utilisation).toBeNull();
  });
});
