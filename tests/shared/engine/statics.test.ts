import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeReport } from '@shared/engine/report';
import { rigidBodyReactions } from '@shared/engine/statics';
import { parseFrameDocument } from '@shared/model/parse';
import type { MemberInput } from '@shared/model/member';
import type { ModuleInput } from '@shared/model/module';
import { cornerUprights, member, module } from './frames';

// Rigid body on supports: ΣF = 0, ΣM = 0 (any statics text, e.g. Meriam & Kraige, Engineering Mechanics: Statics).
// Two supports s apart, load W at x from the first: R₂ = W·x/s, R₁ = W − R₂ (the lever rule). Standard gravity
// 9.80665 m/s² (CGPM 1901).
const g = 9.80665;

describe('rigid body on its supports', () => {
  it('two supports: the lever rule, and a negative reaction past the end tips it', () => {
    const pts = [
      { x: 20, y: 0, weight: 1 },
      { x: 480, y: 0, weight: 1 },
    ];
    const inside = rigidBodyReactions(pts, 1000, { x: 200, y: 0 });
    expect(inside.reactions[1]).toBeCloseTo((1000 * (200 - 20)) / 460, 9);
    expect(inside.reactions[0]).toBeCloseTo(1000 - (1000 * 180) / 460, 9);
    expect(inside.tips).toBeNull();
    const outside = rigidBodyReactions(pts, 1000, { x: 550, y: 0 });
    expect(outside.reactions[1]).toBeCloseTo((1000 * 530) / 460, 9);
    expect(outside.reactions[0]).toBeLessThan(0);
    expect(outside.tips?.toward).toBe('right');
  });

  it('four corners of a table: a load off centre shares by the lever rule along and across', () => {
    // Corners at (0,0), (1000,0), (0,500), (1000,500), load at (750, 125): along x 3/4 goes to the right pair,
    // across y 1/4 to the back pair; the rigid table on equal supports gives each corner the product of shares
    // minus a twist term that is zero for a rectangle: R = W·(¾·¾, ...).
    const pts = [
      { x: 0, y: 0, weight: 1 },
      { x: 1000, y: 0, weight: 1 },
      { x: 0, y: 500, weight: 1 },
      { x: 1000, y: 500, weight: 1 },
    ];
    const r = rigidBodyReactions(pts, 400, { x: 750, y: 125 }).reactions;
    // Linear distribution R = W/4 + W·ex·dx/Σdx² + W·ey·dy/Σdy²: ex = 250, ey = −125.
    const lin = pts.map((p) => 100 + (400 * 250 * (p.x - 500)) / (4 * 500 * 500) + (400 * -125 * (p.y - 250)) / (4 * 250 * 250));
    r.forEach((v, k) => expect(v).toBeCloseTo(lin[k], 9));
    expect(r.reduce((s, v) => s + v, 0)).toBeCloseTo(400, 9);
    expect(r.reduce((s, v, k) => s + v * pts[k].x, 0)).toBeCloseTo(400 * 750, 6);
  });

  it('three in a line, load over the last: the first lifts off, the last takes it all (no tipping)', () => {
    const pts = [0, 100, 200].map((x) => ({ x, y: 0, weight: 1 }));
    const r = rigidBodyReactions(pts, 300, { x: 200, y: 0 });
    expect(r.tips).toBeNull();
    expect(r.reactions[0]).toBe(0);
    expect(r.reactions[2]).toBeCloseTo(300, 9);
  });

  it('one line of supports: a load off the line tips it across', () => {
    const r = rigidBodyReactions([0, 100].map((x) => ({ x, y: 0, weight: 1 })), 300, { x: 50, y: -10 });
    expect(r.collinear).toBe(true);
    expect(r.tips?.toward).toBe('front');
  });
});

/** A square table: four uprights, two cross-members along y at x = 20 and x = 480 (centres), 40×40. */
function twoBearers(mod: ModuleInput, extra: MemberInput[] = []) {
  return parseFrameDocument({
    schemaVersion: 1,
    settings: { shockFactor: 1, inVehicle: false },
    members: [
      member('U1', 'z', 0, 800, { x: 0, y: 0 }),
      member('U2', 'z', 0, 800, { x: 460, y: 0 }),
      member('U3', 'z', 0, 800, { x: 0, y: 460 }),
      member('U4', 'z', 0, 800, { x: 460, y: 460 }),
      member('C1', 'y', 40, 460, { x: 0, z: 760 }),
      member('C2', 'y', 40, 460, { x: 460, z: 760 }),
      ...extra,
    ],
    modules: [mod],
  });
}

