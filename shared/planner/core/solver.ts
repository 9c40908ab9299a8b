// The improvement stage: greedy start, combinatorial bounds, then Gilmore–Gomory column generation with a diving
// heuristic that fixes one pattern at a time and regenerates columns on the residual, backtracking by limited
// discrepancy search (Sadykov, Vanderbeck, Pessoa, Tahiri & Uchoa, "Primal heuristics for branch and price: the assets
// of diving methods", INFORMS J. Computing 31 (2019) 251–267). Each node also tries residual rounding: keep the
// integer part of the LP and pack the rest greedily (Wäscher & Gau 1996; Belov & Scheithauer 2006). With one unpriced
// stock length, minimum bin slack (./mbs) packs the whole list before the LP and each residual inside the dives, and
// repacking a few bars at a time (./repack) runs before the LP and between dives. Restarted dives perturb the LP's
// costs slightly so that they follow other optimal LP points.
// Written as a generator so a caller can yield to its event loop (progress, cancellation) between steps.
import { InputError } from '../../errors';
import { martelloTothL2, materialBound } from './bounds';
import { coveringCost, leastStockLength } from './covering-bound';
import { maximalPatterns, solveExact, type MipSolver } from './exact';
import { lexRefine } from './lex-refine';
import { compress, greedyPack, patternKey, type FitRule, type OpenRule } from './greedy';
import { Master, type LpPoint } from './master';
import { mbsPack } from './mbs';
import { perfectPack } from './perfect-fill';
import { Repacker } from './repack';
import { roundUpBound, solutionBars, solutionCost, type Pattern, type PatternUse, type Problem } from './problem';

/**
 * The schedule's time scale (ms): every stage's budget is a share of this, not of the time limit, so a run with a
 * longer limit repeats a shorter run step for step and only goes on after it; its plan is never worse. The shares
 * were tuned at the product's default limit of 2 s.
 */
const SCHEDULE_MS = 2000;
/** Share of the schedule the root LP may take before diving starts (dives keep generating columns). */
const ROOT_SHARE = 0.7;
/** Share of the time limit the minimum-bin-slack restarts may take when they do not reach the bound at once. */
const MBS_SHARE = 0.01;
/**
 * Perfect packing (./perfect-fill) when the parts fill the bound's bars exactly: its share of the schedule, bars placed
 * per bar of the list in the bar-by-bar search, and subsets taken (search and probes) by the exact-cover search.
 */
const PERFECT_SHARE = 0.35;
const PERFECT_FILL_NODES_PER_BAR = 20;
const PERFECT_COVER_WORK = 400_000;
/** Longer lists (500 three-part pieces) keep the stage's time for repacking, the LP and its dives, which solve them. */
const PERFECT_MAX_PIECES = 480;
/** Enumeration nodes per bar when minimum bin slack completes a dive node's residual: cheap enough to run at every node. */
const RESIDUAL_MBS_NODES = 2000;
/**
 * Largest residual (in pieces) that minimum bin slack completes at a dive node. Deep in a dive the residual is small
 * and this closes the last bar; near the root of a fractional LP (triplet lists) it is most of the list, and packing
 * it at every node costs the dive more time than it saves.
 */
const RESIDUAL_MBS_MAX_PIECES = 120;
/** Pricing rounds per dive node: a node needs a good LP point to guide the next fix, not a proof. */
const NODE_ROUNDS = 30;
/**
 * Share of the time limit that repacking (./repack) may take before the LP, and after each dive. Before the LP it
 * stops early when it has neither removed a bar nor lightened the emptiest one for a while (REPACK_STALL_SHARE of the
 * limit, at most REPACK_STALL_MS_PER_PART per part): some lists need the LP's guidance or proof, others (three parts
 * to a bar, hundreds of parts) repacking shortens sooner.
 */
