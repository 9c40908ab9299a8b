import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { greedyPack } from '../../../shared/planner/core/greedy';
import { Repacker } from '../../../shared/planner/core/repack';
import { groupSizes, packingErrors } from './helpers';


function firstFitBars(sizes: number[], demand: number[], cap: number): Int32Array[] {
  const sol = greedyPack({ sizes, demand, types: [{ capacity: cap, cost: 1, qty: null }], costUnit: 1 }, demand, [null], 'first');
  const bars: Int32Array[] = [];
  for (const u of sol ?? []) for (let c = 0; c < u.mult; c++) bars.push(u.pattern.counts);
  return bars;
}

/** A move counter as the clock: each call is one tick, so the search stops after a fixed amount of work. */
const ticks = () => {
  let t = 0;
  return () => t++;
};

describe('repacking a few bars at a time', () => {
  it('keeps every part exactly once, no bar over capacity, and never adds a bar', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 5, max: 300 }),
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 60 }),
        fc.integer({ min: 0, max: 2 ** 30 }),
        (cap, fractions, seed) => {
          const { sizes, demand } = groupSizes(fractions.map((f) => 1 + Math.floor(f * (cap - 1))));
          const start = firstFitBars(sizes, demand, cap);
          const r = new Repacker(sizes, cap, seed);
          r.reset(start);
          r.run(0, 40, ticks());
          const bars = r.bars();
          expect(bars.length).toBeLessThanOrEqual(start.length);
          expect(packingErrors(bars, sizes, demand, cap)).toEqual([]);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('removes the bar first fit decreasing adds to an exactly filled list', () => {
    // Worked by hand: capacity 100, four bars' worth of parts that fill each bar exactly as 50+30+20 (sum 400, so the
    // material bound is 4). First fit decreasing puts 50+50, 50+50, 30+30+30, 30+20+20+20, 20: five bars.
    const { sizes, demand } = groupSizes([50, 50, 50, 50, 30, 30, 30, 30, 20, 20, 20, 20]);
    const start = firstFitBars(sizes, demand, 100);
    expect(start).toHaveLength(5);
    const r = new Repacker(sizes, 100);
    r.reset(start);
    expect(r.run(4, 10_000, ticks())).toBe(true);
    expect(r.barCount).toBe(4);
    for (const bar of r.bars()) expect(bar[0] * 50 + bar[1] * 30 + bar[2] * 20).toBe(100);
  });
});
