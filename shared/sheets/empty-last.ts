// The last-sheet emptying move: the parts of the emptiest sheet are offered to every other sheet, each of which is
// cut again from scratch with its own parts plus as many of the offered ones as fit. When the emptiest sheet gives
// up all its parts the plan needs one sheet fewer; when it gives up some, its offcut grows. Every sheet stays a
// guillotine tree (each is cut again by the same one-sheet filler the passes use).
import { fillSheet, type Fit, type NestItem, type PackedSheet, type RegionNode, type Split } from './guillotine';

export type OrderRule = (p: NestItem, q: NestItem) => number;

/**
 * Work left, in the units of the pass budget (one fill of m parts counts m / n of a pass over all n parts), and the
 * planner's safety stop on time.
 */
export type Budget = { left: number; n: number; over: () => boolean };

function itemsOf(n: RegionNode, out: number[]): number[] {
  if (n.item) out.push(n.item.id);
  if (n.kids) for (const k of n.kids) itemsOf(k, out);
  return out;
}

/** Takes the given parts off a sheet: their leaves become offcut, and cuts that now free only offcut are dropped. */
function dropItems(sheet: PackedSheet, ids: Set<number>, kerf: number): void {
  const prune = (n: RegionNode): boolean => {
    if (n.item && ids.has(n.item.id)) {
      sheet.used -= (n.l - kerf) * (n.w - kerf);
      delete n.item;
    }
    if (n.kids) {
      const a = prune(n.kids[0]);
      const b = prune(n.kids[1]);
      if (!a && !b) {
        delete n.kids;
        delete n.cut;
      }
    }
    return n.item !== undefined || n.kids !== undefined;
  };
  prune(sheet.root);
}

/**
 * The sheet cut again with every one of `own` and as many of `offered` as fit (most area taken wins); null when no
 * order places all of `own`.
 */
function refill(own: NestItem[], offered: NestItem[], sheet: PackedSheet, kerf: number, minSide: number, rules: { orders: OrderRule[]; fits: Fit[]; splits: Split[] }, budget: Budget): { sheet: PackedSheet; taken: number[] } | null {
  let best: { sheet: PackedSheet; taken: number[]; area: number } | null = null;
  const ownIds = new Set(own.map((it) => it.id));
  for (const cmp of rules.orders) {
    // Own parts first keeps the sheet's own cut nearly as it was; all together lets an offered part take a better
    // place than an own one had.
    const first = [...[...own].sort(cmp), ...[...offered].sort(cmp)];
    const merged = [...own, ...offered].sort(cmp);
    for (const order of [first, merged]) {
      for (const fit of rules.fits) {
        for (const split of rules.splits) {
          if (budget.left <= 0 || budget.over()) return best;
          budget.left -= order.length / budget.n;
          const r = fillSheet(order, sheet.kind, kerf, { fit, split, minSide });
          if (r.placed.filter((id) => ownIds.has(id)).length !== own.length) continue;
          const taken = r.placed.filter((id) => !ownIds.has(id));
          const area = r.sheet.used;
          if (taken.length && (!best || area > best.area + 1e-9)) best = { sheet: r.sheet, taken, area };
        }
      }
    }
  }
  return best;
}

/**
 * Two sheets cut again from their pooled parts: the fuller one takes as much area as it can, the emptiest the rest.
 * Null unless the fuller one ends up holding more than before (so the emptiest gives up area) and the rest fits.
 */
