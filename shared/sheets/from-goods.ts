// Sheet jobs from a frame's sheet goods: one job per material (parts of one thickness and face come off the same
// sheets), grain kept on every part that shows it.
import type { PlacedPart } from '../panels/sheet-goods';
import { fitsSheet, type SheetJob } from './job';

export type SheetStock = { length: number; width: number; price?: number; qty?: number | null; label?: string };
/** `oversize`: parts larger than every sheet (after trim), left out of the job: join two pieces or buy them whole. */
export type MaterialJob = { materialId: string; material: string; thickness_mm: number; job: SheetJob; oversize: string[] };

/** Common practice (REFERENCES.md "Sheet goods"): 2440 × 1220 mm sheets, a track-saw kerf of about 3 mm, 10 mm trim. */
export const DEFAULT_SHEET: SheetStock = { length: 2440, width: 1220 };
/** The sheet sold where lengths are read in inches: 8 × 4 ft, exactly 2438.4 × 1219.2 mm (1 ft = 304.8 mm exactly). */
export const DEFAULT_INCH_SHEET: SheetStock = { length: 8 * 304.8, width: 4 * 304.8 };

/** The sheet a builder most likely buys, from the unit they read lengths in. */
export const defaultSheetFor = (display: 'mm' | 'in'): SheetStock => ({ ...(display === 'in' ? DEFAULT_INCH_SHEET : DEFAULT_SHEET) });

/**
 * The usual sheet of the frame's unit when the sheet set is the other unit's (a frame that took 2440 × 1220 mm before
 * it read inches): offered to the builder rather than swapped, since a stored sheet is never changed behind them.
 */
export function usualSheetInstead(sheet: SheetStock, display: 'mm' | 'in'): SheetStock | null {
  const other = display === 'in' ? DEFAULT_SHEET : DEFAULT_INCH_SHEET;
  const same = (a: number, b: number) => Math.abs(a - b) < 1e-6;
  if (!same(sheet.length, other.length) || !same(sheet.width, other.width)) return null;
  return { ...sheet, ...defaultSheetFor(display) };
}
export const DEFAULT_SHEET_KERF = 3;
export const DEFAULT_SHEET_TRIM = 10;

export function sheetJobsFromParts(parts: readonly PlacedPart[], opts: { sheets?: SheetStock[]; kerf?: number; trim?: number } = {}): MaterialJob[] {
  const by = new Map<string, PlacedPart[]>();
  for (const p of parts) by.set(p.material.id, [...(by.get(p.material.id) ?? []), p]);
  const round = (v: number): number => Math.round(v * 10) / 10;
  const trim = opts.trim ?? DEFAULT_SHEET_TRIM;
  const sheets = opts.sheets ?? [DEFAULT_SHEET];
  return [...by].map(([id, ps]) => {
    const parts = ps.map((p) => ({ length: round(p.length_mm), width: round(p.width_mm), qty: p.qty, label: p.name.slice(0, 120), grain: p.grain }));
    const fits = (p: (typeof parts)[number]) => sheets.some((s) => s.qty !== 0 && fitsSheet(p, s, trim));
    return {
      materialId: id,
      material: ps[0].material.name,
      thickness_mm: ps[0].material.thickness_mm,
      job: { kerf: opts.kerf ?? DEFAULT_SHEET_KERF, trim, sheets, parts: parts.filter(fits) },
      oversize: parts.filter((p) => !fits(p)).map((p) => `${p.label} (${p.length} × ${p.width} mm)`),
    };
  });
}
