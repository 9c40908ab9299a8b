// Certified lower bounds on the number of sheets a job needs, valid for any packing (guillotine or not).
//
// Grown sizes (each part and the usable area grown by one kerf on its far sides) turn "one kerf apart" into "edge to
// edge", so every bound below works on grown sizes.
//  - Area: the parts' grown area against the largest sheets' grown areas.
//  - Big parts: a part longer than half the sheet's length AND wider than half its width (in every way it may lie)
//    cannot share a sheet with another such part, so each needs a sheet of its own.
//  - Long parts: parts longer than half the sheet's length (every way they may lie) cannot stand side by side along
//    the length, so on one sheet their widths stack: Σ width ≤ sheet width, a one-dimensional bin packing whose
//    own bounds (total, and parts over half) apply. The same across the width.
// The last two assume one sheet size; with mixed sizes only the area bound is used.

export type BoundItem = { l: number; w: number; rotatable: boolean };
export type BoundSheet = { L: number; W: number; qty: number | null };

const EPS = 1e-9;

export function areaBound(items: readonly BoundItem[], sheets: readonly BoundSheet[], kerf: number): number {
  let need = 0;
  for (const it of items) need += (it.l + kerf) * (it.w + kerf);
  const kinds = [...sheets].filter((s) => s.qty !== 0).map((s) => ({ a: (s.L + kerf) * (s.W + kerf), qty: s.qty })).sort((x, y) => y.a - x.a);
  let count = 0;
  for (const k of kinds) {
    if (need <= EPS) break;
    if (k.qty === null) return count + Math.ceil(need / k.a - 1e-9);
    const take = Math.min(k.qty, Math.ceil(need / k.a - 1e-9));
    count += take;
    need -= take * k.a;
  }
  // Not enough area even with every sheet on hand: the bound is every sheet (planning will fail and say so).
  return count;
}

/** Orientations (grown extents along the sheet's length and width) in which the part fits the sheet. */
function ways(it: BoundItem, L: number, W: number, kerf: number): [number, number][] {
  const out: [number, number][] = [];
  const a = it.l + kerf;
  const c = it.w + kerf;
  if (a <= L + kerf + EPS && c <= W + kerf + EPS) out.push([a, c]);
  if (it.rotatable && c <= L + kerf + EPS && a <= W + kerf + EPS) out.push([c, a]);
  return out;
}

export function strongBound(items: readonly BoundItem[], sheet: { L: number; W: number }, kerf: number): number {
  const GL = sheet.L + kerf;
  const GW = sheet.W + kerf;
  let big = 0;
  const longX: number[] = [];
  const longY: number[] = [];
  for (const it of items) {
    const ws = ways(it, sheet.L, sheet.W, kerf);
    if (!ws.length) continue;
    if (ws.every(([a, c]) => a > GL / 2 + EPS && c > GW / 2 + EPS)) big++;
    if (ws.every(([a]) => a > GL / 2 + EPS)) longX.push(Math.min(...ws.map(([, c]) => c)));
    if (ws.every(([, c]) => c > GW / 2 + EPS)) longY.push(Math.min(...ws.map(([a]) => a)));
  }
  const oneDim = (sizes: number[], cap: number): number => {
    const total = sizes.reduce((s, v) => s + v, 0);
    const overHalf = sizes.filter((v) => v > cap / 2 + EPS).length;
    return Math.max(Math.ceil(total / cap - 1e-9), overHalf);
  };
  return Math.max(big, oneDim(longX, GW), oneDim(longY, GL));
}

/** The best of the bounds above: area always, the others when every sheet on offer has one size. */
export function sheetLowerBound(items: readonly BoundItem[], sheets: readonly BoundSheet[], kerf: number): { lowerBound: number; areaBound: number } {
  const area = areaBound(items, sheets, kerf);
  const offered = sheets.filter((s) => s.qty !== 0);
  const oneSize = offered.every((s) => s.L === offered[0].L && s.W === offered[0].W);
  const strong = oneSize && offered.length ? strongBound(items, offered[0], kerf) : 0;
  return { lowerBound: Math.max(area, strong), areaBound: area };
}
