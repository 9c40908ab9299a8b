// From millimetres to the integer core: every length is scaled by the smallest power of ten (up to 1000, i.e. µm)
// that makes it whole, and the kerf is folded in (part → l + kerf, bar → L − trim + kerf). Where a length has finer
// digits, parts round up and bars round down, so a plan from the core always fits the real bars.
import type { Problem, StockType } from './core/problem';
import type { ValidCutJob } from './job';

export interface PreparedJob {
  job: ValidCutJob;
  problem: Problem;
  scale: number;
  /** Per core item: the part lines (length in mm, label, pieces) it stands for; never one entry per piece. */
  pieces: { length: number; label: string; qty: number }[][];
  /** Core stock type → index in job.stock. */
  stockIndex: number[];
  /** The objective is cost (some stock has a price) rather than bar count. */
  byCost: boolean;
  /**
   * Price of the one stock type when there is only one: its cost is price × bars, so the core solves the bar count
   * (the same search as an unpriced job) and the plan reports the cost. Null otherwise.
   */
  unitPrice: number | null;
}

function decimals(v: number): number {
  for (let d = 0; d <= 3; d++) {
    const s = v * 10 ** d;
    if (Math.abs(s - Math.round(s)) < 1e-9 * Math.max(1, Math.abs(s))) return d;
  }
  return 3;
}

export function prepareJob(job: ValidCutJob): PreparedJob {
  const all = [job.kerf, job.trim, ...job.stock.map((s) => s.length), ...job.parts.map((p) => p.length)];
  const scale = 10 ** Math.max(0, ...all.map(decimals));
  const up = (v: number): number => Math.ceil(v * scale - 1e-7);
  const down = (v: number): number => Math.floor(v * scale + 1e-7);
  const kerf = up(job.kerf);

  const byLength = new Map<number, { length: number; label: string; qty: number }[]>();
  for (const p of job.parts) {
    if (p.qty === 0) continue;
    const key = up(p.length);
    const list = byLength.get(key) ?? [];
    list.push({ length: p.length, label: p.label, qty: p.qty });
    byLength.set(key, list);
  }
  const keys = [...byLength.keys()].sort((a, b) => b - a);
  const sizes = keys.map((k) => k + kerf);
  const demand = keys.map((k) => byLength.get(k)!.reduce((s, x) => s + x.qty, 0));
  const pieces = keys.map((k) => byLength.get(k)!);

  const byCost = job.stock.some((s) => (s.price ?? 0) > 0);
  const available = job.stock.filter((s) => s.qty !== 0);
  const unitPrice = byCost && available.length === 1 ? (available[0].price ?? 0) : null;
  const costed = byCost && unitPrice === null;
  const stockIndex: number[] = [];
  const types: StockType[] = [];
  job.stock.forEach((s, i) => {
    if (s.qty === 0) return;
    stockIndex.push(i);
    types.push({
      capacity: down(s.length) - up(job.trim) + kerf,
      cost: costed ? (s.price ?? 0) : 1,
      qty: s.qty ?? null,
    });
  });
  return {
    job,
    problem: { sizes, demand, types, costUnit: costed ? priceUnit(job.stock.map((s) => s.price ?? 0)) : 1 },
    scale,
    pieces,
    stockIndex,
    byCost,
    unitPrice,
  };
}

/** Greatest common step of the prices (to 0.0001), so cost bounds can round up; 0 if prices are finer than that. */
function priceUnit(prices: number[]): number {
  const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
  let g = 0;
  for (const p of prices) {
    const v = Math.round(p * 1e4);
    if (Math.abs(v - p * 1e4) > 1e-6) return 0;
    g = gcd(g, v);
  }
  return g / 1e4;
}
