import fc from 'fast-check';
import type { CabinetModule, CabinetSpec } from '@shared/model/cabinet-run';
import { MODULE_KINDS } from '@shared/model/module';

// Cabinet layouts a builder could draw, for property tests: one to five bays, open or holding a module with up to
// two more stacked above it.

let serial = 0;
/** A module a real cabinet could hold: round sizes from a shelf to an upright fridge. */
export const moduleArb = (bearing: fc.Arbitrary<CabinetModule['bearing']>) =>
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

export const specArb = fc.record({
  profile: fc.constantFrom('30x30-s8', '40x40-s8'),
  depth: fc.integer({ min: 520, max: 800 }),
  height: fc.integer({ min: 700, max: 1500 }),
  seat: fc.integer({ min: 40, max: 250 }),
  clearance: fc.integer({ min: 0, max: 25 }),
  bays: fc.array(bayArb, { minLength: 1, maxLength: 5 }),
});

export type Drawn = typeof specArb extends fc.Arbitrary<infer T> ? T : never;

export function toSpec(s: Drawn): CabinetSpec {
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

