import { InputError } from '../errors';
import { parseQuantity, type ParseOptions, type QuantityKind } from './quantity-parser';

/** Exactly 25.4 mm to the inch (NIST; US Federal Register notice of 1 July 1959). */
export const MM_PER_INCH = 25.4;
/** Standard gravity, used to turn a mass placed on a member into its weight (CGPM 1901, exact). */
export const STANDARD_GRAVITY = 9.80665;

/** Tape-measure resolutions we print inches to (a power of two). */
export type InchFraction = 2 | 4 | 8 | 16 | 32 | 64;

export type { ParseOptions } from './quantity-parser';

export type LengthOptions = ParseOptions & {
  /** What a bare number is: millimetres (the default) or inches, the unit on screen. */
  bare?: 'mm' | 'in';
};

const LENGTH = (bare: 'mm' | 'in'): QuantityKind => ({
  noun: 'a length',
  examples: bare === 'in' ? '"29 1/2", "2 ft 3-1/2 in", "750 mm"' : '"750 mm", "29 1/2 in", "3 ft - 40 mm"',
  dim: [1, 0, 0],
  bareFactor: bare === 'in' ? MM_PER_INCH : 1,
});
const FORCE: QuantityKind = {
  noun: 'a force',
  examples: '"500 N", "112 lbf", "25 kg"',
  dim: [0, 0, 1],
  alternatives: [{ dim: [0, 1, 0], factor: STANDARD_GRAVITY }],
  bareFactor: 1,
};
/** The avoirdupois pound, exactly 0.45359237 kg (international yard and pound agreement, 1959; NIST SP 811 B.8). */
export const KG_PER_LB = 0.45359237;
const MASS = (bare: 'kg' | 'lb'): QuantityKind => ({
  noun: 'a mass',
  examples: bare === 'lb' ? '"55 lb", "25 kg"' : '"25 kg", "55 lb"',
  dim: [0, 1, 0],
  bareFactor: bare === 'lb' ? KG_PER_LB : 1,
});
const FORCE_PER_LENGTH: QuantityKind = {
  noun: 'a load per length',
  examples: '"2 N/mm", "10 lbf/in", "100 N/m"',
  dim: [-1, 0, 1],
  alternatives: [{ dim: [-1, 1, 0], factor: STANDARD_GRAVITY }],
  bareFactor: 1,
};

/**
 * A length in millimetres. A bare number is in `opts.bare` (millimetres unless told). Reads shop notation
 * (`2 ft 3-1/2 in`, `2'3-1/2"`, `29 ½`), sums, differences and products; see quantity-parser.ts.
 */
export function parseLength(text: string, field = 'length', opts: LengthOptions = {}): number {
  return parseQuantity(text, field, LENGTH(opts.bare ?? 'mm'), opts);
}

/**
 * A force in newtons. A bare number is newtons. A mass ("25 kg", "55 lb") is taken as the weight of that mass
 * under standard gravity (× 9.80665 m/s²), since loads are usually known as the mass of what sits on a member.
 */
export function parseForce(text: string, field = 'force', opts: ParseOptions = {}): number {
  return parseQuantity(text, field, FORCE, opts);
}

export type MassOptions = ParseOptions & {
  /** What a bare number is: kilograms (the default) or pounds, the unit on screen. */
  bare?: 'kg' | 'lb';
};

/** A mass in kilograms. A bare number is in `opts.bare` (kilograms unless told); "lb" is the pound mass (0.45359237 kg). */
export function parseMass(text: string, field = 'mass', opts: MassOptions = {}): number {
  return parseQuantity(text, field, MASS(opts.bare ?? 'kg'), opts);
}

/**
 * 1 lb/ft³ in kg/m³: 0.45359237 kg / (0.3048 m)³ = 16.018463… kg/m³, exact from the definitions of the pound and
 * the foot (international yard and pound agreement, 1959).
 */
export const KG_M3_PER_LB_FT3 = KG_PER_LB / 0.3048 ** 3;

export type DensityUnit = 'kg/m3' | 'lb/ft3';
export type DensityOptions = ParseOptions & {
  /** What a bare number is: kg/m³ (the default) or lb/ft³, the unit on screen. */
  bare?: DensityUnit;
};

// The parser has no powers, so a density's unit is read off the end as a whole; what stands before it is a number
// (or a sum of them).
const DENSITY_UNITS: [RegExp, number][] = [
  [/kg\s*\/\s*m(?:³|\^?3)$/i, 1],
  [/(?<![a-z])g\s*\/\s*cm(?:³|\^?3)$/i, 1000],
  [/(?:lbs?|pounds?)\s*\/\s*(?:ft|foot)(?:³|\^?3)$/i, KG_M3_PER_LB_FT3],
  [/(?<![a-z])pcf$/i, KG_M3_PER_LB_FT3],
];

