import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { computeReport } from '@shared/engine/report';
import type { FrameDocument } from '@shared/model/frame-document';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { parseFrameDocument } from '@shared/model/parse';
import { member } from './frames';
import { resizeModule, swapBays } from './relay-helpers';

const base = demoFrameDocument();
const moduleIds = base.modules.map((m) => m.id);

/** A sequence of swaps and resizes within sizes a real module could have. */
const edits = fc.array(
  fc.oneof(
    fc.record({ kind: fc.constant('swap' as const), i: fc.integer({ min: 0, max: 3 }), j: fc.integer({ min: 0, max: 3 }) }),
    fc.record({
      kind: fc.constant('resize' as const),
      module: fc.constantFrom(...moduleIds),
      w: fc.integer({ min: 100, max: 700 }),
      d: fc.integer({ min: 200, max: 440 }),
    }),
  ),
  { maxLength: 6 },
);

type Edit = { kind: 'swap'; i: number; j: number } | { kind: 'resize'; module: string; w: number; d: number };

function apply(doc: FrameDocument, list: readonly Edit[]): FrameDocument {
  return list.reduce((d, e) => (e.kind === 'swap' ? swapBays(d, 'galley', e.i, e.j) : resizeModule(d, e.module, { w_mm: e.w, d_mm: e.d })), doc);
}

const STRUCTURAL = new Set(['corner-bracket', 'end-connector', 'gusset']);

describe('report properties (fast-check)', () => {
  it('after any swaps and resizes no member has zero or negative length, and every joint has hardware', () => {
    fc.assert(
      fc.property(edits, (list) => {
        const r = computeReport(apply(base, list));
        for (const m of r.members) {
          expect(m.length_mm).toBeGreaterThan(0);
          expect(m.cut_length_mm).toBeGreaterThan(0);
        }
        // Each joint uses a method with parts; each bracket, plate or connector line adds up to one per joint.
        for (const j of r.joints) expect(STRUCTURAL.has(j.method)).toBe(true);
        const joinParts = r.hardware.lines.filter((l) => ['bracket', 'plate', 'connector'].includes(l.kind)).reduce((n, l) => n + l.count, 0);
        expect(joinParts).toBe(r.joints.length);
        // Every end is accounted for: it butts into a joint, or is open with a treatment.
        for (const m of r.members) for (const e of [m.ends.start, m.ends.end]) expect(e.role === 'butts' ? e.joint_id : e.method).toBeTruthy();
      }),
      { numRuns: 40 },
    );
  }, 120_000);

  it('mass is additive: frame + hardware + modules = total, and the frame is the sum of its members', () => {
    fc.assert(
      fc.property(edits, (list) => {
        const r = computeReport(apply(base, list));
        expect(r.mass.frame_kg + r.mass.hardware_kg + r.mass.modules_kg).toBeCloseTo(r.mass.total_kg, 4);
        // Each member's mass is printed to 0.01 g, so 44 of them may add up to a few hundredths of a gram off.
        expect(r.members.reduce((s, m) => s + m.mass_kg, 0)).toBeCloseTo(r.mass.frame_kg, 3);
        // Modules: the demo's masses, with the 30 L tank full at 1 kg/L: 12 + 32 + 33 + 12 = 89 kg.
        expect(r.mass.modules_kg).toBeCloseTo(89, 9);
      }),
      { numRuns: 25 },
    );
  }, 120_000);

  it('adding a free-standing member adds its length × mass per metre, and two end caps', () => {
    const s = sectionOf(resolveProfile('30x30-s8'));
    fc.assert(
      fc.property(fc.integer({ min: 50, max: 3000 }), (len) => {
        const before = computeReport(base);
        const doc = parseFrameDocument({ ...base, members: [...base.members, member('extra', 'x', 5000, 5000 + len, { y: 0, z: 0 }, { profile: '30x30-s8' })] });
        const after = computeReport(doc);
        // Area × 2700 kg/m³ (aluminium, REFERENCES.md): mass per metre from the section.
        expect(after.mass.frame_kg - before.mass.frame_kg).toBeCloseTo((len / 1000) * s.area_mm2 * 1e-6 * 2700, 4);
        const caps = (r: typeof before) => r.hardware.lines.filter((l) => l.kind === 'end-cap').reduce((n, l) => n + l.count, 0);
        expect(caps(after) - caps(before)).toBe(2);
        expect(after.mass.total_kg - before.mass.total_kg).toBeCloseTo(after.mass.frame_kg - before.mass.frame_kg + after.mass.hardware_kg - before.mass.hardware_kg, 4);
      }),
      { numRuns: 15 },
    );
  }, 120_000);

  it('is deterministic, and a swap undone gives the same report', () => {
    fc.assert(
      fc.property(edits, fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 3 }), (list, i, j) => {
        const doc = apply(base, list);
        const r = computeReport(doc);
        expect(computeReport(structuredClone(doc))).toEqual(r);
        expect(computeReport(swapBays(swapBays(doc, 'galley', i, j), 'galley', i, j))).toEqual(r);
      }),
      { numRuns: 20 },
    );
  }, 120_000);
});
