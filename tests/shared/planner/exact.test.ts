import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planCutsSync } from '../../../shared/planner';
import { exactBars } from './helpers';

describe('planCuts bar count on small jobs', () => {
  it('equals the exact optimum found by exhaustive search', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 600, max: 3000 }),
        fc.integer({ min: 0, max: 4 }),
        fc.array(fc.integer({ min: 50, max: 1500 }), { minLength: 1, maxLength: 10 }),
        (bar, kerf, lengths) => {
          const parts = lengths.filter((l) => l <= bar).map((length, i) => ({ length, qty: 1, label: `P${i}` }));
          fc.pre(parts.length > 0);
          const plan = planCutsSync({ kerf, trim: 0, minOffcut: 0, stock: [{ length: bar }], parts }, { timeLimitMs: 300 });
          const exact = exactBars(
            parts.map((p) => p.length),
            bar,
            kerf,
          );
          expect(plan.barCount).toBe(exact);
          expect(plan.lowerBound).toBeLessThanOrEqual(exact);
          if (plan.optimal) expect(plan.lowerBound).toBe(exact);
        },
      ),
      { numRuns: 80, seed: 7 },
    );
  });
});
