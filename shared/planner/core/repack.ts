// Large neighbourhood search for a packing with one bar fewer (one stock length, bars counted). Each move takes a few
// bars — always the emptiest, the others drawn at random — and repacks their parts with minimum bin slack (./mbs). If
// they fit in one bar fewer, the packing shrinks. Otherwise the repacking is kept when Σ load² does not go down, which
// drains the emptiest bar step by step into the others' free room. Once the free room sits in a few bars, some moves
// gather all of those bars with many full ones and try exhaustively (./bin-completion) to pack them into one bar fewer.
// Destroy-and-repair after Shaw (CP-98, "Using constraint programming and local search methods to solve vehicle
// routing problems", LNCS 1520, 417–431); the moves, the acceptance rule and the bar choice are our own.
import { packIntoBars } from './bin-completion';
import { mbsPack } from './mbs';

/** Enumeration nodes per bar inside a repacking: the neighbourhood is small, so a low limit keeps moves cheap. */
const NODE_LIMIT = 3000;
/** Bars per neighbourhood, lowest and highest. */
const MIN_BARS = 3;
const MAX_BARS = 12;
/** Parts per neighbourhood at most (the repacking enumerates subsets of them). */
const MAX_PARTS = 48;
/** Search nodes when the chosen bars have room enough to lose one: an exhaustive try (./bin-completion). */
const EXACT_NODES = 20000;
/**
 * Gathering moves: taken at these odds once at most GATHER_OPEN bars besides the emptiest have free room, over up to
 * GATHER_BARS bars and GATHER_PARTS parts (tuned on exactly filled lists of 500 parts, three to a bar).
 */
const GATHER_OPEN = 8;
const GATHER_ODDS = 0.6;
const GATHER_BARS = 24;
const GATHER_PARTS = 72;
/** Moves between clock reads. */
const CLOCK_EVERY = 16;

/**
 * Search state over a packing (bars as counts over `sizes`, each within `cap`). `run` improves it towards the target
 * until a deadline and can be called again to go on; `reset` starts over from a better packing found elsewhere.
 */
export class Repacker {
  private readonly sizes: ArrayLike<number>;
  private readonly cap: number;
  private cur: Int32Array[] = [];
  private loads: number[] = [];
  private seed: number;
  private readonly demand: Int32Array;

  constructor(sizes: ArrayLike<number>, cap: number, seed = 13579) {
    this.sizes = sizes;
    this.cap = cap;
    this.seed = seed & 0x7fffffff;
    this.demand = new Int32Array(sizes.length);
  }

  get barCount(): number {
    return this.cur.length;
  }

  /** Load of the emptiest bar: it falls while the search drains that bar, so it tells progress short of a bar. */
  get lowestLoad(): number {
    let low = Infinity;
    for (const l of this.loads) low = Math.min(low, l);
    return low;
  }

  reset(bars: readonly ArrayLike<number>[]): void {
    this.cur = bars.map((b) => Int32Array.from(b));
    this.loads = this.cur.map((b) => this.load(b));
  }

  bars(): Int32Array[] {
    return this.cur.map((b) => Int32Array.from(b));
  }

  /** Repack until the packing has `target` bars (true) or the deadline passes (false). */
  run(target: number, deadline: number, now: () => number): boolean {
    for (let move = 0; this.cur.length > target; move++) {
      if (move % CLOCK_EVERY === 0 && now() > deadline) return false;
      this.move();
    }
    return true;
  }

  private rng(): number {
    this.seed = (this.seed * 1103515245 + 12345) & 0x7fffffff;
    return this.seed / 0x80000000;
  }

  private load(b: Int32Array): number {
    let s = 0;
    for (let i = 0; i < this.sizes.length; i++) s += b[i] * this.sizes[i];
    return s;
  }

  private parts(b: Int32Array): number {
    let s = 0;
    for (let i = 0; i < b.length; i++) s += b[i];
    return s;
  }

  private move(): void {
    const { cur, loads, cap, demand } = this;
    // Once the free room sits in a few bars, some moves take all of them (with full bars to trade parts with) and
    // try exhaustively to lose a bar: draining alone leaves the last bar to chance.
    let openCount = 0;
    for (const l of loads) if (l < cap) openCount++;
    const gather = openCount <= GATHER_OPEN + 1 && this.rng() < GATHER_ODDS;
    const { chosen, inSet } = this.choose(gather);
    if (chosen.length < 2) return;
    demand.fill(0);
    let before = 0;
    for (const c of chosen) {
      for (let i = 0; i < demand.length; i++) demand[i] += cur[c][i];
      before += loads[c] * loads[c];
    }
    let total = 0;
    for (let i = 0; i < demand.length; i++) total += demand[i] * this.sizes[i];
    if (total <= (chosen.length - 1) * cap) {
      const fewer = packIntoBars(this.sizes, demand, cap, chosen.length - 1, EXACT_NODES);
      if (fewer) {
        this.replace(inSet, fewer);
        return;
      }
    }
    if (gather) return;
    const packed = mbsPack(this.sizes, demand, cap, {
      target: chosen.length - 1,
      deadline: 0,
      now: () => 0,
      maxTries: 2,
      nodeLimit: NODE_LIMIT,
      seed: Math.floor(this.rng() * 0x7fffffff),
    });
    if (packed.length > chosen.length) return;
    const packedLoads = packed.map((b) => this.load(b));
    let after = 0;
    for (const l of packedLoads) after += l * l;
    if (packed.length === chosen.length && after < before) return;
    this.replace(inSet, packed);
  }

  /**
   * The emptiest bar and others: bars with free room and full bars at even odds (the free room has to meet, and full
   * bars give parts to trade), or for a gathering move every bar with free room first.
   */
  private choose(gather: boolean): { chosen: number[]; inSet: Uint8Array } {
    const { cur, loads, cap } = this;
    let low = 0;
    for (let b = 1; b < cur.length; b++) if (loads[b] < loads[low]) low = b;
    const size = gather ? GATHER_BARS : MIN_BARS + Math.floor(this.rng() * (MAX_BARS - MIN_BARS + 1));
    const maxParts = gather ? GATHER_PARTS : MAX_PARTS;
    const chosen = [low];
    const inSet = new Uint8Array(cur.length);
    inSet[low] = 1;
    let count = this.parts(cur[low]);
    const open: number[] = [];
    const full: number[] = [];
    for (let b = 0; b < cur.length; b++) if (b !== low) (loads[b] < cap ? open : full).push(b);
    for (let tries = 0; chosen.length < size && tries < 4 * size; tries++) {
      const from = open.length > 0 && (full.length === 0 || gather || this.rng() < 0.5) ? open : full;
      if (from.length === 0) break;
      const r = Math.floor(this.rng() * from.length);
      const pick = from[r];
      from[r] = from[from.length - 1];
      from.pop();
      const k = this.parts(cur[pick]);
      if (count + k > maxParts) continue;
      inSet[pick] = 1;
      chosen.push(pick);
      count += k;
    }
    return { chosen, inSet };
  }

  private replace(inSet: Uint8Array, packed: Int32Array[]): void {
    const keep: Int32Array[] = [];
    for (let b = 0; b < this.cur.length; b++) if (!inSet[b]) keep.push(this.cur[b]);
    this.cur = keep.concat(packed);
    this.loads = this.cur.map((b) => this.load(b));
  }
}
