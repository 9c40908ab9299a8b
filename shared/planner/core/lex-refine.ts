// Least cost, then fewest bars, then least stock length, for jobs on several stock types. All three depend only on
// how many bars of each type a plan uses (its mix), so: list the mixes that would beat the plan in hand (costing no
// less than a known bound), in that order, and test each for a packing by exhaustive search. The first mix that packs
// is optimal for the whole order; when every one is refuted, the plan in hand is. A search that runs out of nodes or
// time proves nothing, and the plan is then not marked optimal. Small jobs (a few dozen parts) usually settle here in
// milliseconds; with the cost proven by other means, only the mixes of that cost are left to try.
import type { PatternUse, Problem } from './problem';

/** Mixes tried at most, and search nodes per mix. */
const MAX_MIXES = 2000;
const MAX_WALK = 200_000;
const NODES_PER_MIX = 200_000;

export interface LexOutcome {
  /** A plan that beats the one in hand, when a mix packs. */
  solution: PatternUse[] | null;
  /** The result (the new plan, or else the one in hand) is proven optimal for cost, bars and length. */
  proven: boolean;
}

export function lexRefine(
  p: Problem,
  lowCost: number,
  current: { cost: number; bars: number; used: number },
  tol: number,
  outOfTime: () => boolean,
): LexOutcome {
  const need = p.sizes.reduce((s, size, i) => s + size * p.demand[i], 0);
  const mixes: { n: number[]; cost: number; bars: number; used: number }[] = [];
  const n = new Array<number>(p.types.length).fill(0);
  let overflow = false;
  let steps = 0;
  // Bars beyond the pieces' count are never needed (a bar holds at least one piece).
  const pieces = p.demand.reduce((s, d) => s + d, 0);
  // Every mix costing from lowCost to the plan's cost, with room for the parts' total, that beats the plan in hand.
  const walk = (t: number, cost: number, bars: number, used: number): void => {
    if (overflow || cost > current.cost + tol) return;
    if (++steps > MAX_WALK) {
      overflow = true;
      return;
    }
    if (t === p.types.length) {
      if (cost < lowCost - tol || used < need) return;
      const better =
        cost < current.cost - tol || (cost <= current.cost + tol && (bars < current.bars || (bars === current.bars && used < current.used)));
      if (better) {
        mixes.push({ n: n.slice(), cost, bars, used });
        if (mixes.length > MAX_MIXES) overflow = true;
      }
      return;
    }
    const type = p.types[t];
    const most = Math.min(pieces - bars, type.qty ?? Infinity);
    for (let c = 0; c <= most && cost + c * type.cost <= current.cost + tol; c++) {
      n[t] = c;
      walk(t + 1, cost + c * type.cost, bars + c, used + c * type.capacity);
    }
    n[t] = 0;
  };
  walk(0, 0, 0, 0);
  if (overflow) return { solution: null, proven: false };
  // Costs within the tolerance count as equal, so that the bar count decides between them.
  mixes.sort((a, b) => (Math.abs(a.cost - b.cost) > tol ? a.cost - b.cost : 0) || a.bars - b.bars || a.used - b.used);
  for (const mix of mixes) {
    if (outOfTime()) return { solution: null, proven: false };
    const r = packInto(p, mix.n, outOfTime);
    if (r === 'unknown') return { solution: null, proven: false };
    if (r !== 'infeasible') return { solution: r, proven: true };
  }
  return { solution: null, proven: true };
}

/**
 * Pack every piece into the bars of a mix (counts per type), largest piece first; bars of one type with the same load
 * are interchangeable, so a piece tries only one of them. Prunes when the pieces left exceed the room that can still
 * hold the smallest of them.
 */
export function packInto(p: Problem, mix: readonly number[], outOfTime: () => boolean): PatternUse[] | 'infeasible' | 'unknown' {
  const items: number[] = [];
  p.demand.forEach((d, i) => {
    for (let c = 0; c < d; c++) items.push(i);
  });
  const binType: number[] = [];
  mix.forEach((k, t) => {
    for (let c = 0; c < k; c++) binType.push(t);
  });
  binType.sort((a, b) => p.types[b].capacity - p.types[a].capacity);
  const room = binType.map((t) => p.types[t].capacity);
  const counts = binType.map(() => new Int32Array(p.sizes.length));
  const tail = new Float64Array(items.length + 1);
  for (let k = items.length - 1; k >= 0; k--) tail[k] = tail[k + 1] + p.sizes[items[k]];
  let nodes = 0;
  let aborted = false;
  const go = (k: number): boolean => {
    if (k === items.length) return true;
    if (++nodes > NODES_PER_MIX || ((nodes & 1023) === 0 && outOfTime())) {
      aborted = true;
      return false;
    }
    const smallest = p.sizes[items[items.length - 1]];
    let usable = 0;
    for (const r of room) if (r >= smallest) usable += r;
    if (usable < tail[k]) return false;
    const size = p.sizes[items[k]];
    const tried = new Set<string>();
    // The same size as the previous piece goes to the same bar or a later one (pieces of one size are interchangeable).
    const from = k > 0 && items[k - 1] === items[k] ? lastBin[k - 1] : 0;
    for (let b = from; b < room.length; b++) {
      if (room[b] < size) continue;
      const key = `${binType[b]}:${room[b]}`;
      if (tried.has(key)) continue;
      tried.add(key);
      room[b] -= size;
      counts[b][items[k]]++;
      lastBin[k] = b;
      if (go(k + 1)) return true;
      room[b] += size;
      counts[b][items[k]]--;
      if (aborted) return false;
    }
    return false;
  };
  const lastBin = new Int32Array(items.length);
  if (go(0)) {
    return binType
      .map((t, b) => ({ pattern: { type: t, counts: counts[b] }, mult: 1 }))
      .filter((u) => u.pattern.counts.some((c) => c > 0));
  }
  return aborted ? 'unknown' : 'infeasible';
}
