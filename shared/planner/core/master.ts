// Gilmore–Gomory column generation ("A linear programming approach to the cutting-stock problem", Operations
// Research 9 (1961) 849–859) over a residual demand that the diving heuristic lowers step by step.
// Rows: one ≥ row per item (demand), one row per limited stock type (−Σ x ≥ −qty). Columns: patterns, a surplus per
// row, an expensive artificial per item (keeps every residual feasible), and the dual-optimal inequalities
// y_small ≤ y_large of Ben Amor, Desrosiers & Valério de Carvalho (Transportation Science 40 (2006) 177–186), which
// speed up convergence. The certified bound never depends on the LP: it is the Lagrangian (Farley) bound computed
// from the current duals and exact pricing, valid for any non-negative duals.
import { knapsackWork, solveKnapsack } from './knapsack';
import { patternKey } from './greedy';
import type { Pattern, Problem } from './problem';
import { RevisedSimplex } from './simplex';

export interface LpPoint {
  /** Pattern columns with positive value. */
  support: { col: number; pattern: Pattern; value: number }[];
  /** Objective of the current master (an upper bound on the LP optimum). */
  lpValue: number;
  /** Best certified (unrounded) lower bound on the residual's integer optimum seen in this solve. */
  lowerBound: number;
  /** The LP was solved to optimality (no column prices out). */
  converged: boolean;
  /** An artificial column still carries flow: the residual may be infeasible with the stock left. */
  artificial: boolean;
}

export interface SolveLimits {
  deadline: number;
  /** Stop as soon as the rounded-up bound reaches this value (nothing better can be found below it). */
  stopAt?: number;
  /** Pricing rounds allowed (a dive node needs a good LP point, not a proof). */
  maxRounds?: number;
  now: () => number;
}

const RC_TOL = 1e-9;
const EXTRA_COLUMNS = 4;
const EXTRA_WORK = 400_000;


export class Master {
  readonly p: Problem;
  readonly n: number;
  readonly lp: RevisedSimplex;
  readonly limitedRow: number[];
  private readonly patterns: (Pattern | null)[] = [];
  private readonly keys = new Set<string>();
  private readonly crashBasis: number[];
  private readonly bigM: number;
  demand: Int32Array;
  qtyLeft: Int32Array;
  knapsackCalls = 0;
  private readonly doiColumns: number[] = [];

  constructor(p: Problem) {
    this.p = p;
    this.n = p.sizes.length;
    this.limitedRow = p.types.map(() => -1);
    let m = this.n;
    p.types.forEach((t, i) => {
      if (t.qty !== null) this.limitedRow[i] = m++;
    });
    this.lp = new RevisedSimplex(m);
    this.demand = Int32Array.from(p.demand);
    this.qtyLeft = Int32Array.from(p.types, (t) => t.qty ?? 0);
    const maxCost = Math.max(1, ...p.types.map((t) => t.cost));
    this.bigM = 100 * maxCost + 100;
    this.crashBasis = new Array<number>(m);
    for (let i = 0; i < this.n; i++) {
      const art = this.addAux(Int32Array.of(i), Float64Array.of(1), this.bigM);
      this.addAux(Int32Array.of(i), Float64Array.of(-1), 0);
      // Prefer a one-item pattern on the cheapest unlimited type as the starting column of the row.
      let best = -1;
      p.types.forEach((t, ti) => {
        if (t.qty === null && t.capacity >= p.sizes[i] && (best < 0 || t.cost < p.types[best].cost)) best = ti;
      });
      if (best >= 0) {
        const counts = new Int32Array(this.n);
        counts[i] = Math.max(1, Math.min(p.demand[i], Math.floor(p.types[best].capacity / p.sizes[i])));
        this.crashBasis[i] = this.addPattern({ type: best, counts });
      } else this.crashBasis[i] = art;
    }
    for (let i = 0; i + 1 < this.n; i++) {
      this.doiColumns.push(this.addAux(Int32Array.of(i, i + 1), Float64Array.of(-1, 1), 0));
    }
    p.types.forEach((_, t) => {
      const r = this.limitedRow[t];
      if (r >= 0) this.crashBasis[r] = this.addAux(Int32Array.of(r), Float64Array.of(-1), 0);
    });
    this.lp.setBasis(this.crashBasis);
    this.lp.setRhs(this.rhs());
  }

