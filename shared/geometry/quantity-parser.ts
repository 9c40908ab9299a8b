import { InputError } from '../errors';

// The one reader of typed quantities (lengths, forces, masses, loads per length) for the editor, the forms, the
// CSV imports and `calc`. Small on purpose: a general expression library weighs more than the whole editor.
//
// It reads what a builder writes and refuses what a builder could mean two ways:
// - `29 1/2`, `29-1/2`, `29 ½` are mixed numbers (29.5), not products or differences;
// - `2 ft 3-1/2 in`, `2'3-1/2"`, `1 m 20 mm` are one length given in parts, larger unit first;
// - a sign in front of such a length covers all of it: `-2 ft 3 in` is −27″, as a builder means it;
// - `1 m 20` (a bare number after a length) and `1 1/2 1/4 in` (two fractions in a row) are refused, saying how
//   they were read and what to type instead;
// - sums, differences and products (`3 ft - 40 mm`, `2 * 450 mm`, `(600 - 2 * 18) mm`) work as written.

/** Exponents of length, mass and force: N is kept apart from kg·m/s² since loads are given either way. */
type Dim = readonly [number, number, number];
const LENGTH_DIM: Dim = [1, 0, 0];

type UnitDef = { factor: number; dim: Dim; label: string };

const LB_KG = 0.45359237; // exact, international yard and pound agreement of 1959
const G0 = 9.80665; // standard gravity, exact (3rd CGPM, 1901)

const UNIT_LIST: [string[], UnitDef][] = [
  [['mm', 'millimetre', 'millimetres', 'millimeter', 'millimeters'], { factor: 1, dim: LENGTH_DIM, label: 'mm' }],
  [['cm', 'centimetre', 'centimetres', 'centimeter', 'centimeters'], { factor: 10, dim: LENGTH_DIM, label: 'cm' }],
  [['m', 'metre', 'metres', 'meter', 'meters'], { factor: 1000, dim: LENGTH_DIM, label: 'm' }],
  [['in', 'ins', 'inch', 'inches', '"'], { factor: 25.4, dim: LENGTH_DIM, label: 'in' }],
  [['ft', 'foot', 'feet', "'"], { factor: 304.8, dim: LENGTH_DIM, label: 'ft' }],
  [['kg', 'kilogram', 'kilograms', 'kilo', 'kilos'], { factor: 1, dim: [0, 1, 0], label: 'kg' }],
  [['g', 'gram', 'grams'], { factor: 0.001, dim: [0, 1, 0], label: 'g' }],
  [['lb', 'lbs', 'pound', 'pounds'], { factor: LB_KG, dim: [0, 1, 0], label: 'lb' }],
  [['n', 'newton', 'newtons'], { factor: 1, dim: [0, 0, 1], label: 'N' }],
  [['kn', 'kilonewton', 'kilonewtons'], { factor: 1000, dim: [0, 0, 1], label: 'kN' }],
  [['lbf'], { factor: LB_KG * G0, dim: [0, 0, 1], label: 'lbf' }],
  [['kgf'], { factor: G0, dim: [0, 0, 1], label: 'kgf' }],
];
const UNITS = new Map<string, UnitDef>(UNIT_LIST.flatMap(([names, def]) => names.map((n) => [n, def] as const)));

const VULGAR: Record<string, [number, number]> = {
  '½': [1, 2], '⅓': [1, 3], '⅔': [2, 3], '¼': [1, 4], '¾': [3, 4], '⅕': [1, 5], '⅖': [2, 5], '⅗': [3, 5], '⅘': [4, 5],
  '⅙': [1, 6], '⅚': [5, 6], '⅛': [1, 8], '⅜': [3, 8], '⅝': [5, 8], '⅞': [7, 8],
};

export const MAX_QUANTITY_INPUT = 200;
const MAX_DEPTH = 20;
/** Larger than any workshop quantity in its base unit (1000 km, 10⁹ N); beyond it the input is a slip. */
const MAX_MAGNITUDE = 1e9;

type Tok =
  | { t: 'num'; v: number; int: boolean; text: string; sp: boolean; at: number }
  | { t: 'vulgar'; num: number; den: number; text: string; sp: boolean; at: number }
  | { t: 'unit'; def: UnitDef; text: string; sp: boolean; at: number }
  | { t: 'op'; v: '+' | '-' | '*' | '/' | '(' | ')'; text: string; sp: boolean; at: number };

/** A failure inside the reader; parseQuantity adds the field and the examples. */
class Refusal extends Error {}

