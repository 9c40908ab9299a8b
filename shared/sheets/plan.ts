// The sheet plan: many quick guillotine passes (orders × fit rules × split rules, then perturbed orders) and the
// best kept — fewest sheets, then least cost, then the emptiest last sheet (a bigger offcut) — with emptying moves
// on the emptiest sheet (empty-last.ts). Stops early when a plan meets the certified lower bound.
//
// The work is counted in passes, not milliseconds, so the same job gives the same plan on a fast machine and a slow
// one (perturbations are seeded). Time is only a safety stop; a plan cut short by it says so in `stats.stopped`.
import { InputError } from '../errors';
import { sheetLowerBound } from './bounds';
import { emptyLast } from './empty-last';
import { nest, smallestSide, type Fit, type NestItem, type PackedSheet, type RegionNode, type SheetKind, type Split } from './guillotine';
import { validateSheetJob, type SheetJob } from './job';

export type SheetCut = { x1: number; y1: number; x2: number; y2: number; stage: number; kind: 'trim' | 'cut' };
export type SheetPlacement = { label: string; x: number; y: number; length: number; width: number; rotated: boolean };
export type PlannedSheet = { length: number; width: number; label?: string; price: number; placements: SheetPlacement[]; cuts: SheetCut[]; used_pct: number };
export type SheetPlan = {
  sheetCount: number;
  lowerBound: number;
  areaBound: number;
  waste_pct: number;
  cost: number;
  sheets: PlannedSheet[];
  stats: { passes: number; elapsedMs: number; stopped: 'bound' | 'passes' | 'time' };
};
export type SheetPlanOptions = {
  /** The work budget, in passes over all the parts (default 3000). */
  maxPasses?: number;
  /** Safety stop only (default 10 s): a plan that runs into it depends on the machine's speed. */
  timeLimitMs?: number;
  seed?: number;
  /** The clock the safety stop reads (milliseconds); tests pass their own. */
  now?: () => number;
};

const FITS: Fit[] = ['area', 'short-side', 'long-side'];
const SPLITS: Split[] = ['short-leftover', 'long-leftover', 'min-area', 'max-area'];
const ORDERS: ((p: NestItem, q: NestItem) => number)[] = [
  (p, q) => q.l * q.w - p.l * p.w,
  (p, q) => Math.max(q.l, q.w) - Math.max(p.l, p.w) || Math.min(q.l, q.w) - Math.min(p.l, p.w),
  (p, q) => q.l + q.w - (p.l + p.w),
  (p, q) => q.l - p.l || q.w - p.w,
  (p, q) => q.w - p.w || q.l - p.l,
];

/** Passes a plan may take: the benchmark's classes gain little beyond it, and a 100-part job stays well under 1 s. */
export const DEFAULT_PASSES = 3000;

const FULL = { orders: ORDERS, fits: FITS, splits: SPLITS };
/** A quick emptying move on perturbed plans that tie the best: two orders, one fit rule, two split rules. */
const LIGHT = { orders: ORDERS.slice(0, 2), fits: FITS.slice(0, 1), splits: SPLITS.slice(0, 2) };
const LIGHT_WORK = 3;

/** Small seeded generator (mulberry32) so perturbed passes repeat exactly. */
function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Scored = { sheets: PackedSheet[]; order: NestItem[]; key: [number, number, number] };

function keyOf(sheets: PackedSheet[]): [number, number, number] {
  const cost = sheets.reduce((s, p) => s + p.kind.price, 0);
  const least = Math.min(...sheets.map((p) => p.used));
  return [sheets.length, cost, least];
}
const better = (a: [number, number, number], b: [number, number, number]): boolean =>
  a[0] !== b[0] ? a[0] < b[0] : a[1] !== b[1] ? a[1] < b[1] - 1e-9 : a[2] < b[2] - 1e-9;

