import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planCutsSync, type CutJob } from '../../../shared/planner';
import { checkPlan } from './helpers';

const jobArb: fc.Arbitrary<CutJob> = fc
  .record({
    kerf: fc.integer({ min: 0, max: 5 }),
    trim: fc.integer({ min: 0, max: 20 }),
    minOffcut: fc.integer({ min: 0, max: 300 }),
    main: fc.record({ length: fc.integer({ min: 1500, max: 6000 }), price: fc.option(fc.integer({ min: 5, max: 60 }), { nil: undefined }) }),
    extra: fc.array(
      fc.record({
        length: fc.integer({ min: 300, max: 6000 }),
        price: fc.option(fc.integer({ min: 0, max: 60 }), { nil: undefined }),
        qty: fc.option(fc.integer({ min: 0, max: 3 }), { nil: null }),
      }),
      { maxLength: 2 },
    ),
    parts: fc.array(fc.record({ length: fc.integer({ min: 10, max: 1400 }), qty: fc.integer({ min: 1, max: 6 }) }), {
      minLength: 1,
      maxLength: 6,
    }),
  })
  .map((r) => ({
    kerf: r.kerf,
    trim: r.trim,
    minOffcut: r.minOffcut,
    // Prices on every line or on none: a line without a price beside priced ones is refused (strict input).
    stock: [{ length: r.main.length, price: r.main.price, qty: null }, ...r.extra].map((s) =>
      r.main.price === undefined ? { ...s, price: undefined } : { ...s, price: s.price ?? 0 },
    ),
    parts: r.parts.map((p, i) => ({ ...p, label: String.fromCharCode(65 + i) })),
  }));

describe('planCuts feasibility', () => {
  it('cuts every part exactly once, never over-fills a bar and reports offcuts by the kerf convention', () => {
    fc.assert(
      fc.property(jobArb, (job) => {
        const plan = planCutsSync(job, { timeLimitMs: 30 });
        expect(checkPlan(job, plan)).toEqual([]);
      }),
      { numRuns: 60, seed: 20261201 },
    );
  });
});