const REPACK_FIRST_SHARE = 0.3;
const REPACK_STALL_SHARE = 0.05;
const REPACK_STALL_MS_PER_PART = 0.25;
const REPACK_ROUND_SHARE = 0.05;
/** The emptiest bar's load must fall to this fraction of its last mark to count as progress. */
const REPACK_DRAIN = 0.7;
/** Longest repacking stretch between two progress reports, in ms. */
const REPACK_SLICE_MS = 20;
/** Relative perturbation of the pattern costs on restarts (the LP then settles on another of its optimal points). */
const PERTURB = 1e-4;
/** Random perturbation of the fixing order on restarts, in units of the integrality score (1e-6). */
const RESTART_NOISE = 1e6;
/** Jobs on several stock types up to this many pieces go to the exact pattern model first (when a MIP solver is given). */
const EXACT_MAX_PIECES = 150;

export type Phase = 'greedy' | 'bound' | 'improve' | 'done';

export interface CoreProgress {
  phase: Phase;
  bestCost: number;
  bestBars: number;
  lowerBound: number;
}

export interface CoreOptions {
  /** Absolute time (per `now`) at which to stop improving. */
  deadline: number;
  now: () => number;
  /** MIP solver for the exact pattern model on small jobs with several stock types; without it they go to the search. */
  mip?: MipSolver;
}

export interface CoreResult {
  solution: PatternUse[];
  cost: number;
  bars: number;
  /** Certified lower bound on the cost (on the bar count when no prices are given). */
  lowerBound: number;
  /** Proven optimal for the whole order: least cost, then fewest bars at that cost, then least stock length. */
  optimal: boolean;
  /** Certified lower bound on the number of bars (same as lowerBound when every bar costs 1). */
  barLowerBound: number;
  /** The LP relaxation's optimum (unrounded) when the root LP finished; null when it did not run or did not finish. */
  lpBound: number | null;
  /** exact: stages the exact model proved (0–3), −1 when it did not run. */
  stats: { nodes: number; lpIterations: number; pricings: number; greedyCost: number; greedyBars: number; exact: number };
}

interface Incumbent {
  sol: PatternUse[];
  cost: number;
  bars: number;
  used: number;
}

