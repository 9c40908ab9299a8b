// Guillotine nesting of rectangles on sheets, with kerf. Every placement splits a free region of the sheet by one or
// two cuts that run from edge to edge of that region, so the sheet is cut in stages: each cut spans the piece it is
// made on, which is what a track saw or a panel saw can follow.
//
// Kerf: each part and each region is grown by one kerf on its far sides (x and y), and the usable area by one kerf
// too; parts then pack edge to edge in the grown sizes and stand one kerf apart in real sizes. A region's real size
// is its grown size less one kerf.

export type NestItem = { id: number; l: number; w: number; rotatable: boolean };
export type SheetKind = { index: number; L: number; W: number; ox: number; oy: number; qty: number | null; price: number };

/** A region of a sheet in grown coordinates: a leaf (free or holding one part) or split by one cut into two. */
export type RegionNode = {
  x: number;
  y: number;
  l: number;
  w: number;
  /** 'y' = the cut is a line y = const across the region's length; 'x' = a line x = const across its width. */
  cut?: { axis: 'x' | 'y'; at: number };
  kids?: [RegionNode, RegionNode];
  item?: { id: number; rotated: boolean };
};

export type PackedSheet = { kind: SheetKind; root: RegionNode; free: RegionNode[]; used: number };
export type Fit = 'area' | 'short-side' | 'long-side';
export type Split = 'short-leftover' | 'long-leftover' | 'min-area' | 'max-area';

const EPS = 1e-7;

type Ctx = { kerf: number; minSide: number; split: Split };

function score(fit: Fit, f: RegionNode, a: number, c: number): number {
  const lw = f.l - a;
  const lh = f.w - c;
  switch (fit) {
    case 'area':
      return (f.l * f.w - a * c) * 1e6 + Math.min(lw, lh);
    case 'short-side':
      return Math.min(lw, lh) * 1e6 + Math.max(lw, lh);
    case 'long-side':
      return Math.max(lw, lh) * 1e6 + Math.min(lw, lh);
  }
}

function yFirst(split: Split, f: RegionNode, a: number, c: number): boolean {
  const lw = f.l - a;
  const lh = f.w - c;
  if (lw <= EPS) return true;
  if (lh <= EPS) return false;
  switch (split) {
    case 'short-leftover':
      return lw <= lh;
    case 'long-leftover':
      return lw > lh;
    case 'min-area':
      return lw * c <= a * lh;
    case 'max-area':
      return lw * c > a * lh;
  }
}

function keep(ctx: Ctx, n: RegionNode, out: RegionNode[]): void {
  if (n.l >= ctx.minSide + ctx.kerf - EPS && n.w >= ctx.minSide + ctx.kerf - EPS) out.push(n);
}

/** Put a grown a × c part in the corner of free region f, splitting off what is left. */
function place(ctx: Ctx, sheet: PackedSheet, f: RegionNode, a: number, c: number, id: number, rotated: boolean): void {
  sheet.free.splice(sheet.free.indexOf(f), 1);
  sheet.used += (a - ctx.kerf) * (c - ctx.kerf);
  let cell = f;
  const lw = f.l - a;
  const lh = f.w - c;
  if (lw > EPS || lh > EPS) {
    if (yFirst(ctx.split, f, a, c)) {
      const low: RegionNode = { x: f.x, y: f.y, l: f.l, w: c };
      const high: RegionNode = { x: f.x, y: f.y + c, l: f.l, w: lh };
      if (lh > EPS) {
        f.cut = { axis: 'y', at: f.y + c };
        f.kids = [low, high];
        keep(ctx, high, sheet.free);
        cell = low;
      }
      if (lw > EPS) {
        const left: RegionNode = { x: cell.x, y: cell.y, l: a, w: c };
        const right: RegionNode = { x: cell.x + a, y: cell.y, l: lw, w: c };
        cell.cut = { axis: 'x', at: cell.x + a };
        cell.kids = [left, right];
        keep(ctx, right, sheet.free);
        cell = left;
      }
    } else {
      const left: RegionNode = { x: f.x, y: f.y, l: a, w: f.w };
      const right: RegionNode = { x: f.x + a, y: f.y, l: lw, w: f.w };
      f.cut = { axis: 'x', at: f.x + a };
      f.kids = [left, right];
      keep(ctx, right, sheet.free);
      cell = left;
      if (lh > EPS) {
        const low: RegionNode = { x: cell.x, y: cell.y, l: a, w: c };
        const high: RegionNode = { x: cell.x, y: cell.y + c, l: a, w: lh };
        cell.cut = { axis: 'y', at: cell.y + c };
        cell.kids = [low, high];
        keep(ctx, high, sheet.free);
        cell = low;
      }
    }
  }
  cell.item = { id, rotated };
}

export type NestOptions = { fit: Fit; split: Split };