/** A density in kg/m³: "680", "680 kg/m³", "42.5 lb/ft3", "0.68 g/cm³"; a bare number is in `opts.bare`. */
export function parseDensity(text: string, field = 'density', opts: DensityOptions = {}): number {
  const bare = opts.bare ?? 'kg/m3';
  const kind: QuantityKind = {
    noun: 'a density',
    examples: bare === 'lb/ft3' ? '"42.5 lb/ft³", "680 kg/m³"' : '"680 kg/m³", "42.5 lb/ft³"',
    dim: [0, 0, 0],
    bareFactor: 1,
  };
  const t = typeof text === 'string' ? text.trim() : text;
  const unit = typeof t === 'string' ? DENSITY_UNITS.find(([re]) => re.test(t)) : undefined;
  const number = unit ? t.replace(unit[0], '') : t;
  const factor = unit ? unit[1] : bare === 'lb/ft3' ? KG_M3_PER_LB_FT3 : 1;
  if (unit && number.trim() === '') throw new InputError(field, `${field}: "${t}" has a unit but no number; expected ${kind.noun} such as ${kind.examples}`);
  const v = parseQuantity(number, field, kind, opts) * factor;
  return Math.round(v * 1e9) / 1e9;
}

/**
 * A distributed load in N/mm. A bare number is N/mm. A mass per length ("5 kg/m") is taken as its weight under
 * standard gravity, as for parseForce.
 */
export function parseForcePerLength(text: string, field = 'load', opts: ParseOptions = {}): number {
  return parseQuantity(text, field, FORCE_PER_LENGTH, opts);
}

/** Whether the reader's locale writes decimals with a comma (1,5), from Intl's own number format. */
// Making a number format costs about a millisecond, and the editor's fields ask on every mount.
const decimalCommaByLocale = new Map<string, boolean>();

export function localeUsesDecimalComma(locale?: string): boolean {
  const key = locale ?? '';
  const known = decimalCommaByLocale.get(key);
  if (known !== undefined) return known;
  let comma = false;
  try {
    comma = new Intl.NumberFormat(locale).formatToParts(1.5).find((p) => p.type === 'decimal')?.value === ',';
  } catch {
    comma = false;
  }
  if (decimalCommaByLocale.size < 64) decimalCommaByLocale.set(key, comma);
  return comma;
}

export const mmToInches = (mm: number): number => mm / MM_PER_INCH;
export const inchesToMm = (inches: number): number => inches * MM_PER_INCH;

export type FractionalInches = {
  negative: boolean;
  whole: number;
  /** Numerator and denominator of the fractional part, in lowest terms (0 / 1 when there is none). */
  num: number;
  den: number;
  /** The rounded value in inches, signed. */
  inches: number;
  /** e.g. `16 31/32"`, `1/16"`, `12"`, `-3/4"`. */
  text: string;
};

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

/** Round a length to the nearest 1/frac inch, as read off a shop tape. */
export function toFractionalInches(mm: number, frac: InchFraction = 16): FractionalInches {
  const exact = Math.abs(mm) / MM_PER_INCH;
  // Trim float noise first so a value exactly on a half step rounds the same way every time.
  const steps = Math.round(Math.round(exact * frac * 1e9) / 1e9);
  const negative = mm < 0 && steps > 0;
  const whole = Math.floor(steps / frac);
  const rem = steps % frac;
  const g = rem === 0 ? frac : gcd(rem, frac);
  const num = rem / g;
  const den = rem === 0 ? 1 : frac / g;
  const body = rem === 0 ? `${whole}` : whole === 0 ? `${num}/${den}` : `${whole} ${num}/${den}`;
  return { negative, whole, num, den, inches: (negative ? -steps : steps) / frac, text: `${negative ? '-' : ''}${body}"` };
}

/** "749.3 mm" (nearest 0.1 mm, no trailing ".0") or `29 1/2"` (nearest 1/frac inch). */
export function formatLength(mm: number, unit: 'mm' | 'in', frac: InchFraction = 16): string {
  if (unit === 'in') return toFractionalInches(mm, frac).text;
  const tenths = Math.round(mm * 10);
  const v = tenths / 10;
  return `${Object.is(v, -0) ? 0 : v} mm`;
}
