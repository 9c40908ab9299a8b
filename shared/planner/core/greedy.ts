// Greedy packings for an instant answer: first fit decreasing and best fit decreasing (Johnson 1973; FFD uses at
// most 11/9·OPT + 6/9 bars, Dósa 2007). With several stock types, each new bar takes a type by a simple rule and a
// final pass moves every bar to the cheapest type that still holds it.
import type { Pattern, PatternUse, Problem } from './problem';

export type FitRule = 'first' | 'best';
/** How a new bar chooses its stock type: the largest available, or stock on hand (limited) first. */
export type OpenRule = 'largest' | 'on-hand-first';

interface OpenBar {
  type: number;
  room: number;
  counts: Int32Array;
}

export function greedyPack(
  p: Problem,
  demand: ArrayLike<number>,
  qtyLeft: ArrayLike<number | null>,
  fit: FitRule,
  open: OpenRule = 'largest',
): PatternUse[] | null {
  const n = p.sizes.length;
  const left = Array.from(qtyLeft, (q) => (q === null ? Infinity : q));
  const bars: OpenBar[] = [];
  const order = p.types.map((_, t) => t).filter((t) => p.types[t].capacity > 0);
  order.sort((a, b) => {
    if (open === 'on-hand-first') {
      const la = p.types[a].qty !== null ? 0 : 1;
      const lb = p.types[b].qty !== null ? 0 : 1;
      if (la !== lb) return la - lb;
    }
    return p.types[b].capacity - p.types[a].capacity;
  });
  for (let i = 0; i < n; i++) {
    const w = p.sizes[i];
    for (let c = 0; c < demand[i]; c++) {
      let target = -1;
      if (fit === 'first') {
        for (let b = 0; b < bars.length; b++) {
          if (bars[b].room >= w) {
            target = b;
            break;
          }
        }
      } else {
        let bestRoom = Infinity;
        for (let b = 0; b < bars.length; b++) {
          const r = bars[b].room;
          if (r >= w && r < bestRoom) {
            bestRoom = r;
            target = b;
          }
        }
      }
      if (target < 0) {
        const t = order.find((tt) => left[tt] > 0 && p.types[tt].capacity >= w);
        if (t === undefined) return null;
        left[t]--;
        bars.push({ type: t, room: p.types[t].capacity, counts: new Int32Array(n) });
        target = bars.length - 1;
      }
      bars[target].room -= w;
      bars[target].counts[i]++;
    }
  }
  if (p.types.length > 1) downsize(p, bars, left);
  return bars.map((b) => ({ pattern: { type: b.type, counts: b.counts }, mult: 1 }));
}

/** Move each bar, fullest first, to the cheapest (then shortest) type that holds its load and is still available. */
function downsize(p: Problem, bars: OpenBar[], left: number[]): void {
  const loads = bars.map((b) => p.types[b.type].capacity - b.room);
  const order = bars.map((_, i) => i).sort((a, b) => loads[b] - loads[a]);
  for (const bi of order) {
    const bar = bars[bi];
    left[bar.type]++;
    let best = bar.type;
    for (let t = 0; t < p.types.length; t++) {
      const tt = p.types[t];
      if (left[t] <= 0 || tt.capacity < loads[bi]) continue;
      const bt = p.types[best];
      if (tt.cost < bt.cost || (tt.cost === bt.cost && tt.capacity < bt.capacity)) best = t;
    }
    left[best]--;
    bar.room = p.types[best].capacity - loads[bi];
    bar.type = best;
  }
}

/** Merge identical bars into patterns with multiplicities. */
export function compress(sol: readonly PatternUse[]): PatternUse[] {
  const map = new Map<string, PatternUse>();
  for (const u of sol) {
    const key = patternKey(u.pattern);
    const got = map.get(key);
    if (got) got.mult += u.mult;
    else map.set(key, { pattern: u.pattern, mult: u.mult });
  }
  return [...map.values()];
}

export function patternKey(pt: Pattern): string {
  let s = `${pt.type}|`;
  const c = pt.counts;
  for (let i = 0; i < c.length; i++) if (c[i]) s += `${i}:${c[i]},`;
  return s;
}
