import type { ToleranceClass } from '../model/settings';

/**
 * ISO 2768-1 general tolerances for linear dimensions, ± mm, by nominal size range (over the lower bound, up to
 * and including the upper). The 400–1000 and 1000–2000 mm rows are from REFERENCES.md [S]; the other rows are
 * recalled from the standard's table, not confirmed against the document. `null`: the class gives no value there.
 */
const RANGES_MM = [3, 6, 30, 120, 400, 1000, 2000, 4000];
const TABLE: Readonly<Record<ToleranceClass, readonly (number | null)[]>> = {
  f: [0.05, 0.05, 0.1, 0.15, 0.2, 0.3, 0.5, null],
  m: [0.1, 0.1, 0.2, 0.3, 0.5, 0.8, 1.2, 2],
  c: [0.2, 0.3, 0.5, 0.8, 1.2, 2, 3, 4],
  v: [null, 0.5, 1, 1.5, 2.5, 4, 6, 8],
};

export const TOLERANCE_CLASS_NAMES: Readonly<Record<ToleranceClass, string>> = {
  f: 'ISO 2768-1 f (fine)',
  m: 'ISO 2768-1 m (medium)',
  c: 'ISO 2768-1 c (coarse)',
  v: 'ISO 2768-1 v (very coarse)',
};

/** The ± tolerance for a length, or null outside the table (under 0.5 mm, over 4000 mm, or a blank cell). */
export function iso2768Tolerance(length_mm: number, cls: ToleranceClass): number | null {
  if (!(length_mm >= 0.5)) return null;
  const k = RANGES_MM.findIndex((upper) => length_mm <= upper);
  return k < 0 ? null : TABLE[cls][k];
}