  /**
   * Switch the dual-optimal inequalities on or off (off: priced out at the artificial cost). They speed up the root, but a diving LP that leans on them
   * covers small items by large items' slots, which fixing a pattern then cannot reproduce.
   */
  useDualInequalities(on: boolean): void {
    for (const j of this.doiColumns) this.lp.setCost(j, on ? 0 : this.bigM);
  }

  /**
   * Scale each pattern column's cost by 1 + ε·u (u uniform in [0, 1)), or restore the true costs with ε = 0. The
   * cutting-stock LP has many optimal points; a tiny perturbation makes a restarted dive follow another one. Bounds
   * are unaffected: they are priced with the true costs.
   */
  perturbCosts(eps: number, rng: () => number): void {
    for (let j = 0; j < this.patterns.length; j++) {
      const pt = this.patterns[j];
      if (pt) this.lp.setCost(j, this.p.types[pt.type].cost * (1 + eps * rng()));
    }
  }

  private addAux(rows: Int32Array, vals: Float64Array, cost: number): number {
    this.patterns.push(null);
    return this.lp.addColumn({ rows, vals, cost });
  }

  /** Add a pattern column unless it is already in the pool. Returns its column or −1. */
  addPattern(pt: Pattern): number {
    const key = patternKey(pt);
    if (this.keys.has(key)) return -1;
    this.keys.add(key);
    const rows: number[] = [];
    const vals: number[] = [];
    for (let i = 0; i < this.n; i++) {
      if (pt.counts[i]) {
        rows.push(i);
        vals.push(pt.counts[i]);
      }
    }
    const r = this.limitedRow[pt.type];
    if (r >= 0) {
      rows.push(r);
      vals.push(-1);
    }
    this.patterns.push(pt);
    return this.lp.addColumn({ rows: Int32Array.from(rows), vals: Float64Array.from(vals), cost: this.p.types[pt.type].cost });
  }

  private rhs(): Float64Array {
    const b = new Float64Array(this.lp.m);
    for (let i = 0; i < this.n; i++) b[i] = this.demand[i];
    this.p.types.forEach((_, t) => {
      const r = this.limitedRow[t];
      if (r >= 0) b[r] = -this.qtyLeft[t];
    });
    return b;
  }

  /** Change the residual; the basis stays dual feasible and the next solve starts with the dual simplex. */
  setResidual(demand: ArrayLike<number>, qtyLeft: ArrayLike<number>): void {
    this.demand = Int32Array.from(demand);
    this.qtyLeft = Int32Array.from(qtyLeft);
    this.lp.setRhs(this.rhs());
  }

  /** Column generation on the current residual until the LP is optimal, the bound reaches `stopAt`, or time runs out. */
  solve(lim: SolveLimits): LpPoint {
    const lp = this.lp;
    let lower = -Infinity;
    let converged = false;
    const stop = (): boolean => lim.now() > lim.deadline;
    if (this.minXB() < -1e-7) {
      const st = lp.dual(20 * lp.m + 200, stop);
      if (st !== 'optimal' || this.minXB() < -1e-7) {
        lp.setBasis(this.crashBasis);
        lp.setRhs(this.rhs());
      }
    }
    for (let round = 0; ; round++) {
      lp.primal(50 * lp.m + 500, stop);
      const y = Float64Array.from(lp.computeDuals());
      const res = this.price(y);
      lower = Math.max(lower, res.bound);
      const columns = res.columns;
      if (columns.length === 0) {
        converged = true;
        break;
      }
      const lpValue = lp.objective();
      if (lim.stopAt !== undefined && this.rounded(lower) >= lim.stopAt) break;
      // The LP optimum lies in [lower, lpValue]: once both round to the same value the rounded bound is final.
      if (this.rounded(lower) >= this.rounded(lpValue) && !this.hasArtificial()) break;
      if (lim.now() > lim.deadline) break;
      if (lim.maxRounds !== undefined && round + 1 >= lim.maxRounds) break;
      let added = 0;
      for (const c of columns) if (this.addPattern(c) >= 0) added++;
      if (added === 0) {
        converged = true; // only duplicates priced out: numerical noise at the optimum
        break;
      }
    }
    return this.point(lower, converged);
  }