/** Plan a job on its sheets; throws InputError naming the field at fault, or when the sheets on hand run out. */
export function planSheets(input: SheetJob | unknown, opts: SheetPlanOptions = {}): SheetPlan {
  const now = opts.now ?? Date.now;
  const t0 = now();
  const job = validateSheetJob(input);
  const { kerf, trim } = job;
  const items: NestItem[] = [];
  const labels: string[] = [];
  const sizes: { length: number; width: number }[] = [];
  for (const p of job.parts) {
    for (let q = 0; q < p.qty; q++) {
      items.push({ id: items.length, l: p.length, w: p.width, rotatable: !p.grain });
      labels.push(p.label);
      sizes.push({ length: p.length, width: p.width });
    }
  }
  const all: SheetKind[] = job.sheets.map((s, i) => ({ index: i, L: s.length - 2 * trim, W: s.width - 2 * trim, ox: trim, oy: trim, qty: s.qty ?? null, price: s.price ?? 0 }));
  // Sheets on hand (a counted quantity: offcuts) are used before sheets bought as needed.
  const kinds = [...all.filter((k) => k.qty !== null), ...all.filter((k) => k.qty === null)];
  const { lowerBound, areaBound } = sheetLowerBound(items, kinds, kerf);

  const maxPasses = opts.maxPasses ?? DEFAULT_PASSES;
  const timeLimit = opts.timeLimitMs ?? 10_000;
  let timedOut = false;
  const overTime = (): boolean => (timedOut ||= now() - t0 > timeLimit);
  let best: Scored | null = null;
  let passes = 0;
  const tryOrder = (order: NestItem[], fit: Fit, split: Split, light = 0): void => {
    passes++;
    const sheets = nest(order, kinds, kerf, { fit, split });
    if (!sheets) return;
    const key = keyOf(sheets);
    if (!best || better(key, best.key)) best = { sheets, order, key };
    else if (light > 0 && key[0] === best.key[0]) polishPlan({ sheets, order, key }, light, LIGHT);
  };
  const done = (): boolean => (best !== null && best.key[0] <= lowerBound) || passes >= maxPasses || overTime();
  const minSide = smallestSide(items);
  const byId = new Map(items.map((it) => [it.id, it]));
  // The emptying move on the best plan so far, with a share of the pass budget.
  const polish = (share: number): void => {
    if (best && !done()) polishPlan(best, maxPasses * share, FULL);
  };
  function polishPlan(b: Scored, work: number, rules: typeof FULL): void {
    const budget = { left: Math.min(maxPasses - passes, work), n: items.length, over: overTime };
    const start = budget.left;
    const sheets = emptyLast(b.sheets, items, kerf, minSide, rules, budget);
    passes += start - budget.left;
    const key = keyOf(sheets);
    if (!best || better(key, best.key)) {
      const order = sheets.flatMap((sh) => [...collect(sh.root, new Set<number>())]).map((id) => byId.get(id) as NestItem);
      best = { sheets, order, key };
    }
  }

  outer: for (const cmp of ORDERS) {
    const order = [...items].sort(cmp);
    for (const fit of FITS) {
      for (const split of SPLITS) {
        tryOrder(order, fit, split);
        if (done()) break outer;
      }
    }
  }
  polish(0.2);
  const rand = rng(opts.seed ?? 1);
  // Perturbed passes up to 70 % of the budget; the rest for a last emptying move on the best of them.
  while (!done() && best && passes < maxPasses * 0.7) {
    const b: Scored = best;
    let order: NestItem[];
    if (rand() < 0.3) {
      // Put the parts of the emptiest sheet first: they are the ones a plan with one sheet fewer must fit elsewhere.
      const emptiest = b.sheets.reduce((m, s) => (s.used < m.used ? s : m), b.sheets[0]);
      const ids = new Set<number>();
      collect(emptiest.root, ids);
      order = [...b.order.filter((it) => ids.has(it.id)), ...b.order.filter((it) => !ids.has(it.id))];
    } else {
      order = [...b.order];
      const swaps = 1 + Math.floor(rand() * 3);
      for (let s = 0; s < swaps; s++) {
        const i = Math.floor(rand() * order.length);
        const j = Math.floor(rand() * order.length);
        [order[i], order[j]] = [order[j], order[i]];
      }
    }
    tryOrder(order, FITS[Math.floor(rand() * FITS.length)], SPLITS[Math.floor(rand() * SPLITS.length)], LIGHT_WORK);
  }
  polish(1);
  if (!best) {
    throw new InputError('sheets', 'sheets: the sheets on hand run out before every part is placed; add a sheet without a qty (bought as needed)');
  }
  const chosen: Scored = best;
  const out = chosen.sheets.map((s) => plannedSheet(s, job.sheets[s.kind.index], kerf, trim, labels, sizes));
  const partArea = sizes.reduce((a, s) => a + s.length * s.width, 0);
  const sheetArea = out.reduce((a, s) => a + s.length * s.width, 0);
  return {
    sheetCount: out.length,
    lowerBound,
    areaBound,
    waste_pct: (1 - partArea / sheetArea) * 100,
    cost: chosen.key[1],
    sheets: out,
    stats: { passes: Math.round(passes), elapsedMs: now() - t0, stopped: chosen.key[0] <= lowerBound ? 'bound' : timedOut ? 'time' : 'passes' },
  };
}

function collect(n: RegionNode, ids: Set<number>): Set<number> {
  if (n.item) ids.add(n.item.id);
  if (n.kids) for (const k of n.kids) collect(k, ids);
  return ids;
}

/** Placements from the leaves, cuts in stages (breadth first: every cut is made on a piece an earlier cut freed). */
export function plannedSheet(s: PackedSheet, stock: { length: number; width: number; label?: string; price?: number }, kerf: number, trim: number, labels: string[], sizes: { length: number; width: number }[]): PlannedSheet {
  const L = stock.length;
  const W = stock.width;
  const cuts: SheetCut[] = [];
  if (trim > 0) {
    cuts.push({ x1: 0, y1: trim, x2: L, y2: trim, stage: 0, kind: 'trim' });
    cuts.push({ x1: 0, y1: W - trim, x2: L, y2: W - trim, stage: 0, kind: 'trim' });
    cuts.push({ x1: trim, y1: trim, x2: trim, y2: W - trim, stage: 0, kind: 'trim' });
    cuts.push({ x1: L - trim, y1: trim, x2: L - trim, y2: W - trim, stage: 0, kind: 'trim' });
  }
  const placements: SheetPlacement[] = [];
  let level: RegionNode[] = [s.root];
  let stage = 1;
  let area = 0;
  while (level.length) {
    const next: RegionNode[] = [];
    for (const n of level) {
      if (n.item) {
        const sz = sizes[n.item.id];
        placements.push({ label: labels[n.item.id], x: n.x, y: n.y, length: sz.length, width: sz.width, rotated: n.item.rotated });
        area += sz.length * sz.width;
      }
      if (n.cut && n.kids) {
        const at = n.cut.at - kerf;
        if (n.cut.axis === 'y') cuts.push({ x1: n.x, y1: at, x2: n.x + n.l - kerf, y2: at, stage, kind: 'cut' });
        else cuts.push({ x1: at, y1: n.y, x2: at, y2: n.y + n.w - kerf, stage, kind: 'cut' });
        next.push(...n.kids);
      }
    }
    if (next.some((n) => n.cut || n.item)) stage++;
    level = next;
  }
  return { length: L, width: W, ...(stock.label ? { label: stock.label } : {}), price: stock.price ?? 0, placements, cuts, used_pct: (area / (L * W)) * 100 };
}
