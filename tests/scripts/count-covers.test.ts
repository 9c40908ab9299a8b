import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { countCovers } from '../../scripts/bench-cut/count-covers';

// The benchmark's cover count against a brute force written apart from it: every way of grouping the pieces into bars
// of at most three pieces that add up to the bar, as multisets (equal lengths are interchangeable), collected in a set.
function bruteForce(pieces: number[], cap: number): number {
  const found = new Set<string>();
  const walk = (left: number[], bars: number[][]): void => {
    if (left.length === 0) {
      found.add(bars.map((b) => b.slice().sort((x, y) => x - y).join('+')).sort().join(' | '));
      return;
    }
    const [first, ...rest] = left;
    const tryBar = (bar: number[], from: number, others: number[]): void => {
      const sum = bar.reduce((a, b) => a + b, 0);
      if (sum === cap) walk(others, [...bars, bar]);
      if (bar.length === 3 || sum >= cap) return;
      for (let k = from; k < others.length; k++) tryBar([...bar, others[k]], k, [...others.slice(0, k), ...others.slice(k + 1)]);
    };
    tryBar([first], 0, rest);
  };
  walk(pieces.slice().sort((a, b) => b - a), []);
  return found.size;
}

function asCounts(pieces: number[]): { sizes: number[]; demand: number[] } {
  const m = new Map<number, number>();
  for (const p of pieces) m.set(p, (m.get(p) ?? 0) + 1);
  const sizes = [...m.keys()].sort((a, b) => b - a);
  return { sizes, demand: sizes.map((s) => m.get(s)!) };
}

describe('cover count of the three-part benchmark lists', () => {
  it('finds the one way back on a hand-made list, and two where two exist', () => {
    // 5+1, 4+2, 3+3 on bars of 6: the only grouping (the 5 needs the 1, then the 4 needs the 2).
    const one = asCounts([5, 4, 3, 3, 2, 1]);
    expect(countCovers(one.sizes, one.demand, 6, 1000)).toMatchObject({ covers: 1, complete: true });
    // 4+1+1 | 3+3 | 2+2+2 or 4+2 | 3+2+1 | 3+2+1: two groupings (3+3 with 2+2+1+1 needs a four-part bar, not counted).
    const two = asCounts([4, 3, 3, 2, 2, 2, 1, 1]);
    expect(countCovers(two.sizes, two.demand, 6, 1000)).toMatchObject({ covers: bruteForce([4, 3, 3, 2, 2, 2, 1, 1], 6), complete: true });
    expect(bruteForce([4, 3, 3, 2, 2, 2, 1, 1], 6)).toBe(2);
  });

  it('says when its budget ran out', () => {
    const l = asCounts([5, 4, 3, 3, 2, 1]);
    expect(countCovers(l.sizes, l.demand, 6, 1).complete).toBe(false);
  });

  it('agrees with the brute force on small lists cut from whole bars', () => {
    // Bars of 12 cut into two or three pieces: short lengths, so equal pieces and several groupings are common.
    const bar = fc.oneof(
      fc.integer({ min: 1, max: 11 }).map((a) => [a, 12 - a]),
      fc.tuple(fc.integer({ min: 1, max: 10 }), fc.integer({ min: 1, max: 10 })).filter(([a, b]) => a + b < 12).map(([a, b]) => [a, b, 12 - a - b]),
    );
    fc.assert(
      fc.property(fc.array(bar, { minLength: 1, maxLength: 3 }), (bars) => {
        const pieces = bars.flat();
        const { sizes, demand } = asCounts(pieces);
        const c = countCovers(sizes, demand, 12, 100_000);
        expect(c.complete).toBe(true);
        expect(c.covers).toBe(bruteForce(pieces, 12));
        expect(c.covers).toBeGreaterThanOrEqual(1);
      }),
      { numRuns: 200 },
    );
  });
});
