import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { packIntoBars } from '../../../shared/planner/core/bin-completion';
import { groupSizes, packingErrors } from './helpers';


/** Fewest bars by trying every assignment of parts to bars (independent of the code under test). */
function bruteForceBars(items: number[], cap: number): number {
  const sorted = items.slice().sort((a, b) => b - a);
  for (let k = 1; k <= sorted.length; k++) {
    const loads = new Array<number>(k).fill(0);
    const place = (i: number): boolean => {
      if (i === sorted.length) return true;
      for (let b = 0; b < k; b++) {
        if (loads[b] + sorted[i] > cap) continue;
        loads[b] += sorted[i];
        if (place(i + 1)) return true;
        loads[b] -= sorted[i];
        if (loads[b] === 0) break; // the other empty bars are the same
      }
      return false;
    };
    if (place(0)) return k;
  }
  return sorted.length;
}

describe('packing into a given number of bars by bin completion', () => {
  it('finds a packing exactly when one exists (small lists, against a brute-force check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 4, max: 40 }),
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 9 }),
        (cap, fractions) => {
          const items = fractions.map((f) => 1 + Math.floor(f * (cap - 1)));
          const { sizes, demand } = groupSizes(items);
          const best = bruteForceBars(items, cap);
          const packed = packIntoBars(sizes, demand, cap, best, 1e7);
          expect(packed).not.toBeNull();
          expect(packed!.length).toBeLessThanOrEqual(best);
          expect(packingErrors(packed!, sizes, demand, cap)).toEqual([]);
          if (best > 1) expect(packIntoBars(sizes, demand, cap, best - 1, 1e7)).toBeNull();
        },
      ),
      { numRuns: 300 },
    );
  });

  it('splits an exactly filled list into its bars', () => {
    // Worked by hand: capacity 1000, parts 495+270+235, 480+290+230, 460+300+240: three bars filled to the millimetre.
    const { sizes, demand } = groupSizes([495, 270, 235, 480, 290, 230, 460, 300, 240]);
    const bars = packIntoBars(sizes, demand, 1000, 3, 10_000);
    expect(bars).toHaveLength(3);
    for (const bar of bars!) expect(bar.reduce((s, c, i) => s + c * sizes[i], 0)).toBe(1000);
  });
});
