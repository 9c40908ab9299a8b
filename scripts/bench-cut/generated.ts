// Generated benchmark jobs, reproducible from a seed. Split lists: bars of 6000 cut into 2–6 random pieces (or exactly
// 3, "triplets"), shuffled, kerf 0, so the optimum is the number of bars by construction (the pieces add up to exactly
// that many bars). Priced jobs: workshop-sized lists (up to 40 parts) on two to four bought stock lengths with prices
// near a common rate per metre, sometimes with offcuts on hand at no cost; their least cost comes from the exact model
// (./reference). Seeds 1–10 (split) and 1–35 (priced) are the ones the planner was tuned on; 101–110 and 101–135 are
// held out and were only run to report.
import type { CutJob } from '../../shared/planner/index';

/** mulberry32: a small, well-known seeded generator (enough for reproducible test data). */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const int = (r: () => number, lo: number, hi: number): number => lo + Math.floor(r() * (hi - lo + 1));

export interface SplitList {
  name: string;
  seed: number;
  family: 'split' | 'triplets';
  bars: number;
  job: CutJob;
}

export const BAR_MM = 6000;

/** `bars` bars of 6000 cut at random points into `lo`–`hi` pieces of at least 1 mm each. */
export function splitList(seed: number, family: 'split' | 'triplets'): SplitList {
  const r = rng(seed * 7919 + (family === 'split' ? 1 : 2));
  const bars = int(r, 20, 100);
  const counts = new Map<number, number>();
  for (let b = 0; b < bars; b++) {
    const k = family === 'split' ? int(r, 2, 6) : 3;
    const cuts = new Set<number>();
    while (cuts.size < k - 1) cuts.add(int(r, 1, BAR_MM - 1));
    const at = [0, ...[...cuts].sort((x, y) => x - y), BAR_MM];
    for (let i = 1; i < at.length; i++) counts.set(at[i] - at[i - 1], (counts.get(at[i] - at[i - 1]) ?? 0) + 1);
  }
  const parts = [...counts].sort((a, b) => b[0] - a[0]).map(([length, qty]) => ({ length, qty, label: String(length) }));
  return { name: `${family}-${seed}`, seed, family, bars, job: { kerf: 0, trim: 0, minOffcut: 0, stock: [{ length: BAR_MM }], parts } };
}

export interface PricedJob {
  name: string;
  seed: number;
  job: CutJob;
}

const STOCK_MM = [6000, 5000, 4000, 3000, 2500];

export function pricedJob(seed: number): PricedJob {
  const r = rng(seed * 104729 + 3);
  const rate = int(r, 8, 16); // per metre
  const kinds = int(r, 2, 4);
  const lengths = STOCK_MM.slice().sort(() => r() - 0.5).slice(0, kinds).sort((a, b) => b - a);
  // Shorter bars cost a little more per metre (common practice, no source), with some noise.
  const stock: CutJob['stock'] = lengths.map((length) => ({
    length,
    price: Math.round((length / 1000) * rate * (1 + (6000 - length) / 20000 + (r() - 0.5) * 0.1)),
  }));
  if (r() < 0.4) {
    const n = int(r, 1, 2);
    for (let k = 0; k < n; k++) stock.push({ length: int(r, 8, 28) * 100 + int(r, 0, 99), price: 0, qty: int(r, 1, 2), label: 'offcut on hand' });
  }
  const longest = Math.max(...lengths);
  const distinct = int(r, 2, 8);
  const target = int(r, 6, 40);
  const parts: NonNullable<CutJob['parts']> = [];
  let total = 0;
  for (let i = 0; i < distinct && total < target; i++) {
    const qty = Math.min(target - total, int(r, 1, 8));
    const length = r() < 0.2 ? int(r, 80, 400) : int(r, 300, Math.min(2900, longest - 10));
    parts.push({ length, qty, label: `P${i + 1}` });
    total += qty;
  }
  return { name: `priced-${seed}`, seed, job: { kerf: 3, trim: r() < 0.5 ? 0 : 10, minOffcut: 200, stock, parts } };
}

export const TUNED_SPLIT = Array.from({ length: 10 }, (_, i) => i + 1);
export const HELD_OUT_SPLIT = Array.from({ length: 10 }, (_, i) => i + 101);
export const TUNED_PRICED = Array.from({ length: 35 }, (_, i) => i + 1);
export const HELD_OUT_PRICED = Array.from({ length: 35 }, (_, i) => i + 101);
