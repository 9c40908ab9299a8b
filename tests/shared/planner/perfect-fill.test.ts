// Perfect packing of lists cut from whole bars: every bar the search returns is filled exactly and the parts are
// placed once each. The lists come from cutting bars at random points, so a perfect packing exists by construction;
// small lists with none are checked by hand.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { coverSearch } from '../../../shared/planner/core/cover-search';
import { exactFillSets } from '../../../shared/planner/core/exact-cover';
import { perfectFill, perfectPack } from '../../../shared/planner/core/perfect-fill';
import { planCutsSync } from '../../../shared/planner';
import { splitList } from '../../../scripts/bench-cut/generated';

const CAP = 6000;
const never = (): boolean => false;

function expectPerfect(bars: Int32Array[] | null, sizes: number[], demand: number[], cap: number): void {
  expect(bars).not.toBeNull();
  const placed = new Array<number>(sizes.length).fill(0);
  for (const bar of bars!) {
    let load = 0;
    bar.forEach((c, i) => {
      load += c * sizes[i];
      placed[i] += c;
    });
    expect(load).toBe(cap);
  }
  expect(placed).toEqual(demand);
}

const lengths = (seed: number, family: 'split' | 'triplets') => {
  const l = splitList(seed, family);
  return { bars: l.bars, sizes: l.job.parts!.map((p) => p.length), demand: l.job.parts!.map((p) => p.qty) };
};

describe('perfect packing', () => {
  it('fills every bar exactly on lists of 2–6 random pieces per bar', () => {
    for (const seed of [201, 202, 203]) {
      const { bars, sizes, demand } = lengths(seed, 'split');
      const out = perfectPack(sizes, demand, CAP, { fillNodes: 20 * bars, coverWork: 50_000, outOfTime: never });
      expectPerfect(out, sizes, demand, CAP);
      expect(out!.length).toBe(bars);
    }
  });

  it('finds the exact cover of three-part bars on triplet lists', () => {
    // Seed 2 (79 bars, 429 subsets) is one whose cover plain Algorithm X missed within 200,000 nodes.
    for (const seed of [2, 3, 10]) {
      const { sizes, demand } = lengths(seed, 'triplets');
      const sets = exactFillSets(sizes, demand, CAP, 3);
      expect(sets).not.toBeNull();
      expectPerfect(coverSearch(sizes, demand, sets!, { workLimit: 200_000, outOfTime: never }), sizes, demand, CAP);
    }
  });

  it('reports no packing where none exists (by hand: 5 + 4 + 3 in bars of 6 has no exact fill for the 5)', () => {
    expect(perfectPack([5, 4, 3], [1, 1, 1], 6, { fillNodes: 100, coverWork: 100, outOfTime: never })).toBeNull();
    // By hand: 4 + 2 and 3 + 3 fill two bars of 6 exactly.
    expectPerfect(perfectPack([4, 3, 2], [1, 2, 1], 6, { fillNodes: 100, coverWork: 100, outOfTime: never }), [4, 3, 2], [1, 2, 1], 6);
    // A total that is no whole number of bars has no perfect packing.
    expect(perfectFill([4, 3], [1, 1], 6, { nodeLimit: 10, restartNodes: 10, outOfTime: never })).toBeNull();
  });

  /** Bars of CAP cut at the given points, kerf 0: their pieces fill exactly that many bars, which is the optimum. */
  const jobFromCuts = (cutsPerBar: number[][]) => {
    const counts = new Map<number, number>();
    for (const cuts of cutsPerBar) {
      const at = [0, ...[...cuts].sort((a, b) => a - b), CAP];
      for (let k = 1; k < at.length; k++) counts.set(at[k] - at[k - 1], (counts.get(at[k] - at[k - 1]) ?? 0) + 1);
    }
    return { kerf: 0, trim: 0, minOffcut: 0, stock: [{ length: CAP }], parts: [...counts].map(([length, qty]) => ({ length, qty, label: `${length}` })) };
  };

  it('plans random whole-bar cuts at the bar count they were cut from, and a longer limit never does worse', () => {
    const arb = fc.array(fc.uniqueArray(fc.integer({ min: 1, max: CAP - 1 }), { minLength: 1, maxLength: 5 }), { minLength: 2, maxLength: 15 });
    fc.assert(
      fc.property(arb, fc.integer({ min: 1, max: 40 }), (cutsPerBar, short) => {
        const job = jobFromCuts(cutsPerBar);
        let t = 0;
        const a = planCutsSync(job, { timeLimitMs: short, clock: () => (t += 0.05) });
        let u = 0;
        const b = planCutsSync(job, { timeLimitMs: short + 200, clock: () => (u += 0.05) });
        expect(b.barCount).toBeLessThanOrEqual(a.barCount);
        expect(b.barCount).toBe(cutsPerBar.length);
      }),
      { numRuns: 12, seed: 44 },
    );
  }, 120_000);

  it('plans lists of bars cut into three random parts, up to 100 bars, at the bar count they were cut from', () => {
    // Three parts to a bar, kerf 0: the parts fill exactly the bars they came from, so that count is the optimum.
    const bar = fc.uniqueArray(fc.integer({ min: 1, max: CAP - 1 }), { minLength: 2, maxLength: 2 });
    fc.assert(
      fc.property(fc.array(bar, { minLength: 20, maxLength: 100, size: 'max' }), (cutsPerBar) => {
        const job = jobFromCuts(cutsPerBar);
        let t = 0;
        const plan = planCutsSync(job, { timeLimitMs: 2000, clock: () => (t += 0.05) });
        expect(plan.barCount).toBe(cutsPerBar.length);
      }),
      { numRuns: 10, seed: 15 },
    );
  }, 240_000);
});
