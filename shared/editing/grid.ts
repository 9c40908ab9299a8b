import { MM_PER_INCH } from '../geometry/units';

export type GridUnit = 'mm' | 'in';

/** Steps a builder reads off a metric rule or a tape (mm). */
const METRIC_STEPS = [0.5, 1, 2, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000];
/** Inch steps: tape fractions, then whole inches, feet. */
const INCH_STEPS = [1 / 32, 1 / 16, 1 / 8, 1 / 4, 1 / 2, 1, 2, 6, 12, 24, 60, 120].map((i) => i * MM_PER_INCH);

export type GridSteps = { minor: number; major: number };

/**
 * The grid for a zoom: the finest step at least `minPx` apart on screen, and a major step that is a readable
 * multiple of it (5 or 10 minor in mm; in inches the next step that is a whole multiple: 1 in, 12 in).
 */
export function gridSteps(scale: number, unit: GridUnit, minPx = 10): GridSteps {
  const steps = unit === 'mm' ? METRIC_STEPS : INCH_STEPS;
  const minor = steps.find((s) => s * scale >= minPx) ?? steps[steps.length - 1];
  const i = steps.indexOf(minor);
  let major = minor * 10;
  if (unit === 'in') {
    major = steps.slice(i + 1).find((s) => s * scale >= minPx * 6 && Math.abs(s / minor - Math.round(s / minor)) < 1e-9) ?? minor * 12;
  } else {
    const five = minor * 5;
    major = five * scale >= minPx * 6 ? five : minor * 10;
  }
  return { minor, major };
}

/** Multiples of `step` from `from` to `to` (inclusive), at most `limit` of them. */
export function gridValues(from: number, to: number, step: number, limit = 2000): number[] {
  const out: number[] = [];
  if (!(step > 0)) return out;
  const first = Math.ceil(from / step - 1e-9);
  const last = Math.floor(to / step + 1e-9);
  for (let k = first; k <= last && out.length < limit; k++) out.push(k * step);
  return out;
}

/** Nearest multiple of `step`. */
export const snapToStep = (value: number, step: number): number => (step > 0 ? Math.round(value / step) * step : value);
