import { all, create, type MathNode, type Unit } from 'mathjs';
import { InputError } from '../errors';

/** Exactly 25.4 mm to the inch (NIST; US Federal Register notice of 1 July 1959). */
export const MM_PER_INCH = 25.4;
/** Standard gravity, used to turn a mass placed on a member into its weight (CGPM 1901, exact). */
export const STANDARD_GRAVITY = 9.80665;

/** Tape-measure resolutions we print inches to (a power of two). */
export type InchFraction = 2 | 4 | 8 | 16 | 32 | 64;

// A private instance so nothing we configure leaks into other users of mathjs.
const math = create(all, { number: 'number' });

const ALLOWED_OPERATORS = new Set(['add', 'subtract', 'multiply', 'divide', 'unaryMinus', 'unaryPlus']);
const MAX_INPUT = 200;

/** How a quantity kind is recognised and what a bare number means for it. */
type Kind = {
  noun: string;
  examples: string;
  /** mathjs unit whose dimension the result must have, and the unit we return numbers in. */
  base: string;
  bare: string;
  /** Other dimensions accepted, each with the factor that turns its value (in `unit`) into `base`. */
  alternatives?: { unit: string; factor: number }[];
};

const LENGTH: Kind = { noun: 'a length', examples: '"750 mm", "29 1/2 in", "3 ft - 40 mm"', base: 'mm', bare: 'mm' };
const FORCE: Kind = {
  noun: 'a force',
  examples: '"500 N", "112 lbf", "25 kg"',
  base: 'N',
  bare: 'N',
  alternatives: [{ unit: 'kg', factor: STANDARD_GRAVITY }],
};
const MASS: Kind = { noun: 'a mass', examples: '"25 kg", "55 lb"', base: 'kg', bare: 'kg' };
const FORCE_PER_LENGTH: Kind = {
  noun: 'a load per length',
  examples: '"2 N/mm", "10 lbf/in", "100 N/m"',
  base: 'N/mm',
  bare: 'N/mm',
  alternatives: [{ unit: 'kg/mm', factor: STANDARD_GRAVITY }],
};

/**
 * Rewrite shop notation into something mathjs reads the way a builder means it:
 * - `29 1/2` is a mixed number, not 29 × 1/2 (mathjs would multiply), so it becomes `(29 + 1/2)`;
 * - `"` and `'` are inch and foot marks; `in` becomes `inch` because mathjs also uses `in` for conversions;
 * - a foot value followed straight by another number (`5 ft 3 in`, `5' 3"`) is a sum, not a product.
 */
export function normaliseExpression(text: string): string {
  return text
    .replace(/[×✕]/g, '*')
    .replace(/[−–]/g, '-')
    .replace(/⁄/g, '/')
    .replace(/[″”“]/g, '"')
    .replace(/[′’‘]/g, "'")
    .replace(/"/g, ' inch ')
    .replace(/'/g, ' ft ')
    .replace(/\b(in|ins|inches)\b/g, 'inch')
    .replace(/(?<![\d.])(\d+)\s+(\d+)\s*\/\s*(\d+)(?![\d.])/g, '($1 + $2/$3)')
    .replace(/\b(ft|feet|foot)\s+(?=[\d(.])/g, '$1 + ')
    .replace(/\s+/g, ' ')
    .trim();
}

function checkNodes(root: MathNode, field: string, text: string): void {
  root.traverse((node) => {
    switch (node.type) {
      case 'ConstantNode':
      case 'ParenthesisNode':
        return;
      case 'OperatorNode': {
        const fn = (node as unknown as { fn: string }).fn;
        if (!ALLOWED_OPERATORS.has(fn)) throw new InputError(field, `${field}: "${text}" uses an operator we don't accept here`);
        return;
      }
      case 'SymbolNode': {
        const name = (node as unknown as { name: string }).name;
        if (!math.Unit.isValuelessUnit(name)) throw new InputError(field, `${field}: "${name}" is not a unit we know (in "${text}")`);
        return;
      }
      default:
        throw new InputError(field, `${field}: "${text}" is not a plain quantity`);
    }
  });
}

function describe(u: Unit): string {
  const dims: [string, string][] = [
    ['m', 'a length'],
    ['kg', 'a mass'],
    ['N', 'a force'],
    ['N/m', 'a force per length'],
    ['kg/m', 'a mass per length'],
    ['s', 'a time'],
    ['m^2', 'an area'],
  ];
  for (const [unit, noun] of dims) if (u.equalBase(math.unit(unit))) return noun;
  return 'a different kind of quantity';
}

const clean = (v: number): number => Math.round(v * 1e9) / 1e9;

function parseQuantity(text: string, field: string, kind: Kind): number {
  const bad = (why: string) => new InputError(field, `${field}: ${why}; expected ${kind.noun} such as ${kind.examples}`);
  if (typeof text !== 'string' || text.trim() === '') throw bad('no value given');
  if (text.length > MAX_INPUT) throw bad(`the value is longer than ${MAX_INPUT} characters`);
  let node: MathNode;
  try {
    node = math.parse(normaliseExpression(text));
  } catch {
    throw bad(`"${text}" could not be read`);
  }
  checkNodes(node, field, text);
  let value: unknown;
  try {
    value = node.evaluate();
  } catch {
    throw bad(`"${text}" could not be worked out (mixing units that don't add up?)`);
  }
  let result: number;
  if (typeof value === 'number') {
    result = math.unit(value, kind.bare).toNumber(kind.base);
  } else if (math.isUnit(value)) {
    const u = value as Unit;
    if (u.value === null) throw bad(`"${text}" has a unit but no number`);
    const base = math.unit(kind.base);
    const alt = kind.alternatives?.find((a) => u.equalBase(math.unit(a.unit)));
    if (u.equalBase(base)) result = u.toNumber(kind.base);
    else if (alt) result = u.toNumber(alt.unit) * alt.factor;
    else throw bad(`"${text}" is ${describe(u)}`);
  } else {
    throw bad(`"${text}" is not a single quantity`);
  }
  if (!Number.isFinite(result)) throw bad(`"${text}" is not a finite value`);
  return clean(result);
}

/** A length in millimetres. A bare number is millimetres. Accepts sums, products and shop fractions. */
export function parseLength(text: string, field = 'length'): number {
  return parseQuantity(text, field, LENGTH);
}

/**
 * A force in newtons. A bare number is newtons. A mass ("25 kg", "55 lb") is taken as the weight of that mass
 * under standard gravity (× 9.80665 m/s²), since loads are usually known as the mass of what sits on a member.
 */
export function parseForce(text: string, field = 'force'): number {
  return parseQuantity(text, field, FORCE);
}

/** A mass in kilograms. A bare number is kilograms; "lb" is the pound mass (0.45359237 kg). */
export function parseMass(text: string, field = 'mass'): number {
  return parseQuantity(text, field, MASS);
}

/**
 * A distributed load in N/mm. A bare number is N/mm. A mass per length ("5 kg/m") is taken as its weight under
 * standard gravity, as for parseForce.
 */
export function parseForcePerLength(text: string, field = 'load'): number {
  return parseQuantity(text, field, FORCE_PER_LENGTH);
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
