import { describe, expect, it } from 'vitest';
import { resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { setWallFixing } from '@shared/editing/edits';
import { computeReport } from '@shared/engine/report';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { parseFrameDocument } from '@shared/model/parse';
import { boxFrame, member, module } from './frames';

// Simply supported beam, uniform load over a length c centred on the span L: M_max = Q(2L − c)/8 at midspan
// (Roark's Formulas for Stress and Strain, Table 8.1, case 2e with the load centred; AISC Manual Table 3-23 for
// the full-length UDL wL²/8). Load-securing accelerations: EN 12195-1; VDI 2700 Sheet 16 / ISO 27956 for vans
// (0.9 g forward, 0.7 g sideways up to 2.0 t; REFERENCES.md). Standard gravity 9.80665 m/s² (CGPM 1901).
const g = 9.80665;
const s40 = sectionOf(resolveProfile('40x40-s8'));
const sw40 = (s40.mass_kg_per_m / 1000) * g;

describe('braking and cornering push members sideways', () => {
  // A 12 kg module hung centrally from one rail (L = 920 mm), 300 mm wide; the vehicle's front along +x, so
  // cornering (0.7 g) pushes across the rail. Shock factor 1, so the cornering case governs.
  const doc = parseFrameDocument({
    schemaVersion: 1,
    settings: { shockFactor: 1, forward: '+x' },
    members: [member('U1', 'z', 0, 800, { x: 0, y: 0 }), member('U2', 'z', 0, 800, { x: 960, y: 0 }), member('R1', 'x', 40, 960, { y: 0, z: 760 })],
    modules: [module('sink', [300, 40, 150], 12, [350, 0, 610], { bearing: 'hung', name: 'Sink' })],
  });
  const r = computeReport(doc);
  const c = r.loads.members.find((m) => m.member_id === 'R1');

  it('the rail bends about its other axis under the module’s inertia and its own: M = Q(2L − c)/8 + wL²/8', () => {
    expect(c?.governing_case).toMatch(/^cornering/);
    const [L, cLen] = [920, 300];
    const Q = 0.7 * 12 * g;
    const M = (Q * (2 * L - cLen)) / 8 + (0.7 * sw40 * L * L) / 8;
    expect(c?.lateral?.load_N).toBeCloseTo(Q + 0.7 * sw40 * L, 2);
    expect(c?.lateral?.bending_axis).toBe('y');
    // A 40×40 section turned a quarter bends about y: σ = M / W_y.
    expect(Math.abs((c?.lateral?.stress_MPa as number) - M / s40.Wy_mm3) / (M / s40.Wy_mm3)).toBeLessThan(1e-4);
  });

  it('combined with the vertical bending of the same case on the safe side: stress ratios added', () => {
    const span = c?.spans[0];
    const allow = span?.allowable_MPa as number;
    const sum = (span?.stress_MPa as number) / allow + (c?.lateral?.stress_MPa as number) / allow;
    expect(c?.lateral?.combined_utilisation).toBeGreaterThanOrEqual(sum - 1e-4);
    expect(c?.utilisation).toBeCloseTo(c?.lateral?.combined_utilisation as number, 4);
    expect(c?.utilisation).toBeGreaterThan(span?.utilisation as number);
  });

  it('a frame that never moves has no sideways check', () => {
    const still = computeReport(parseFrameDocument({ ...doc, settings: { ...doc.settings, inVehicle: false } }));
    expect(still.loads.members.find((m) => m.member_id === 'R1')?.lateral).toBeNull();
  });

  it('racking: a moving frame without braces is warned about; braces, or a frame that never moves, are not', () => {
    const frame = boxFrame();
    expect(computeReport(frame).warnings.find((w) => w.code === 'frame-racking')?.message).toMatch(/no diagonal braces.*not checked\. Add a diagonal brace/);
    const braced = boxFrame({ members: [...frame.members, member('X', 'x', 40, 960, { y: 0, z: 400 }, { role: 'brace' })] });
    expect(computeReport(braced).warnings.some((w) => w.code === 'frame-racking')).toBe(false);
    expect(computeReport(boxFrame({ settings: { inVehicle: false } })).warnings.some((w) => w.code === 'frame-racking')).toBe(false);
  });
});

describe('fixing points: the feet on the floor and the ends bolted to the wall', () => {
  // The hand-worked box with a 20 kg module on top, its front rail's start bolted to the wall; front along +x.
  const base = boxFrame({ settings: { forward: '+x' }, modules: [module('box', [920, 500, 100], 20, [40, 0, 800])] });
  const doc = setWallFixing(base, 'R1', 'start', true);
  const r = computeReport(doc);

  it('the wall fixing is stored on the member and can be cleared', () => {
    expect(doc.members.find((m) => m.id === 'R1')?.wallFixing).toBe('start');
    expect(setWallFixing(setWallFixing(doc, 'R1', 'end', true), 'R1', 'start', false).members.find((m) => m.id === 'R1')?.wallFixing).toBe('end');
    expect(setWallFixing(doc, 'R1', 'start', false).members.find((m) => m.id === 'R1')?.wallFixing).toBeUndefined();
    expect(r.members.find((m) => m.id === 'R1')?.wall_fixing).toBe('start');
  });

  it('each fixing takes the whole horizontal force, the wall one the weight and the overturning moment at its height too', () => {
    const braking = r.loads.fixings.find((f) => f.case === 'braking');
    const mass = r.mass.frame_kg + r.mass.modules_kg;
    const H = mass * g * 0.9;
    expect(braking?.horizontal_N).toBeCloseTo(H, 1);
    const floor = braking?.points.filter((p) => p.kind === 'floor') ?? [];
    const wall = braking?.points.filter((p) => p.kind === 'wall') ?? [];
    expect(floor).toHaveLength(4);
    expect(wall).toHaveLength(1);
    for (const p of floor) expect(p.horizontal_N).toBeCloseTo(H, 1);
    // Overturning moment about the floor: every mass × 0.9 g at its height (members at their centres, the module
    // at its base, 800 mm); the wall fixing sits on the rail's start face, at the rail's centre height 780 mm.
    const T = r.members.reduce((s, m) => s + m.mass_kg * g * 0.9 * ((m.min_mm.z + m.max_mm.z) / 2), 0) + 20 * g * 0.9 * 800;
    expect(wall[0].at_mm.z).toBeCloseTo(780, 6);
    expect(wall[0].horizontal_N).toBeCloseTo(H + T / 780, 0);
    expect(wall[0].vertical_N).toBeCloseTo(mass * g, 1);
    expect(wall[0].title).toMatch(/^rail [A-Z]+/);
    // ΣM about the feet: the overturning moment makes the front feet push and the back ones pull (or push less).
    expect(floor.reduce((s, p) => s + p.vertical_N, 0)).toBeCloseTo(braking?.vertical_N as number, 2);
  });

  it('says the vehicle maker’s rules and a qualified person decide', () => {
    expect(r.loads.fixings_caution).toMatch(/vehicle maker's rules and a qualified person/);
    expect(r.loads.model_notes.some((n) => /if the others were weaker/.test(n))).toBe(true);
  });

  it('the schema bounds the field and names it', () => {
    expect(() => parseFrameDocument({ ...base, members: base.members.map((m) => (m.id === 'R1' ? { ...m, wallFixing: 'middle' } : m)) })).toThrow(/wallFixing/);
  });
});

describe('messages name things as the builder does', () => {
  it('no warning or T-nut message of the demo shows a record id or a document field name', () => {
    const doc = demoFrameDocument();
    const r = computeReport(doc);
    // Record-like ids (a plain word such as “tank” may also be in the name the builder gave).
    const ids = [...doc.members.map((m) => m.id), ...doc.modules.map((m) => m.id)].filter((id) => /[-_\d]/.test(id));
    expect(ids.length).toBeGreaterThan(10);
    const texts = [...r.warnings.map((w) => w.message), ...r.hardware.t_nut_order.map((t) => t.message)];
    expect(texts.length).toBeGreaterThan(0);
    for (const t of texts) {
      for (const id of ids) expect(t.includes(id), `${t} names ${id}`).toBe(false);
      expect(t).not.toMatch(/bearsOn|wallFixing|rotation_deg|\u0001/);
    }
    // The ids stay in their own fields for the editor to highlight.
    expect(r.warnings.some((w) => w.member_id !== undefined || w.module_id !== undefined)).toBe(true);
  });
});