describe('module statics in the report (the worked case of the load review)', () => {
  it('a 40 kg box 1100 mm wide on cross-members at x = 20 and 480, centre at 550: 452 N, −60 N, tips to the right', () => {
    const r = computeReport(twoBearers(module('box', [1100, 400, 300], 40, [0, 50, 800], { name: 'Storage box' })));
    const st = r.loads.statics.find((s) => s.module_id === 'box' && s.case === 'shock');
    const R = (id: string) => st?.reactions.find((x) => x.member_id === id)?.R_N as number;
    // Lever rule: R(C2) = 40 g · (550 − 20) / 460 = 452.0 N; R(C1) = 40 g − R(C2) = −59.7 N.
    expect(R('C2')).toBeCloseTo((40 * g * 530) / 460, 1);
    expect(R('C1')).toBeCloseTo(40 * g - (40 * g * 530) / 460, 1);
    expect(Math.round(R('C2'))).toBe(452);
    expect(Math.round(R('C1'))).toBe(-60);
    expect(st?.tips_toward).toBe('right');
    const tip = r.warnings.find((w) => w.code === 'module-tips');
    expect(tip).toMatchObject({ severity: 'error', module_id: 'box' });
    expect(tip?.message).toMatch(/^“Storage box” tips off toward the right: its centre of gravity is outside its supports \(cross-member B \(at x 20 mm, z 780 mm\), cross-member B \(at x 480 mm, z 780 mm\)\)/);
    expect(tip?.message).not.toMatch(/\(box\)|C1|C2/);
    // The loaded bearer carries the statics' 452 N, not an equal share of 196 N; the pulled one no module load.
    const c2 = r.loads.members.find((m) => m.member_id === 'C2');
    expect((c2?.load_N as number) - (c2?.self_weight_N as number)).toBeGreaterThanOrEqual(R('C2') - 1e-3);
  });

  it('centred, the same box shares equally and does not tip', () => {
    const r = computeReport(twoBearers(module('box', [400, 400, 300], 40, [50, 50, 800])));
    const st = r.loads.statics.find((s) => s.module_id === 'box');
    for (const x of st?.reactions ?? []) expect(x.R_N).toBeCloseTo((40 * g) / 2, 6);
    expect(r.warnings.find((w) => w.code === 'module-tips')).toBeUndefined();
  });

  it('a base module on one member is named in a warning', () => {
    const doc = twoBearers(module('crate', [30, 300, 200], 10, [5, 80, 800], { name: 'Crate' }));
    const r = computeReport(doc);
    expect(r.warnings.find((w) => w.code === 'module-one-member')?.message).toMatch(/^“Crate” stands on one member only \(cross-member B \(at x 20 mm, z 780 mm\)\): .*set it on two or more members$/);
  });

  it('property: the reactions of every module sum to its weight × the case factor, in every load case', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 500, max: 900 }),
        fc.integer({ min: 60, max: 440 }),
        fc.integer({ min: 100, max: 300 }),
        fc.double({ min: 1, max: 60, noNaN: true }),
        (w, d, h, kg) => {
          const doc = twoBearers(module('m', [w, d, h], kg, [250 - w / 2, 250 - d / 2, 800]));
          doc.settings.inVehicle = true;
          doc.settings.shockFactor = 2.5;
          const r = computeReport(doc);
          for (const st of r.loads.statics) {
            const lc = r.loads.cases.find((c) => c.id === st.case);
            const sum = st.reactions.reduce((s, x) => s + x.R_N, 0);
            expect(sum).toBeCloseTo(kg * g * (lc?.vertical_factor as number), 1);
            expect(st.load_N).toBeCloseTo(kg * g * (lc?.vertical_factor as number), 2);
          }
        },
      ),
      { numRuns: 15 },
    );
  }, 120_000);
});

