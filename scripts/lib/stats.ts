/** The value at fraction q (0..1) of an ascending list, taken at rank floor(q·n) without interpolation; NaN when empty. */
export function quantile(sorted: readonly number[], q: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? NaN;
}
