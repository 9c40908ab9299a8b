import { describe, expect, it } from 'vitest';
import { resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { principalAxes } from '@shared/geometry/polygon';
import { DEFAULT_FORWARD_G, DEFAULT_REARWARD_G, DEFAULT_SIDEWAYS_G, LOAD_SECURING, loadCases } from '@shared/engine/load-cases';
import { computeReport } from '@shared/engine/report';
import { parseFrameDocument } from '@shared/model/parse';
import { settingsSchema } from '@shared/model/settings';
import { member, module } from './frames';

const g = 9.80665;

describe('principal axes of an angle (closed form)', () => {
  // Angle 40×40×4 as two rectangles, 40×4 along x and 4×36 up y; parallel-axis theorem (any mechanics text):
  // A = 304 mm², centroid 11.474 mm from each outer face, Ixy = ΣA·dx·dy; an equal angle's principal axes lie at
  // 45°, I₁,₂ = Ix ± |Ixy| (Roark, Table A.1; Mohr's circle).
  const [a, t] = [40, 4];
  const parts = [
    { A: a * t, x: a / 2, y: t / 2, Ix: (a * t ** 3) / 12 },
    { A: t * (a - t), x: t / 2, y: t + (a - t) / 2, Ix: (t * (a - t) ** 3) / 12 },
  ];
  const A = parts.reduce((s, p) => s + p.A, 0);
  const c = parts.reduce((s, p) => s + p.A * p.x, 0) / A;
  const Ix = parts.reduce((s, p) => s + p.Ix + p.A * (p.y - c) ** 2, 0);
  const Ixy = parts.reduce((s, p) => s + p.A * (p.x - c) * (p.y - c), 0);
  const s = sectionOf(resolveProfile('angle:40x40x4'));

  it('Ixy by polygon integration matches the rectangles; principal moments Ix ± |Ixy| at 45°', () => {
    expect(s.area_mm2).toBeCloseTo(A, 9);
    expect(s.cx_mm).toBeCloseTo(c, 9);
    expect(s.Ix_mm4).toBeCloseTo(Ix, 6);
    expect(s.Ixy_mm4).toBeCloseTo(Ixy, 6);
    const p = principalAxes(s.Ix_mm4, s.Iy_mm4, s.Ixy_mm4);
    expect(p.I1).toBeCloseTo(Ix + Math.abs(Ixy), 6);
    expect(p.I2).toBeCloseTo(Ix - Math.abs(Ixy), 6);
    expect((p.theta * 180) / Math.PI).toBeCloseTo(45, 9);
    // A rectangle has no product of inertia and its axes are principal.
    expect(principalAxes(100, 40, 0)).toEqual({ I1: 100, I2: 40, theta: 0 });
  });

  it('bent free of lateral restraint: deflection ×1.54 and stress ×1.30 of the plain figures (the load review)', () => {
    // Unsymmetric bending (Boresi & Schmidt, Advanced Mechanics of Materials, ch. 7): vertical deflection
    // ×Ix·Iy/(Ix·Iy − Ixy²); stress M(Iy·y − Ixy·x)/(Ix·Iy − Ixy²), largest at a corner of the outline.
    const doc = parseFrameDocument({
      schemaVersion: 1,
      settings: { shockFactor: 1, inVehicle: false },
      members: [
        member('U1', 'z', 0, 800, { x: 0, y: 0 }),
        member('U2', 'z', 0, 800, { x: 960, y: 0 }),
        member('A', 'x', 40, 960, { y: 0, z: 760 }, { profile: 'angle:40x40x4' }),
      ],
    });
    const r = computeReport(doc);
    const ch = r.loads.members.find((m) => m.member_id === 'A');
    const fd = (Ix * Ix) / (Ix * Ix - Ixy * Ixy);
    expect(ch?.unsymmetric?.deflection_factor).toBeCloseTo(fd, 4);
    expect(Math.round((ch?.unsymmetric?.deflection_factor as number) * 100) / 100).toBe(1.54);
    expect(Math.round((ch?.unsymmetric?.stress_factor as number) * 100) / 100).toBe(1.3);
    // The angle's own weight as a UDL over 920 mm: 5wL⁴/384EI × the factor (AISC Manual Table 3-23, case 1).
    const w = (s.mass_kg_per_m / 1000) * g;
    expect(ch?.spans[0].deflection_mm).toBeCloseTo(((5 * w * 920 ** 4) / (384 * s.E_MPa * Ix)) * fd, 4);
    expect(r.warnings.find((x) => x.code === 'unsymmetric-section')?.message).toMatch(/lateral restraint not assumed/);
  });
});

describe('self-weight as a UDL (AISC Manual Table 3-23, case 1)', () => {
  it('a 40×80 top rail carrying nothing else: δ = 5wL⁴/384EI, M = wL²/8 with w its weight per mm × shock', () => {
    const s = sectionOf(resolveProfile('40x80-s8'));
    const doc = parseFrameDocument({
      schemaVersion: 1,
      settings: { shockFactor: 2.5, inVehicle: false },
      members: [member('U1', 'z', 0, 800, { x: 0, y: 0 }), member('U2', 'z', 0, 800, { x: 1540, y: 0 }), member('T', 'x', 40, 1540, { y: 0, z: 720 }, { profile: '40x80-s8' })],
    });
    const r = computeReport(doc);
    const c = r.loads.members.find((m) => m.member_id === 'T');
    const w = ((s.mass_kg_per_m / 1000) * g * 2.5) as number;
    const L = 1500;
    expect(c?.self_weight_N).toBeCloseTo((w / 2.5) * L, 3);
    // Reported to 0.00001 mm, rounded up (the safe side): at most that much over the formula, never under it.
    const delta = (5 * w * L ** 4) / (384 * s.E_MPa * s.Ix_mm4);
    expect(c?.spans[0].deflection_mm).toBeGreaterThanOrEqual(delta);
    expect(c?.spans[0].deflection_mm).toBeLessThanOrEqual(delta + 1e-5);
    expect(c?.spans[0].moment_Nmm).toBeCloseTo((w * L * L) / 8, 0);
    // The uprights take half each, plus their own weight.
    for (const u of r.loads.uprights) expect(u.axial_N).toBeCloseTo((w * L) / 2 + (sectionOf(resolveProfile('40x40-s8')).mass_kg_per_m / 1000) * g * 2.5 * 800, 2);
  });
});

describe('vehicle load cases (EN 12195-1; VDI 2700 Sheet 16 / ISO 27956)', () => {
  it('lists the published load-securing factors with their sources', () => {
    const en = LOAD_SECURING.find((r) => r.id === 'en-12195-1');
    expect(en).toMatchObject({ forward_g: 0.8, rearward_g: 0.5, sideways_g: 0.5, vertical_g: 1.0 });
    expect(en?.source).toMatch(/EN 12195-1/);
    expect(LOAD_SECURING.find((r) => r.id === 'van-2-3.5t')).toMatchObject({ forward_g: 0.8, rearward_g: 0.5, sideways_g: 0.6 });
    expect(LOAD_SECURING.find((r) => r.id === 'van-2t')).toMatchObject({ forward_g: 0.9, rearward_g: 0.5, sideways_g: 0.7 });
    // Defaults are the largest of each (the safe side) and the settings default to them.
    expect([DEFAULT_FORWARD_G, DEFAULT_REARWARD_G, DEFAULT_SIDEWAYS_G]).toEqual([0.9, 0.5, 0.7]);
    const s = settingsSchema.parse({});
    expect([s.forward_g, s.rearward_g, s.sideways_g, s.forward]).toEqual([0.9, 0.5, 0.7, 'unknown']);
  });

  it('braking forward, rearward and cornering both ways once the forward direction is set; every side while unknown', () => {
    const s = settingsSchema.parse({ forward: '-x', forward_g: 0.8, rearward_g: 0.5, sideways_g: 0.5 });
    const cases = loadCases(s);
    expect(cases.map((c) => [c.id, c.vertical, c.ax, c.ay])).toEqual([
      ['shock', 2.5, 0, 0],
      ['braking', 1, -0.8, 0],
      ['rearward', 1, 0.5, 0],
      ['cornering+y', 1, 0, 0.5],
      ['cornering-y', 1, 0, -0.5],
    ]);
    expect(loadCases(settingsSchema.parse({})).map((c) => Math.hypot(c.ax, c.ay))).toEqual([0, 0.9, 0.9, 0.9, 0.9]);
    expect(loadCases(settingsSchema.parse({ inVehicle: false }))).toHaveLength(1);
  });

  it('a tall module braking shifts its weight forward: the front bearer governs in the braking case', () => {
    const doc = parseFrameDocument({
      schemaVersion: 1,
      settings: { shockFactor: 1.2, forward: '-y', forward_g: 0.8, rearward_g: 0.5, sideways_g: 0.5 },
      members: [
        member('U1', 'z', 0, 800, { x: 0, y: 0 }),
        member('U2', 'z', 0, 800, { x: 960, y: 0 }),
        member('U3', 'z', 0, 800, { x: 0, y: 460 }),
        member('U4', 'z', 0, 800, { x: 960, y: 460 }),
        member('R1', 'x', 40, 960, { y: 0, z: 760 }),
        member('R2', 'x', 40, 960, { y: 460, z: 760 }),
      ],
      modules: [module('fridge', [400, 500, 600], 40, [300, 0, 800])],
    });
    const r = computeReport(doc);
    // Resultant shifted by a/g·h = 0.8 × 300 mm toward the front (−y): lever rule across the rails 460 apart.
    const st = r.loads.statics.find((x) => x.case === 'braking');
    expect(st?.at_mm.y).toBeCloseTo(250 - 0.8 * 300, 6);
    const R1 = st?.reactions.find((x) => x.member_id === 'R1')?.R_N as number;
    expect(R1).toBeCloseTo((40 * g * (480 - (250 - 240))) / 460, 1);
    expect(r.loads.members.find((m) => m.member_id === 'R1')?.governing_case).toBe('braking');
    // Floor reactions per case: horizontal force = total mass × 0.8 g, shared among the four feet.
    const f = r.loads.fixings.find((x) => x.case === 'braking');
    expect(f?.points).toHaveLength(4);
    expect(f?.horizontal_N).toBeCloseTo((r.mass.frame_kg + 40) * g * 0.8, 0);
    expect(r.loads.fixings_caution).toMatch(/vehicle maker's rules and a qualified person/);
  });
});
