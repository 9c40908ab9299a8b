import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { coveringCost } from '../../../shared/planner/core/covering-bound';
import { planCutsSync } from '../../../shared/planner/index';

/** Every combination of bar counts (small cases only), independent of the search under test. */
function bruteForce(types: { capacity: number; cost: number; qty: number | null }[], need: number): number {
  let best = Infinity;
  const rec = (k: number, left: number, cost: number): void => {
    if (left <= 0) {
      best = Math.min(best, cost);
      return;
    }
    if (k === types.length) return;
    const max = Math.min(types[k].qty ?? Infinity, Math.ceil(left / types[k].capacity));
    for (let c = 0; c <= max; c++) rec(k + 1, left - c * types[k].capacity, cost + c * types[k].cost);
  };
  rec(0, need, 0);
  return best;
}

describe('the whole-bar cost bound', () => {
  it('is the least cost of whole bars that cover the total (against every combination)', () => {
    const stock = fc.record({
      capacity: fc.integer({ min: 500, max: 6000 }),
      cost: fc.integer({ min: 0, max: 60 }),
      qty: fc.option(fc.integer({ min: 0, max: 6 }), { nil: null }),
    });
    fc.assert(
      fc.property(fc.array(stock, { minLength: 1, maxLength: 3 }), fc.integer({ min: 1, max: 30_000 }), (types, need) => {
        expect(coveringCost(types, need)).toBe(bruteForce(types, need));
      }),
      { numRuns: 300, seed: 11 },
    );
  });

  it('proves a small priced job optimal where the per-millimetre bound cannot', () => {
    // Worked by hand: seven parts of 1000 mm, no kerf or trim; bars of 6000 mm at 42 and 3000 mm at 24. The cheapest
    // rate per millimetre gives 7000 × 42 / 6000 = 49, but whole bars covering 7000 mm cost at least 66 (6000 + 3000;
    // two long bars cost 84, three short 72), and 6 + 1 parts on those two bars is a plan at 66.
    expect(coveringCost([{ capacity: 6000, cost: 42, qty: null }, { capacity: 3000, cost: 24, qty: null }], 7000)).toBe(66);
    const plan = planCutsSync({
      kerf: 0,
      trim: 0,
      minOffcut: 0,
      stock: [{ length: 6000, price: 42 }, { length: 3000, price: 24 }],
      parts: [{ length: 1000, qty: 7, label: 'A' }],
    });
    expect(plan.cost).toBe(66);
    expect(plan.optimal).toBe(true);
  });
});