export function* solveCore(p: Problem, opts: CoreOptions): Generator<CoreProgress, CoreResult, void> {
  const n = p.sizes.length;
  const t0 = opts.now();
  const qty0 = p.types.map((t) => t.qty);
  const improveTol = p.costUnit > 0 ? p.costUnit / 2 : 1e-9;

  let inc: Incumbent | null = null;
  const offer = (sol: PatternUse[]): boolean => {
    const cost = solutionCost(p, sol);
    const bars = solutionBars(sol);
    let used = 0;
    for (const u of sol) used += p.types[u.pattern.type].capacity * u.mult;
    if (
      inc === null ||
      cost < inc.cost - improveTol ||
      (cost <= inc.cost + improveTol && (bars < inc.bars || (bars === inc.bars && used < inc.used)))
    ) {
      inc = { sol: compress(sol), cost, bars, used };
      return true;
    }
    return false;
  };
  const rules: [FitRule, OpenRule][] = [
    ['first', 'largest'],
    ['best', 'largest'],
    ['first', 'on-hand-first'],
    ['best', 'on-hand-first'],
  ];
  for (const [fit, open] of p.types.length > 1 ? rules : rules.slice(0, 2)) {
    const s = greedyPack(p, p.demand, qty0, fit, open);
    if (s) offer(s);
  }
  if (inc === null) {
    throw new InputError('stock', 'stock: the bars available cannot hold every part; add a stock length that can be bought as needed');
  }
  const greedyCost = (inc as Incumbent).cost;
  const greedyBars = (inc as Incumbent).bars;
  const unitCost = p.types.every((t) => t.cost === 1) && p.costUnit === 1;
  const singleBarObjective = unitCost && p.types.length === 1 && p.types[0].qty === null;
  const cmax = Math.max(...p.types.map((t) => t.capacity));
  const barBound = martelloTothL2(p.sizes, p.demand, cmax);

  let lower = combinatorialBound(p);
  const stats = { nodes: 0, lpIterations: 0, pricings: 0, greedyCost, greedyBars, exact: -1 };
  const best = (): Incumbent => inc as Incumbent;
  let lexProven = false;
  const need = p.sizes.reduce((s, size, i) => s + size * p.demand[i], 0);
  const parts0 = p.demand.reduce((a, b) => a + b, 0);
  // The cost bound proves the cost; the bar count and the stock length at that cost need proofs of their own, except
  // on one stock type, where both follow from the cost.
  /** At a proven least cost, settle the bar count and stock length (./lex-refine). */
  const refine = (): void => {
    const b = best();
    if (lexProven || b.cost > lower + improveTol || p.types.length === 1) return;
    const r = lexRefine(p, b.cost, b, improveTol, () => opts.now() > opts.deadline);
    if (r.solution) offer(r.solution);
    lexProven = r.proven;
  };
  const lexOptimal = (b: Incumbent): boolean => {
    if (b.cost > lower + improveTol) return false;
    if (p.types.length === 1) return true;
    if (b.bars > barBound) return false;
    return b.used <= leastStockLength(p.types, b.bars, b.cost + improveTol, need);
  };
  const done = (lpBound: number | null, master: Master | null): CoreResult => {
    refine();
    if (master) {
      stats.lpIterations = master.lp.iterations;
      stats.pricings = master.knapsackCalls;
    }
    const b = best();
    return {
      solution: b.sol,
      cost: b.cost,
      bars: b.bars,
      lowerBound: lower,
      optimal: lexProven || lexOptimal(b),
      barLowerBound: unitCost ? Math.max(barBound, lower) : barBound,
      lpBound,
      stats,
    };
  };
  // One unpriced stock length: repacking a few bars at a time often removes the last bar above the bound long
  // before the LP would (lists of exactly filled bars, long bars with few parts each). It starts from the first/best
  // fit packing: the minimum-bin-slack one below has its free room all in its last bars, which repacking drains worse.
  const repacker = singleBarObjective ? new Repacker(p.sizes, p.types[0].capacity) : null;
  let repackerBars = Infinity;
  if (repacker) {
    repacker.reset(barsOf(best().sol));
    repackerBars = repacker.barCount;
  }
  // One unpriced stock length: minimum bin slack often packs to the bound where first/best fit stop a bar above.
  if (unitCost && p.types.length === 1 && best().cost > lower + improveTol) {
    const bars = mbsPack(p.sizes, p.demand, p.types[0].capacity, {
      target: lower,
      deadline: t0 + SCHEDULE_MS * MBS_SHARE,
      now: opts.now,
    });
    const qty = p.types[0].qty;
    if (qty === null || bars.length <= qty) offer(onFirstStock(bars));
  }
  // Parts adding up to exactly the bound's bars: every bar is filled exactly, which a search of its own finds where
  // minimum bin slack, repacking and the LP dives end a bar over (lists cut from whole bars).
  if (singleBarObjective && best().cost > lower + improveTol && need === lower * p.types[0].capacity && parts0 <= PERFECT_MAX_PIECES) {
    const until = t0 + SCHEDULE_MS * PERFECT_SHARE;
    const bars = perfectPack(p.sizes, p.demand, p.types[0].capacity, {
      fillNodes: PERFECT_FILL_NODES_PER_BAR * lower,
      coverWork: PERFECT_COVER_WORK,
      outOfTime: () => opts.now() > Math.min(until, opts.deadline),
    });
    if (bars) offer(onFirstStock(bars));
  }
  /** Repack until `until`; after a dive, first catch up with a better packing the dive found. */
  function* repack(until: number, afterDive: boolean, stallMs = Infinity): Generator<CoreProgress, void, void> {
    if (!repacker) return;
    if (afterDive && best().bars < repackerBars) repacker.reset(barsOf(best().sol));
    // Progress: a bar fewer, or an emptiest bar markedly lighter (the next bar is being drained).
    let gained = opts.now();
    let lowest = repacker.lowestLoad;
    while (best().cost > lower + improveTol && opts.now() < Math.min(until, opts.deadline, gained + stallMs)) {
      const found = repacker.run(best().bars - 1, Math.min(until, opts.now() + REPACK_SLICE_MS), opts.now);
      if (found) offer(onFirstStock(repacker.bars()));
      // Once it beats the best packing it has shown it suits the list: no more stall limit in this call.
      if (found) stallMs = Infinity;
      if (repacker.barCount < repackerBars || repacker.lowestLoad <= lowest * REPACK_DRAIN) {
        gained = opts.now();
        lowest = repacker.lowestLoad;
      }
      repackerBars = repacker.barCount;
      yield { phase: 'improve', bestCost: best().cost, bestBars: best().bars, lowerBound: lower };
    }
  }
  yield { phase: 'greedy', bestCost: best().cost, bestBars: best().bars, lowerBound: lower };
  if (lexOptimal(best())) return done(null, null);
  const parts = p.demand.reduce((a, b) => a + b, 0);
  // Several stock types, a small job: first the mixes of bars in order with an exhaustive packing test, then (when that
  // cannot settle it) the exact model. Both have fixed budgets or the whole time limit, so their result only improves
  // with more time.
  if (p.types.length > 1 && parts <= EXACT_MAX_PIECES) {
    const r = lexRefine(p, lower, best(), improveTol, () => opts.now() > opts.deadline);
    if (r.solution) offer(r.solution);
    if (r.proven) {
      lexProven = true;
      lower = Math.max(lower, roundUpBound(p, best().cost));
      stats.exact = 0;
      return done(null, null);
    }
  }
  if (opts.mip && p.types.length > 1 && parts <= EXACT_MAX_PIECES) {
    const patterns = maximalPatterns(p);
    if (patterns) {
      const out = solveExact(p, patterns, opts.mip, () => (opts.deadline - opts.now()) / 1000);
      if (out.solution) offer(out.solution);
      if (out.cost !== null) lower = Math.max(lower, roundUpBound(p, out.cost));
      stats.exact = out.proven;
      yield { phase: 'bound', bestCost: best().cost, bestBars: best().bars, lowerBound: lower };
      if (out.proven === 1 || lexOptimal(best()) || opts.now() > opts.deadline) return done(null, null);
    }
  }
  const stallMs = Math.min(SCHEDULE_MS * REPACK_STALL_SHARE, parts * REPACK_STALL_MS_PER_PART);
  yield* repack(t0 + SCHEDULE_MS * REPACK_FIRST_SHARE, false, stallMs);
  if (best().cost <= lower + improveTol) return done(null, null);

  const master = new Master(p);
  for (const u of best().sol) master.addPattern(u.pattern);
  // The root may not converge on hard instances; leave most of the time to the dives, which keep generating columns.
  const rootDeadline = t0 + SCHEDULE_MS * ROOT_SHARE;
  const root = master.solve({ deadline: rootDeadline, now: opts.now, stopAt: best().cost - improveTol });
  lower = Math.max(lower, master.rounded(root.lowerBound));
  // An unfinished root LP's value is no bound (its certified part is already in `lower`).
  const lpBound = root.converged ? root.lowerBound : null;
  yield { phase: 'bound', bestCost: best().cost, bestBars: best().bars, lowerBound: lower };
  const closed = (): boolean => best().cost <= lower + improveTol || opts.now() > opts.deadline;

  const residualRounding = (fixed: PatternUse[], pt: LpPoint, demand: Int32Array, qty: Int32Array): void => {
    const d = Int32Array.from(demand);
    const q = Int32Array.from(qty);
    const sol = fixed.slice();
    const sorted = pt.support.slice().sort((a, b) => b.value - a.value);
    for (const s of sorted) {
      const k = Math.floor(s.value + 1e-9);
      for (let c = 0; c < k; c++) {
        const use = take(p, s.pattern, d, q);
        if (!use) break;
        sol.push({ pattern: use, mult: 1 });
      }
    }
    for (const fit of ['first', 'best'] as FitRule[]) {
      const qq = p.types.map((t, i) => (t.qty === null ? null : q[i]));
      const rest = greedyPack(p, d, qq, fit, 'on-hand-first');
      if (rest) offer(sol.concat(rest));
    }
    if (singleBarObjective && d.reduce((n, k) => n + k, 0) <= RESIDUAL_MBS_MAX_PIECES) {
      const rest = mbsPack(p.sizes, d, p.types[0].capacity, {
        target: 0,
        deadline: 0,
        now: opts.now,
        maxTries: 1,
        nodeLimit: RESIDUAL_MBS_NODES,
      });
      offer(sol.concat(onFirstStock(rest)));
    }
  };

  let noise = 0;
  let seed = 12345;
  const rng = (): number => {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    return seed / 0x80000000;
  };
  let exhausted = true;

  function* dive(
    fixed: PatternUse[],
    fixedCost: number,
    demand: Int32Array,
    qty: Int32Array,
    tabu: Set<string>,
    disc: number,
    budget: number,
  ): Generator<CoreProgress, void, void> {
    if (closed()) return;
    let left = 0;
    for (let i = 0; i < n; i++) left += demand[i];
    if (left === 0) {
      offer(fixed);
      return;
    }
    stats.nodes++;
    master.setResidual(demand, qty);
    const pt = master.solve({ deadline: opts.deadline, now: opts.now, stopAt: best().cost - fixedCost - improveTol, maxRounds: NODE_ROUNDS });
    yield { phase: 'improve', bestCost: best().cost, bestBars: best().bars, lowerBound: lower };
    const resLower = master.rounded(pt.lowerBound);
    if (fixedCost + resLower >= best().cost - improveTol) return;
    residualRounding(fixed, pt, demand, qty);
    if (fixedCost + resLower >= best().cost - improveTol || closed()) return;
    // Fix first the column whose value is nearest a positive integer; among equals, the fullest bar (a near-perfect
    // packing leaves no room for waste) and then the largest value.
    // With one stock length, a solution one bar better than the incumbent leaves a known total slack; a bar wasting
    // more than that can never be part of it (for exactly-filled lists the slack is zero).
    let slack = Infinity;
    if (singleBarObjective) {
      let rest = 0;
      for (let i = 0; i < n; i++) rest += demand[i] * p.sizes[i];
      slack = (best().bars - 1 - fixed.length) * p.types[0].capacity - rest;
    }
    const cands = pt.support
      .filter((s) => !tabu.has(patternKey(s.pattern)))
      .map((s) => {
        const r = Math.max(1, Math.round(s.value));
        const use = take(p, s.pattern, Int32Array.from(demand), Int32Array.from(qty));
        const waste = use ? p.types[use.type].capacity - loadWithin(p, use, demand) : Infinity;
        return { s, r, score: Math.round(Math.abs(s.value - r) * 1e6), waste };
      })
      .filter((c) => c.waste <= slack)
      .map((c) => ({ ...c, noise: noise > 0 ? rng() * noise : 0 }))
      .sort((a, b) => a.score + a.noise - (b.score + b.noise) || a.waste - b.waste || b.s.value - a.s.value);
    if (cands.length === 0) return;
    const width = Math.min(cands.length, 1 + budget - disc);
    if (cands.length > width) exhausted = false;
    const localTabu = new Set(tabu);
    for (let k = 0; k < width; k++) {
      if (closed()) return;
      const { s } = cands[k];
      const d = Int32Array.from(demand);
      const q = Int32Array.from(qty);
      const next = fixed.slice();
      let cost = fixedCost;
      // The first child also fixes every other column at an integral value (all of them stay in an optimal
      // solution of the residual), which shortens each dive several times over.
      let budgetWaste = slack;
      const group =
        k === 0
          ? cands.filter((c) => {
              if (c.score > 1 || c.r !== Math.round(c.s.value) || c.waste * c.r > budgetWaste) return false;
              budgetWaste -= c.waste * c.r;
              return true;
            })
          : [];
      for (const { s: col, r } of group.length ? group : [cands[k]]) {
        for (let c = 0; c < r; c++) {
          const use = take(p, col.pattern, d, q);
          if (!use) break;
          next.push({ pattern: use, mult: 1 });
          cost += p.types[use.type].cost;
        }
      }
      if (next.length === fixed.length) continue;
      yield* dive(next, cost, d, q, localTabu, disc + k, budget);
      localTabu.add(patternKey(s.pattern));
    }
  }

  // A first deterministic dive with one discrepancy allowed, then restarts that perturb the fixing order.
  // Restarts alternate the dual-optimal inequalities off and on: with them, the LP covers small items by larger
  // items' slots, which suits lists of nearly distinct lengths; without them, fixed patterns are what the LP meant,
  // which suits lists with many repeats of each length.
  for (let round = 0; !closed(); round++) {
    noise = round < 2 ? 0 : RESTART_NOISE;
    master.useDualInequalities(round % 2 === 0);
    if (round >= 2) master.perturbCosts(PERTURB, rng);
    const diveStart = opts.now();
    yield* dive([], 0, Int32Array.from(p.demand), Int32Array.from(p.types, (t) => t.qty ?? 0), new Set(), 0, 1);
    if (round === 0 && exhausted) break;
    // Repacking gets as long as the dive took (short dives on short lists, which the dives solve best).
    const diveTime = opts.now() - diveStart;
    if (!closed()) yield* repack(opts.now() + Math.min(diveTime, SCHEDULE_MS * REPACK_ROUND_SHARE), true);
  }
  yield { phase: 'done', bestCost: best().cost, bestBars: best().bars, lowerBound: lower };
  return done(lpBound, master);
}

