// An exhaustive optimum for tiny sheet jobs, to hold the lower bounds against: every way of sharing the parts
// among sheets, each sheet's share tested by trying every guillotine split. Cut positions need only be tried at
// sums of part extents (plus kerfs): any guillotine packing can be pushed left and down until every cut is there.
import type { BoundItem } from '@shared/sheets/index';

export function bruteForceSheets(items: readonly BoundItem[], L: number, W: number, kerf: number): number {
  const n = items.length;
  const memo = new Map<string, boolean>();
  const extentMemo = new Map<number, number[]>();
  const extents = (mask: number, axis: 0 | 1): number[] => {
    const cached = extentMemo.get(mask * 2 + axis);
    if (cached) return cached;
    // Every sum of one extent from some of the parts in `mask` (either side where the part may turn), plus kerfs.
    let sums = new Set<number>([0]);
    for (let i = 0; i < n; i++) {
      if (!(mask & (1 << i))) continue;
      const it = items[i];
      const opts = it.rotatable ? [it.l, it.w] : [axis === 0 ? it.l : it.w];
      const next = new Set(sums);
      for (const s of sums) for (const o of opts) next.add(s + o + kerf);
      sums = next;
    }
    const out = [...sums].filter((s) => s > 0).map((s) => s - kerf);
    extentMemo.set(mask * 2 + axis, out);
    return out;
  };
  const fits = (mask: number, l: number, w: number): boolean => {
    if (l <= 0 || w <= 0) return false;
    const key = `${mask}|${l}|${w}`;
    const hit = memo.get(key);
    if (hit !== undefined) return hit;
    let ok = false;
    if ((mask & (mask - 1)) === 0) {
      const it = items[31 - Math.clz32(mask)];
      ok = (it.l <= l && it.w <= w) || (it.rotatable && it.w <= l && it.l <= w);
    } else {
      for (let sub = (mask - 1) & mask; sub && !ok; sub = (sub - 1) & mask) {
        const rest = mask & ~sub;
        for (const a of extents(sub, 0)) if (a < l && fits(sub, a, w) && fits(rest, l - a - kerf, w)) { ok = true; break; }
        if (ok) break;
        for (const b of extents(sub, 1)) if (b < w && fits(sub, l, b) && fits(rest, l, w - b - kerf)) { ok = true; break; }
      }
    }
    memo.set(key, ok);
    return ok;
  };
  // Fewest blocks over all set partitions of the parts.
  let best = n;
  const blocks: number[] = [];
  const go = (i: number): void => {
    if (blocks.length >= best) return;
    if (i === n) {
      best = blocks.length;
      return;
    }
    for (let b = 0; b < blocks.length; b++) {
      const was = blocks[b];
      blocks[b] = was | (1 << i);
      if (fits(blocks[b], L, W)) go(i + 1);
      blocks[b] = was;
    }
    blocks.push(1 << i);
    go(i + 1);
    blocks.pop();
  };
  go(0);
  return best;
}