describe('supports as they are', () => {
  // The worst utilisation counts a module that tips or bears on nothing, or a member left unsupported, as unbounded.
  const unbounded = new Set(['module-tips', 'module-unsupported', 'member-unsupported']);
  const worst = (r: ReturnType<typeof computeReport>) => (r.warnings.some((w) => unbounded.has(w.code)) ? Infinity : (r.loads.max_utilisation ?? 0));

  it('removing an upright under a rail never lowers the worst utilisation (fast-check)', () => {
    // Rails F and B of 40×40 over 920 mm, each held up part-way by an upright at x = 480 (their spans halve); a
    // module across both. Take one mid upright away, or both.
    const frame = (mids: ('M1' | 'M2')[], mx: number, mw: number, kg: number) =>
      parseFrameDocument({
        schemaVersion: 1,
        settings: { shockFactor: 1, inVehicle: false },
        members: [
          ...cornerUprights(960, 460),
          member('F', 'x', 40, 960, { y: 0, z: 760 }),
          member('B', 'x', 40, 960, { y: 460, z: 760 }),
          ...mids.map((id) => member(id, 'z', 0, 760, { x: 480, y: id === 'M1' ? 0 : 460 })),
        ],
        modules: [module('tank', [mw, 500, 200], kg, [mx, 0, 800])],
      });
    fc.assert(
      fc.property(fc.integer({ min: 100, max: 900 }), fc.integer({ min: 0, max: 800 }), fc.integer({ min: 5, max: 80 }), fc.integer({ min: 0, max: 2 }), (mw, x0, kg, drop) => {
        const mx = 40 + Math.min(x0, 920 - mw);
        const all = computeReport(frame(['M1', 'M2'], mx, mw, kg));
        const fewer = computeReport(frame(drop === 0 ? ['M2'] : drop === 1 ? ['M1'] : [], mx, mw, kg));
        expect(worst(fewer)).toBeGreaterThanOrEqual(worst(all) - 1e-9);
      }),
      { numRuns: 25 },
    );
  }, 120_000);

  // Three bearers of 20×20 under a module, on 40×80 rails.
  const bearerFrame = (bearers: number[], mx: number, mw: number) =>
    parseFrameDocument({
      schemaVersion: 1,
      settings: { shockFactor: 1, inVehicle: false },
      members: [
        ...cornerUprights(960, 460),
        member('F', 'x', 40, 960, { y: 0, z: 720 }, { profile: '40x80-s8' }),
        member('B', 'x', 40, 960, { y: 460, z: 720 }, { profile: '40x80-s8' }),
        ...bearers.map((x, k) => member(`b${k}`, 'y', 40, 460, { x, z: 780 }, { profile: '20x20-s6' })),
      ],
      modules: [module('tank', [mw, 300, 200], 30, [mx, 100, 800])],
    });

  it('a module on three bearers: each gets the most it takes on any one, two or three of them, so losing one never loads the others more (fast-check)', () => {
    // The reported share with all three covers any stiffness of the bearers, a bearer that sags or is missing
    // included: with one taken away, no remaining bearer carries more than the report gave it before.
    fc.assert(
      fc.property(fc.integer({ min: 560, max: 900 }), fc.integer({ min: -40, max: 40 }), fc.integer({ min: 0, max: 2 }), (mw, shift, drop) => {
        const xs = [200, 460, 720];
        const mx = 480 + shift - mw / 2;
        const all = computeReport(bearerFrame(xs, mx, mw));
        const fewer = computeReport(bearerFrame(xs.filter((_, k) => k !== drop), mx, mw));
        const R = (r: typeof all, id: string) => r.loads.statics.find((st) => st.case === 'shock')?.reactions.find((x) => x.member_id === id)?.R_N ?? 0;
        const kept = [0, 1, 2].filter((k) => k !== drop);
        // Where the two left cannot hold it at all, the report says it tips (an error), whatever the shares.
        if (fewer.warnings.some((w) => w.code === 'module-tips')) return;
        kept.forEach((k, j) => expect(R(fewer, `b${j}`)).toBeLessThanOrEqual(R(all, `b${k}`) + 1e-6));
        // And the module's reactions together are at least its weight (30 kg, g = 9.80665 m/s²).
        const sum = all.loads.statics.find((st) => st.case === 'shock')?.reactions.reduce((s, x) => s + x.R_N, 0) as number;
        expect(sum).toBeGreaterThanOrEqual(30 * g - 1e-6);
      }),
      // 560, 24, 0 once failed the sum: reactions rounded to the nearest 0.001 N added up to 0.0005 N under the weight.
      { numRuns: 15, examples: [[560, 24, 0]] },
    );
  }, 120_000);

  it('a rail held at one end only is a cantilever, and the joint it hangs from is named as not checked', () => {
    const doc = parseFrameDocument({
      schemaVersion: 1,
      settings: { shockFactor: 1, inVehicle: false },
      members: [member('U', 'z', 0, 800, { x: 0, y: 0 }), member('seat', 'x', 40, 520, { y: 0, z: 400 })],
      modules: [module('cushion', [400, 40, 50], 5, [100, 0, 440])],
    });
    const r = computeReport(doc);
    const c = r.loads.members.find((m) => m.member_id === 'seat');
    expect(c?.spans.map((s) => s.support)).toEqual(['cantilever']);
    expect(c?.spans[0].root?.method).toMatch(/corner bracket/i);
    const w = r.warnings.find((x) => x.code === 'cantilever-joint');
    expect(w?.member_id).toBe('seat');
    expect(w?.message).toMatch(/held at one end only: a 480 mm cantilever/);
    expect(w?.message).toMatch(/not checked: add a second support/);
  });

  it('a member touching nothing, and two identical members in one place, are named', () => {
    const doc = parseFrameDocument({
      schemaVersion: 1,
      members: [
        member('U1', 'z', 0, 800, { x: 0, y: 0 }),
        member('R1', 'x', 40, 960, { y: 0, z: 760 }),
        member('R1b', 'x', 40, 960, { y: 0, z: 760 }),
        member('U2', 'z', 0, 800, { x: 960, y: 0 }),
        member('stray', 'x', 0, 300, { y: 2000, z: 0 }, { name: 'Spare rail' }),
      ],
    });
    const r = computeReport(doc);
    expect(r.warnings.find((w) => w.code === 'member-isolated')?.message).toMatch(/^rail [A-Z]+ \(Spare rail\) touches no other member: .*; move it onto the frame or delete it$/);
    expect(r.warnings.find((w) => w.code === 'member-duplicate')?.message).toMatch(/^rail B \(at y 20 mm, z 780 mm\) is drawn twice in the same place/);
    for (const w of r.warnings) expect(w.message).not.toMatch(/\b(R1b?|U1|U2|stray)\b/);
  });
});
