// Drawer-and-panel jobs as a builder would send them: galleys of one to three bays with drawer stacks, their faces,
// the bays' side and back panels and a countertop, sized by the engine and split by sheet thickness (one job per
// material). Invented sizes, generated from a seed.
import { bayPanel, countertop, drawerBox, drawerFaces, slidePreset, type SheetPart } from '../../shared/panels/index';
import type { SheetJob } from '../../shared/sheets/index';
import { mulberry32 } from './classes';

export type CabinetJob = { name: string; seed: number; job: SheetJob };

export function cabinetJobs(seed: number): CabinetJob[] {
  const rand = mulberry32(seed);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)];
  const bays = 1 + Math.floor(rand() * 3);
  const depth = pick([450, 500, 560, 600]);
  const height = pick([650, 720, 850]);
  const parts: SheetPart[] = [];
  let runLength = 0;
  for (let b = 0; b < bays; b++) {
    const width = pick([300, 400, 450, 500, 600]);
    runLength += width + 40;
    const drawers = 2 + Math.floor(rand() * 3);
    const shares = Array.from({ length: drawers }, () => pick([1, 1, 1.5, 2]));
    const total = shares.reduce((a, s) => a + s, 0);
    const slide = slidePreset(pick(['side-mount', 'under-mount'] as const));
    for (const s of shares) {
      const box = drawerBox({ opening: { width_mm: width, height_mm: (height * s) / total, depth_mm: depth - 20 }, slide, thickness_mm: 12, joint: pick(['butt', 'dado'] as const) });
      parts.push(...box.parts.map((p) => ({ ...p, name: `B${b + 1} ${p.name}` })));
    }
    parts.push(...drawerFaces({ opening: { width_mm: width, height_mm: height }, style: pick(['inset', 'overlay'] as const), shares, thickness_mm: 15 }).parts.map((p) => ({ ...p, name: `B${b + 1} ${p.name}` })));
    parts.push({ ...bayPanel({ name: `B${b + 1} back`, opening: { length_mm: width, width_mm: height }, mount: 'surface', thickness_mm: 6, slot_mm: 8, profile_mm: 40 }).part });
  }
  for (const side of ['left', 'right']) {
    parts.push({ ...bayPanel({ name: `Side ${side}`, opening: { length_mm: depth - 80, width_mm: height }, mount: 'surface', thickness_mm: 15, slot_mm: 8, profile_mm: 40 }).part });
  }
  parts.push(countertop({ run: { length_mm: runLength + 40, depth_mm: depth }, overhang: { front_mm: 25, back_mm: 0, left_mm: 0, right_mm: 0 }, thickness_mm: 15 }).part);
  const byThickness = new Map<number, SheetPart[]>();
  for (const p of parts) byThickness.set(p.thickness_mm, [...(byThickness.get(p.thickness_mm) ?? []), p]);
  return [...byThickness].map(([t, ps]) => ({
    name: `galley-s${seed}-${t}mm`,
    seed,
    job: {
      kerf: 3,
      trim: 10,
      sheets: [{ length: 2440, width: 1220, price: 60 }],
      parts: ps.map((p) => ({ length: Math.round(p.length_mm * 10) / 10, width: Math.round(p.width_mm * 10) / 10, qty: p.qty, label: p.name, grain: p.grain })),
    },
  }));
}