function tokenize(src: string, decimalComma: boolean): Tok[] {
  const out: Tok[] = [];
  let i = 0;
  let sp = false;
  while (i < src.length) {
    const ch = src[i];
    if (/\s/.test(ch)) {
      sp = true;
      i++;
      continue;
    }
    const at = i;
    const num = /^(\d+(?:[.,]\d*)?|[.,]\d+)(?:e[+-]?\d+)?/i.exec(src.slice(i));
    if (num && /[\d]/.test(num[0])) {
      let text = num[0];
      if (text.includes(',')) {
        if (!decimalComma) throw new Refusal(`"${text}" has a comma; write decimals with a point (1.5) and no thousands separator`);
        text = text.replace(',', '.');
      }
      const v = Number(text);
      if (!Number.isFinite(v) || Math.abs(v) > MAX_MAGNITUDE) throw new Refusal(`"${num[0]}" is far too large to be a workshop measure`);
      out.push({ t: 'num', v, int: /^\d+$/.test(text), text: num[0], sp, at });
      i += num[0].length;
    } else if (VULGAR[ch]) {
      out.push({ t: 'vulgar', num: VULGAR[ch][0], den: VULGAR[ch][1], text: ch, sp, at });
      i++;
    } else if (/[a-zA-Zµ]/.test(ch)) {
      const word = /^[a-zA-Zµ]+/.exec(src.slice(i))![0];
      const def = UNITS.get(word.toLowerCase());
      if (!def) throw new Refusal(`"${word}" is not a unit we know`);
      out.push({ t: 'unit', def, text: word, sp, at });
      i += word.length;
    } else if ('"″”“'.includes(ch)) {
      out.push({ t: 'unit', def: UNITS.get('"')!, text: '"', sp, at });
      i++;
    } else if ("'′’‘".includes(ch)) {
      out.push({ t: 'unit', def: UNITS.get("'")!, text: "'", sp, at });
      i++;
    } else {
      const op = ch === '−' || ch === '–' ? '-' : ch === '×' || ch === '·' || ch === '✕' ? '*' : ch === '⁄' ? '/' : ch;
      if (!'+-*/()'.includes(op)) throw new Refusal(`"${ch}" is not something we read in a quantity`);
      out.push({ t: 'op', v: op as '+' | '-' | '*' | '/' | '(' | ')', text: ch, sp, at });
      i++;
    }
    sp = false;
  }
  return out;
}

type Value = { v: number; dim: Dim; hasNumber: boolean };

const sameDim = (a: Dim, b: Dim) => a[0] === b[0] && a[1] === b[1] && a[2] === b[2];
const isBare = (d: Dim) => d[0] === 0 && d[1] === 0 && d[2] === 0;

class Reader {
  private i = 0;
  private depth = 0;
  constructor(
    private readonly toks: Tok[],
    private readonly src: string,
  ) {}

  private peek(k = 0): Tok | undefined {
    return this.toks[this.i + k];
  }

  private isOp(t: Tok | undefined, v: string): boolean {
    return t?.t === 'op' && t.v === v;
  }

  /** The source text of tokens [from, to). */
  private text(from: number, to: number): string {
    const a = this.toks[from];
    const b = this.toks[to - 1];
    if (!a || !b) return '';
    return this.src.slice(a.at, b.at + b.text.length).trim();
  }

  read(): Value {
    const v = this.expr();
    const rest = this.peek();
    if (rest) throw new Refusal(`"${rest.text}" after "${this.text(0, this.i)}" is not understood`);
    return v;
  }

  private expr(): Value {
    if (++this.depth > MAX_DEPTH) throw new Refusal('it has too many brackets inside each other');
    let left = this.term();
    for (;;) {
      const t = this.peek();
      if (!this.isOp(t, '+') && !this.isOp(t, '-')) break;
      this.i++;
      const right = this.term();
      const sign = (t as { v: string }).v === '+' ? 1 : -1;
      if (!sameDim(left.dim, right.dim)) {
        throw new Refusal(
          isBare(left.dim) || isBare(right.dim)
            ? 'it adds a bare number to a quantity with a unit; give every part its unit (e.g. "3 ft + 4 in")'
            : 'it adds quantities of different kinds',
        );
      }
      left = { v: left.v + sign * right.v, dim: left.dim, hasNumber: left.hasNumber || right.hasNumber };
    }
    this.depth--;
    return left;
  }