function rebalance(full: { sheet: PackedSheet; own: NestItem[] }, empty: { sheet: PackedSheet; own: NestItem[] }, kerf: number, minSide: number, rules: { orders: OrderRule[]; fits: Fit[]; splits: Split[] }, budget: Budget): { full: PackedSheet; fullIds: number[]; empty: PackedSheet; emptyIds: number[] } | null {
  const pool = [...full.own, ...empty.own];
  let best: { full: PackedSheet; fullIds: number[]; empty: PackedSheet; emptyIds: number[] } | null = null;
  for (const cmp of rules.orders) {
    const order = [...pool].sort(cmp);
    for (const fit of rules.fits) {
      for (const split of rules.splits) {
        if (budget.left <= 0 || budget.over()) return best;
        budget.left -= order.length / budget.n;
        const a = fillSheet(order, full.sheet.kind, kerf, { fit, split, minSide });
        if (a.sheet.used <= (best?.full.used ?? full.sheet.used) + 1e-9) continue;
        const took = new Set(a.placed);
        const rest = pool.filter((it) => !took.has(it.id));
        // The rest must go back on the emptiest sheet whole; a few orders are enough to tell.
        for (const cmp2 of rules.orders) {
          budget.left -= rest.length / budget.n;
          const b = fillSheet([...rest].sort(cmp2), empty.sheet.kind, kerf, { fit, split, minSide });
          if (b.placed.length === rest.length) {
            best = { full: a.sheet, fullIds: a.placed, empty: b.sheet, emptyIds: b.placed };
            break;
          }
        }
      }
    }
  }
  return best;
}

/** The plan after emptying moves on its emptiest sheet, repeated while a move takes a part; the input is not changed. */
export function emptyLast(
  plan: PackedSheet[],
  items: readonly NestItem[],
  kerf: number,
  minSide: number,
  rules: { orders: OrderRule[]; fits: Fit[]; splits: Split[] },
  budget: Budget,
): PackedSheet[] {
  const byId = new Map(items.map((it) => [it.id, it]));
  const sheets = plan.map((s) => ({ sheet: structuredClone(s), own: itemsOf(s.root, []).map((id) => byId.get(id) as NestItem) }));
  const area = (it: NestItem) => (it.l + kerf) * (it.w + kerf);
  for (;;) {
    if (sheets.length < 2 || budget.left <= 0 || budget.over()) break;
    // Offcuts on hand are used before bought sheets, so a bought sheet is the one to empty while there is one.
    const bought = sheets.some((s) => s.sheet.kind.qty === null);
    const e = sheets.reduce((m, s, i) => ((!bought || s.sheet.kind.qty === null) && (m < 0 || s.sheet.used < sheets[m].sheet.used) ? i : m), -1);
    let offered = sheets[e].own;
    const smallest = Math.min(...offered.map(area));
    let moved = false;
    // The fullest sheets have the least room: try the ones with most room first.
    const others = sheets.filter((_, i) => i !== e).sort((a, b) => a.sheet.used - b.sheet.used);
    for (const g of others) {
      const room = (g.sheet.kind.L + kerf) * (g.sheet.kind.W + kerf) - g.own.reduce((a, it) => a + area(it), 0);
      if (room + 1e-9 < smallest) continue;
      const r = refill(g.own, offered, g.sheet, kerf, minSide, rules, budget);
      if (!r) continue;
      const took = new Set(r.taken);
      g.sheet = r.sheet;
      g.own = [...g.own, ...offered.filter((it) => took.has(it.id))];
      offered = offered.filter((it) => !took.has(it.id));
      dropItems(sheets[e].sheet, took, kerf);
      moved = true;
      if (!offered.length) break;
    }
    sheets[e].own = offered;
    if (!offered.length) {
      sheets.splice(e, 1);
      continue;
    }
    if (!moved) {
      // No sheet takes a part as it is cut: let one fuller sheet swap parts with the emptiest so it holds more.
      for (const g of others) {
        const r = rebalance(g, sheets[e], kerf, minSide, rules, budget);
        if (!r) continue;
        g.sheet = r.full;
        g.own = r.fullIds.map((id) => byId.get(id) as NestItem);
        sheets[e].sheet = r.empty;
        sheets[e].own = r.emptyIds.map((id) => byId.get(id) as NestItem);
        moved = true;
        break;
      }
    }
    if (!moved) break;
  }
  return sheets.map((s) => s.sheet);
}