/** The smallest side of any part: free pieces narrower than this plus a kerf can hold nothing and are dropped. */
export function smallestSide(items: readonly NestItem[]): number {
  let minSide = Infinity;
  for (const it of items) minSide = Math.min(minSide, it.l, it.w);
  return minSide;
}

/** The free piece of `s` (and the way round) that a grown a0 × c0 part fits best, or null. */
function bestFree(s: PackedSheet, it: NestItem, a0: number, c0: number, fit: Fit): { f: RegionNode; a: number; c: number; rot: boolean; score: number } | null {
  let best: { f: RegionNode; a: number; c: number; rot: boolean; score: number } | null = null;
  for (const f of s.free) {
    if (a0 <= f.l + EPS && c0 <= f.w + EPS) {
      const sc = score(fit, f, a0, c0);
      if (!best || sc < best.score) best = { f, a: a0, c: c0, rot: false, score: sc };
    }
    if (it.rotatable && c0 <= f.l + EPS && a0 <= f.w + EPS) {
      const sc = score(fit, f, c0, a0);
      if (!best || sc < best.score) best = { f, a: c0, c: a0, rot: true, score: sc };
    }
  }
  return best;
}

/**
 * One sheet of `kind` filled from `items` in the order given: each part into the free piece it fits best, a part
 * that fits nowhere left for a later sheet. `minSide` is the smallest side among every part still to place.
 */
export function fillSheet(items: readonly NestItem[], kind: SheetKind, kerf: number, opts: NestOptions & { minSide: number }): { sheet: PackedSheet; placed: number[] } {
  const ctx: Ctx = { kerf, minSide: opts.minSide, split: opts.split };
  const root: RegionNode = { x: kind.ox, y: kind.oy, l: kind.L + kerf, w: kind.W + kerf };
  const sheet: PackedSheet = { kind, root, free: [root], used: 0 };
  const placed: number[] = [];
  for (const it of items) {
    if (!sheet.free.length) break;
    const b = bestFree(sheet, it, it.l + kerf, it.w + kerf, opts.fit);
    if (!b) continue;
    place(ctx, sheet, b.f, b.a, b.c, it.id, b.rot);
    placed.push(it.id);
  }
  return { sheet, placed };
}

/**
 * One pass of global best fit: items in the given order, each into the best-fitting free region of any open sheet,
 * or onto a new sheet of the first kind (in `kinds` order) that still has sheets and takes it.
 */
export function nest(items: readonly NestItem[], kinds: readonly SheetKind[], kerf: number, opts: NestOptions): PackedSheet[] | null {
  let minSide = Infinity;
  for (const it of items) minSide = Math.min(minSide, it.l, it.w);
  const ctx: Ctx = { kerf, minSide, split: opts.split };
  const sheets: PackedSheet[] = [];
  const left = kinds.map((k) => k.qty);
  for (const it of items) {
    let best: { s: PackedSheet; f: RegionNode; a: number; c: number; rot: boolean } | null = null;
    let bestScore = Infinity;
    const a0 = it.l + kerf;
    const c0 = it.w + kerf;
    for (const s of sheets) {
      for (const f of s.free) {
        if (a0 <= f.l + EPS && c0 <= f.w + EPS) {
          const sc = score(opts.fit, f, a0, c0);
          if (sc < bestScore) (bestScore = sc), (best = { s, f, a: a0, c: c0, rot: false });
        }
        if (it.rotatable && c0 <= f.l + EPS && a0 <= f.w + EPS) {
          const sc = score(opts.fit, f, c0, a0);
          if (sc < bestScore) (bestScore = sc), (best = { s, f, a: c0, c: a0, rot: true });
        }
      }
    }
    if (!best) {
      const k = kinds.findIndex((kd, i) => left[i] !== 0 && ((a0 <= kd.L + kerf + EPS && c0 <= kd.W + kerf + EPS) || (it.rotatable && c0 <= kd.L + kerf + EPS && a0 <= kd.W + kerf + EPS)));
      if (k < 0) return null;
      if (left[k] !== null) left[k] = (left[k] as number) - 1;
      const kd = kinds[k];
      const root: RegionNode = { x: kd.ox, y: kd.oy, l: kd.L + kerf, w: kd.W + kerf };
      const s: PackedSheet = { kind: kd, root, free: [root], used: 0 };
      sheets.push(s);
      const straight = a0 <= root.l + EPS && c0 <= root.w + EPS;
      const sa = straight ? a0 : c0;
      const sc = straight ? c0 : a0;
      // On an empty sheet, prefer the orientation whose leftover is one clean strip (best score).
      if (straight && it.rotatable && c0 <= root.l + EPS && a0 <= root.w + EPS && score(opts.fit, root, c0, a0) < score(opts.fit, root, a0, c0)) {
        place(ctx, s, root, c0, a0, it.id, true);
      } else place(ctx, s, root, sa, sc, it.id, !straight);
      continue;
    }
    place(ctx, best.s, best.f, best.a, best.c, it.id, best.rot);
  }
  return sheets;
}