  private term(): Value {
    let left = this.unary();
    for (;;) {
      const t = this.peek();
      if (!this.isOp(t, '*') && !this.isOp(t, '/')) break;
      this.i++;
      const right = this.unary();
      if ((t as { v: string }).v === '*') {
        left = { v: left.v * right.v, dim: left.dim.map((d, k) => d + right.dim[k]) as unknown as Dim, hasNumber: left.hasNumber || right.hasNumber };
      } else {
        if (right.v === 0) throw new Refusal('it divides by zero');
        left = { v: left.v / right.v, dim: left.dim.map((d, k) => d - right.dim[k]) as unknown as Dim, hasNumber: left.hasNumber || right.hasNumber };
      }
    }
    return left;
  }

  private unary(): Value {
    const t = this.peek();
    if (this.isOp(t, '-') || this.isOp(t, '+')) {
      this.i++;
      if (++this.depth > MAX_DEPTH) throw new Refusal('it has too many signs in a row');
      const v = this.unary();
      this.depth--;
      return (t as { v: string }).v === '-' ? { ...v, v: -v.v } : v;
    }
    return this.compound();
  }

  /** A number in shop form: `29`, `29.5`, `3/4`, `29 1/2`, `29-1/2`, `29½`, `½`. Null when none starts here. */
  private numberish(): { v: number; from: number } | null {
    const from = this.i;
    const a = this.peek();
    if (a?.t === 'vulgar') {
      this.i++;
      return { v: a.num / a.den, from };
    }
    if (a?.t !== 'num') return null;
    this.i++;
    const fracAt = (k: number): { num: number; den: number; len: number } | null => {
      const n = this.peek(k);
      const s = this.peek(k + 1);
      const d = this.peek(k + 2);
      if (n?.t === 'num' && n.int && this.isOp(s, '/') && !s!.sp && d?.t === 'num' && d.int && !d.sp) return { num: n.v, den: d.v, len: 3 };
      return null;
    };
    // `3/4`: a fraction on its own.
    if (a.int && this.isOp(this.peek(), '/') && !this.peek()!.sp) {
      const d = this.peek(1);
      if (d?.t === 'num' && d.int && !d.sp) {
        this.i += 2;
        if (d.v === 0) throw new Refusal(`"${a.text}/${d.text}" divides by zero`);
        return { v: a.v / d.v, from };
      }
    }
    if (!a.int) return { v: a.v, from };
    // `29 1/2` (a space, then a fraction) and `29-1/2` (a hyphen touching both sides, then a fraction).
    const spaced = this.peek()?.sp ? fracAt(0) : null;
    const hyphen = this.isOp(this.peek(), '-') && !this.peek()!.sp && !this.peek(1)?.sp ? fracAt(1) : null;
    const f = spaced ?? hyphen;
    if (f) {
      if (f.den === 0) throw new Refusal('a fraction divides by zero');
      if (f.num >= f.den) throw new Refusal(`"${this.text(from, this.i + (spaced ? 3 : 4))}" has a fraction of one or more; write it as one number`);
      this.i += spaced ? 3 : 4;
      return { v: a.v + f.num / f.den, from };
    }
    const vulgar = this.peek();
    if (vulgar?.t === 'vulgar') {
      this.i++;
      return { v: a.v + vulgar.num / vulgar.den, from };
    }
    return { v: a.v, from };
  }

