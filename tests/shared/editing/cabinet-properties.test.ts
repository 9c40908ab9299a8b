import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addBay, removeBay } from '@shared/editing/bays';
import { trySwapModules } from '@shared/editing/swap';
import { computeReport } from '@shared/engine/report';
import { buildCabinetRun, type CabinetModule, type CabinetSpec } from '@shared/model/cabinet-run';
import { MODULE_KINDS } from '@shared/model/module';
import { parseFrameDocument } from '@shared/model/parse';

let serial = 0;
/** A module a real cabinet could hold: round sizes from a shelf to an upright fridge. */
const moduleArb = (bearing: fc.Arbitrary<CabinetModule['bearing']>) =>
  fc.record({
    kind: fc.constantFrom(...MODULE_KINDS.filter((k) => k !== 'tank')),
    bearing,
    w: fc.integer({ min: 120, max: 600 }),
    d: fc.integer({ min: 200, max: 450 }),
    h: fc.integer({ min: 20, max: 300 }),
    mass: fc.integer({ min: 0, max: 40 }),
  });

const bayArb = fc.oneof(
  fc.record({ open: fc.constant(true as const), width: fc.integer({ min: 80, max: 800 }) }),
  fc.record({
    open: fc.constant(false as const),
    bottom: moduleArb(fc.constantFrom('base' as const, 'side-rails' as const, 'hung' as const)),
    above: fc.array(moduleArb(fc.constantFrom('base' as const, 'side-rails' as const)), { maxLength: 2 }),
    clearance: fc.option(fc.integer({ min: 0, max: 25 }), { nil: undefined }),
  }),
);

const specArb = fc.record({
  profile: fc.constantFrom('30x30-s8', '40x40-s8'),
  depth: fc.integer({ min: 520, max: 800 }),
  height: fc.integer({ min: 700, max: 1500 }),
  seat: fc.integer({ min: 40, max: 250 }),
  clearance: fc.integer({ min: 0, max: 25 }),
  bays: fc.array(bayArb, { minLength: 1, maxLength: 5 }),
});

type Drawn = typeof specArb extends fc.Arbitrary<infer T> ? T : never;

function toSpec(s: Drawn): CabinetSpec {
  const mod = (m: { kind: CabinetModule['kind']; bearing: CabinetModule['bearing']; w: number; d: number; h: number; mass: number }): CabinetModule => {
    serial += 1;
    return { id: `m${serial}`, name: `Module ${serial}`, kind: m.kind, bearing: m.bearing, size: { w_mm: m.w, d_mm: m.d, h_mm: m.h }, mass_kg: m.mass };
  };
  return {
    name: 'Drawn',
    profile: s.profile,
    depth_mm: s.depth,
    height_mm: s.height,
    seat_mm: s.seat,
    clearance_mm: s.clearance,
    bays: s.bays.map((b, i) =>
      b.open ? { id: `b${i}`, width_mm: b.width } : { id: `b${i}`, module: mod(b.bottom), stack: b.above.map(mod), ...(b.clearance !== undefined ? { clearance_mm: b.clearance } : {}) },
    ),
  };
}

const moduleBays = (spec: CabinetSpec) => spec.bays.filter((b) => b.module).map((b) => b.module!.id);

describe('cabinet layouts (fast-check)', () => {
  it('every module of a layout bears on something: each one has the members that carry it', () => {
    fc.assert(
      fc.property(specArb, (s) => {
        const r = computeReport(parseFrameDocument(buildCabinetRun(toSpec(s))));
        for (const m of r.modules) expect(m.bears_on.length, `${m.id} (${m.bearing})`).toBeGreaterThan(0);
        expect(r.warnings.filter((w) => w.code === 'module-unsupported')).toEqual([]);
      }),
      { numRuns: 60 },
    );
  });

  it('swapping two modules twice gives the document back', () => {
    fc.assert(
      fc.property(specArb, fc.nat(), fc.nat(), (s, i, j) => {
        const spec = toSpec(s);
        const ids = moduleBays(spec);
        fc.pre(ids.length >= 2);
        const a = ids[i % ids.length];
        const b = ids[j % ids.length];
        fc.pre(a !== b);
        const doc = buildCabinetRun(spec);
        const once = trySwapModules(doc, a, b);
        expect(once.ok).toBe(true);
        if (!once.ok) return;
        const twice = trySwapModules(once.doc, a, b);
        expect(twice.ok && twice.doc).toEqual(doc);
      }),
      { numRuns: 60 },
    );
  });

  it('adding a bay anywhere and removing it again gives the document back; while added, every module still bears', () => {
    fc.assert(
      fc.property(specArb, fc.nat(), fc.boolean(), (s, k, before) => {
        const doc = buildCabinetRun(toSpec(s));
        const run = doc.runs[0];
        const ref = run.bays[k % run.bays.length].id;
        const added = addBay(doc, run.id, before ? { before: ref } : { after: ref });
        if (!added.ok) throw new Error(added.reason);
        const r = computeReport(parseFrameDocument(added.doc));
        for (const m of r.modules) expect(m.bears_on.length).toBeGreaterThan(0);
        const removed = removeBay(added.doc, added.bayId);
        expect(removed.ok && removed.doc).toEqual(doc);
      }),
      { numRuns: 40 },
    );
  });
});