/** Bars given as counts over the sizes, as a solution on the (only) stock type 0. */
function onFirstStock(bars: readonly Int32Array[]): PatternUse[] {
  return bars.map((counts) => ({ pattern: { type: 0, counts }, mult: 1 }));
}

/** One entry per bar (counts over the sizes). */
function barsOf(sol: readonly PatternUse[]): Int32Array[] {
  const bars: Int32Array[] = [];
  for (const u of sol) for (let c = 0; c < u.mult; c++) bars.push(u.pattern.counts);
  return bars;
}

/** Load of a pattern counting only items still demanded. */
function loadWithin(p: Problem, pt: Pattern, demand: Int32Array): number {
  let s = 0;
  for (let i = 0; i < demand.length; i++) s += Math.min(pt.counts[i], demand[i]) * p.sizes[i];
  return s;
}

/**
 * Take one copy of a pattern, trimmed to the residual demand, with the room freed by trimming refilled by the largest
 * demanded items that fit (the LP may have covered a smaller item by a larger one's slot). Null when it holds nothing
 * useful or no stock of its type is left.
 */
function take(p: Problem, pt: Pattern, demand: Int32Array, qty: Int32Array): Pattern | null {
  if (p.types[pt.type].qty !== null && qty[pt.type] <= 0) return null;
  const counts = new Int32Array(pt.counts.length);
  let any = false;
  let room = p.types[pt.type].capacity;
  for (let i = 0; i < counts.length; i++) {
    const c = Math.min(pt.counts[i], demand[i]);
    if (c > 0) {
      counts[i] = c;
      demand[i] -= c;
      room -= c * p.sizes[i];
      any = true;
    }
  }
  for (let i = 0; i < counts.length && room >= p.sizes[p.sizes.length - 1]; i++) {
    if (demand[i] > 0 && p.sizes[i] <= room) {
      const c = Math.min(demand[i], Math.floor(room / p.sizes[i]));
      counts[i] += c;
      demand[i] -= c;
      room -= c * p.sizes[i];
      any = true;
    }
  }
  if (!any) return null;
  if (p.types[pt.type].qty !== null) qty[pt.type]--;
  return { type: pt.type, counts };
}

/**
 * Bounds that need no LP. Bars objective: L2 on the longest stock (any bar holds no more than it). Cost objective: the
 * least cost of whole bars whose capacities add up to the parts' total (./covering-bound).
 */
export function combinatorialBound(p: Problem): number {
  const unitCost = p.types.every((t) => t.cost === 1) && p.costUnit === 1;
  const cmax = Math.max(...p.types.map((t) => t.capacity));
  if (unitCost) return martelloTothL2(p.sizes, p.demand, cmax);
  let need = 0;
  for (let i = 0; i < p.sizes.length; i++) need += p.sizes[i] * p.demand[i];
  const cost = coveringCost(p.types, need);
  const tol = 1e-6 * Math.max(1, cost);
  return p.costUnit > 0 ? p.costUnit * Math.ceil((cost - tol) / p.costUnit) : cost - tol;
}

export { materialBound };