  /** A number with its unit, a unit alone (as in N/mm), or a bracket, then any further parts of one length. */
  private compound(): Value {
    const start = this.i;
    const t = this.peek();
    if (this.isOp(t, '(')) {
      this.i++;
      const inner = this.expr();
      if (!this.isOp(this.peek(), ')')) throw new Refusal(`a bracket opened in "${this.text(start, this.i)}" is not closed`);
      this.i++;
      const u = this.peek();
      if (u?.t === 'unit') {
        this.i++;
        return { v: inner.v * u.def.factor, dim: inner.dim.map((d, k) => d + u.def.dim[k]) as unknown as Dim, hasNumber: inner.hasNumber };
      }
      return inner;
    }
    if (t?.t === 'unit') {
      this.i++;
      return { v: t.def.factor, dim: t.def.dim, hasNumber: false };
    }
    const n = this.numberish();
    if (!n) throw new Refusal(t ? `"${t.text}" is out of place in "${this.src.trim()}"` : `"${this.src.trim()}" ends too early`);
    let unit = this.peek()?.t === 'unit' ? (this.peek() as Extract<Tok, { t: 'unit' }>) : null;
    if (unit) this.i++;
    let total = n.v * (unit?.def.factor ?? 1);
    const dim = unit?.def.dim ?? ([0, 0, 0] as Dim);
    // Further parts juxtaposed: `2 ft 3 in`, `1 m 20 mm`. Anything else side by side is refused.
    for (;;) {
      const next = this.peek();
      if (!next || (next.t !== 'num' && next.t !== 'vulgar')) break;
      const soFar = this.text(start, this.i);
      const partAt = this.i;
      const part = this.numberish()!;
      const partText = this.text(partAt, this.i);
      const nu = this.peek()?.t === 'unit' ? (this.peek() as Extract<Tok, { t: 'unit' }>) : null;
      if (!unit) {
        throw new Refusal(`it reads as "${soFar}" and then "${partText}", two numbers side by side; type one number (such as "1 3/4"), or join them with "+"`);
      }
      if (!nu) {
        const smaller = unit.def.label === 'ft' ? 'in' : 'mm';
        throw new Refusal(`it reads as "${soFar}" and then a bare "${partText}" with no unit; type "${soFar} + ${partText} ${smaller}" or write it in one unit`);
      }
      if (!sameDim(unit.def.dim, LENGTH_DIM) || !sameDim(nu.def.dim, LENGTH_DIM) || nu.def.factor >= unit.def.factor) {
        throw new Refusal(`it reads as "${soFar}" and then "${partText} ${nu.text}" side by side; give the larger unit first, or join them with "+"`);
      }
      this.i++;
      total += part.v * nu.def.factor;
      unit = nu;
    }
    return { v: total, dim, hasNumber: true };
  }
}

/** Reads a quantity; `dim` is its dimension and `v` its value in mm, kg and N. Throws Refusal. */
function readQuantity(text: string, decimalComma: boolean): Value {
  const toks = tokenize(text, decimalComma);
  if (toks.length === 0) throw new Refusal('no value given');
  return new Reader(toks, text).read();
}

export type QuantityKind = {
  noun: string;
  examples: string;
  /** The dimension asked for, and others accepted with the factor that turns them into it (a mass as its weight). */
  dim: Dim;
  alternatives?: { dim: Dim; factor: number }[];
  /** The factor from a bare number to the base unit (e.g. 25.4 when bare numbers are inches). */
  bareFactor: number;
};

const NOUNS: [Dim, string][] = [
  [LENGTH_DIM, 'a length'],
  [[0, 1, 0], 'a mass'],
  [[0, 0, 1], 'a force'],
  [[-1, 0, 1], 'a force per length'],
  [[-1, 1, 0], 'a mass per length'],
  [[2, 0, 0], 'an area'],
  [[3, 0, 0], 'a volume'],
];
const nounOf = (d: Dim) => NOUNS.find(([x]) => sameDim(x, d))?.[1] ?? 'a different kind of quantity';

export type ParseOptions = {
  /** Decimals written with a comma ("1,5 m"), where the locale does. */
  decimalComma?: boolean;
};

/** The value in the kind's base unit (mm, kg, N, N/mm), or an InputError naming the field. */
export function parseQuantity(text: string, field: string, kind: QuantityKind, opts: ParseOptions = {}): number {
  const bad = (why: string) => new InputError(field, `${field}: ${why}; expected ${kind.noun} such as ${kind.examples}`);
  if (typeof text !== 'string' || text.trim() === '') throw bad('no value given');
  if (text.length > MAX_QUANTITY_INPUT) throw bad(`the value is longer than ${MAX_QUANTITY_INPUT} characters`);
  let q: Value;
  try {
    q = readQuantity(text, opts.decimalComma ?? false);
  } catch (err) {
    if (err instanceof Refusal) throw bad(`"${text.trim()}": ${err.message}`);
    throw err;
  }
  if (!q.hasNumber) throw bad(`"${text.trim()}" has a unit but no number`);
  let result: number;
  if (isBare(q.dim)) result = q.v * kind.bareFactor;
  else if (sameDim(q.dim, kind.dim)) result = q.v;
  else {
    const alt = kind.alternatives?.find((a) => sameDim(a.dim, q.dim));
    if (!alt) throw bad(`"${text.trim()}" is ${nounOf(q.dim)}`);
    result = q.v * alt.factor;
  }
  if (!Number.isFinite(result) || Math.abs(result) > MAX_MAGNITUDE) throw bad(`"${text.trim()}" is far too large to be a workshop measure`);
  return Math.round(result * 1e9) / 1e9;
}