  rounded(v: number): number {
    const tol = 1e-6 * Math.max(1, Math.abs(v));
    const u = this.p.costUnit;
    return u > 0 ? u * Math.ceil((v - tol) / u) : v - tol;
  }

  private minXB(): number {
    let mn = Infinity;
    for (let i = 0; i < this.lp.m; i++) mn = Math.min(mn, this.lp.xB[i]);
    return mn;
  }

  hasArtificial(): boolean {
    for (let i = 0; i < this.lp.m; i++) {
      const j = this.lp.heads[i];
      if (this.patterns[j] === null && this.lp.cols[j].cost === this.bigM && this.lp.xB[i] > 1e-7) return true;
    }
    return false;
  }

  private point(lower: number, converged: boolean): LpPoint {
    const support: LpPoint['support'] = [];
    for (let i = 0; i < this.lp.m; i++) {
      const j = this.lp.heads[i];
      const pt = this.patterns[j];
      const v = this.lp.xB[i];
      if (pt && v > 1e-9) support.push({ col: j, pattern: pt, value: v });
    }
    return { support, lpValue: this.lp.objective(), lowerBound: lower, converged, artificial: this.hasArtificial() };
  }

  /**
   * Price every stock type with exact knapsacks; return new columns with negative reduced cost and the Lagrangian
   * bound for the current residual (Farley's ratio bound when all stock is unlimited).
   */
  private price(yRaw: Float64Array): { bound: number; columns: Pattern[] } {
    const { p, n } = this;
    const y = new Float64Array(n);
    for (let i = 0; i < n; i++) y[i] = this.demand[i] > 0 ? Math.max(0, yRaw[i]) : 0;
    const columns: Pattern[] = [];
    let theta = 1;
    const zUp: number[] = [];
    const rowDual: number[] = [];
    let parts = 0;
    for (let i = 0; i < n; i++) parts += this.demand[i];
    for (let t = 0; t < p.types.length; t++) {
      const type = p.types[t];
      const r = this.limitedRow[t];
      const yr = r >= 0 ? Math.max(0, yRaw[r]) : 0;
      rowDual.push(yr);
      if (type.qty !== null && this.qtyLeft[t] <= 0) {
        zUp.push(0);
        continue;
      }
      this.knapsackCalls++;
      const k = solveKnapsack(p.sizes, y, this.demand, type.capacity);
      zUp.push(k.upper);
      if (type.qty === null) {
        if (type.cost <= 0) theta = k.upper > 1e-12 ? 0 : theta;
        else if (k.upper > type.cost) theta = Math.min(theta, type.cost / k.upper);
      }
      const rc = type.cost - k.value + yr;
      if (rc < -RC_TOL * Math.max(1, type.cost)) {
        columns.push({ type: t, counts: k.counts });
        for (const o of k.others) if (type.cost - o.value + yr < -RC_TOL) columns.push({ type: t, counts: o.counts });
        // More columns per round: re-price with each of the best pattern's most valuable items left out in turn.
        const extra = knapsackWork(p.sizes, this.demand, type.capacity) <= EXTRA_WORK ? EXTRA_COLUMNS : 0;
        const inBest: number[] = [];
        for (let i = 0; i < n; i++) if (k.counts[i] > 0) inBest.push(i);
        inBest.sort((a, b) => y[b] - y[a]);
        const u = Int32Array.from(this.demand);
        for (const i of inBest.slice(0, extra)) {
          const keep = u[i];
          u[i] = 0;
          this.knapsackCalls++;
          const alt = solveKnapsack(p.sizes, y, u, type.capacity);
          u[i] = keep;
          if (type.cost - alt.value + yr < -RC_TOL) columns.push({ type: t, counts: alt.counts });
        }
      }
    }
    let bound = 0;
    for (let i = 0; i < n; i++) bound += y[i] * this.demand[i];
    for (let t = 0; t < p.types.length; t++) {
      if (p.types[t].qty === null) continue;
      bound -= rowDual[t] * this.qtyLeft[t];
    }
    bound *= theta;
    for (let t = 0; t < p.types.length; t++) {
      if (p.types[t].qty === null) continue;
      const rc = p.types[t].cost - theta * (zUp[t] - rowDual[t]);
      if (rc < 0) bound += Math.min(this.qtyLeft[t], parts) * rc;
    }
    return { bound, columns };
  }
}
