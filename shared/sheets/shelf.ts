// Plain shelf first-fit decreasing (first-fit decreasing height, shelves across the sheet's length): the textbook
// baseline the guillotine planner is measured against. Parts sorted by height; each goes on the first shelf of any
// sheet with room, else on a new shelf, else on a new sheet. Counts sheets only; one sheet size.
import type { BoundItem } from './bounds';

export function shelfFirstFit(items: readonly BoundItem[], sheet: { L: number; W: number }, kerf: number): number {
  const GL = sheet.L + kerf;
  const GW = sheet.W + kerf;
  // Lay each part flat (longer side along the length) where it may turn and still fits.
  const laid = items.map((it) => {
    const a = it.l + kerf;
    const c = it.w + kerf;
    if (it.rotatable && c > a && c <= GL && a <= GW) return { a: c, c: a };
    if (a <= GL && c <= GW) return { a, c };
    return { a: c, c: a };
  });
  laid.sort((p, q) => q.c - p.c || q.a - p.a);
  type Shelf = { h: number; used: number };
  const sheets: { shelves: Shelf[]; height: number }[] = [];
  for (const p of laid) {
    let done = false;
    for (const s of sheets) {
      for (const sh of s.shelves) {
        if (p.c <= sh.h + 1e-9 && sh.used + p.a <= GL + 1e-9) {
          sh.used += p.a;
          done = true;
          break;
        }
      }
      if (done) break;
    }
    if (done) continue;
    const host = sheets.find((s) => s.height + p.c <= GW + 1e-9);
    if (host) {
      host.shelves.push({ h: p.c, used: p.a });
      host.height += p.c;
    } else sheets.push({ shelves: [{ h: p.c, used: p.a }], height: p.c });
  }
  return sheets.length;
}
