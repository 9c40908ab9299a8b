import { InputError } from '../errors';

/**
 * Single-span beams under superposed loads, from the standard closed forms (AISC Steel Construction Manual Table
 * 3-23; American Wood Council Design Aid No. 6; Roark's Formulas for Stress and Strain, Table 8.1).
 *
 * Units: mm, N, MPa (N/mm²). x runs from the left support (the fixed end of a cantilever) to the right (the free
 * end). Loads act downwards when positive; deflection is positive downwards; a sagging moment is positive.
 */
/** To show beside any load result: the figures screen a design, they do not certify it. */
export const BEAM_CAUTION =
  'Beam figures are a screening estimate from textbook formulas for an ideal single span: they do not certify a ' +
  'design. Joints, brackets and fixings are often weaker than the member. In a moving vehicle loads are multiplied ' +
  'by bumps, braking and cornering, and crash loads are far higher: follow local vehicle regulations and have ' +
  'anything that carries people or heavy modules checked by a qualified engineer.';

export type BeamSupport = 'simple' | 'fixed' | 'cantilever';

export type BeamLoad =
  | { kind: 'point'; P_N: number; a_mm: number }
  | { kind: 'udl'; w_N_per_mm: number; from_mm?: number; to_mm?: number };

export type BeamInput = {
  span_mm: number;
  E_MPa: number;
  I_mm4: number;
  support: BeamSupport;
  loads: BeamLoad[];
};

export type BeamResult = {
  /** Deflection of largest magnitude (positive downwards) and where it occurs. */
  deflection_mm: number;
  x_max_mm: number;
  /** Largest bending moment magnitude anywhere on the span (sagging or hogging) and where it occurs. */
  max_moment_Nmm: number;
  x_moment_mm: number;
  /** Upward vertical reactions at x = 0 and x = span (the free end of a cantilever carries none). */
  reactions_N: [number, number];
};

/** Deflection and moment at x of one unit of load, and its reactions. */
type Influence = {
  deflection(x: number): number;
  moment(x: number): number;
  reactions: [number, number];
  /** Positions where this load alone puts an extreme of deflection or moment. */
  candidates: number[];
};

// ---- closed forms for a point load P at a (b = L − a) ----------------------------------------------------------

/** Simply supported, P at a: AWC DA6 Fig. 8 / AISC 3-23 case 8. EI factored out: returns EI·y. */
function simplePointEIy(L: number, P: number, a: number, x: number): number {
  const b = L - a;
  if (x <= a) return (P * b * x * (L * L - b * b - x * x)) / (6 * L);
  const xr = L - x; // mirror: the same formula seen from the right support
  return (P * a * xr * (L * L - a * a - xr * xr)) / (6 * L);
}
function simplePointM(L: number, P: number, a: number, x: number): number {
  return x <= a ? (P * (L - a) * x) / L : (P * a * (L - x)) / L;
}

/** Fixed at both ends, P at a: AISC 3-23 case 16 / Roark Table 8.1 case 1d. Returns EI·y. */
function fixedPointEIy(L: number, P: number, a: number, x: number): number {
  const b = L - a;
  if (x <= a) return (P * b * b * x * x * (3 * a * L - 3 * a * x - b * x)) / (6 * L ** 3);
  const xr = L - x;
  return (P * a * a * xr * xr * (3 * b * L - 3 * b * xr - a * xr)) / (6 * L ** 3);
}
function fixedPointReactions(L: number, P: number, a: number): { R1: number; R2: number; M1: number } {
  const b = L - a;
  return { R1: (P * b * b * (3 * a + b)) / L ** 3, R2: (P * a * a * (a + 3 * b)) / L ** 3, M1: (-P * a * b * b) / (L * L) };
}
function fixedPointM(L: number, P: number, a: number, x: number): number {
  const { R1, M1 } = fixedPointReactions(L, P, a);
  return M1 + R1 * x - (x > a ? P * (x - a) : 0);
}

/** Cantilever fixed at x = 0, P at a: AWC DA6 Fig. 14 (mirrored to put the fixed end at 0). Returns EI·y. */
function cantileverPointEIy(P: number, a: number, x: number): number {
  return x <= a ? (P * x * x * (3 * a - x)) / 6 : (P * a * a * (3 * x - a)) / 6;
}
function cantileverPointM(P: number, a: number, x: number): number {
  return x < a ? -P * (a - x) : 0;
}

function pointEIy(s: BeamSupport, L: number, P: number, a: number, x: number): number {
  switch (s) {
    case 'simple':
      return simplePointEIy(L, P, a, x);
    case 'fixed':
      return fixedPointEIy(L, P, a, x);
    case 'cantilever':
      return cantileverPointEIy(P, a, x);
  }
}
function pointM(s: BeamSupport, L: number, P: number, a: number, x: number): number {
  switch (s) {
    case 'simple':
      return simplePointM(L, P, a, x);
    case 'fixed':
      return fixedPointM(L, P, a, x);
    case 'cantilever':
      return cantileverPointM(P, a, x);
  }
}
function pointReactions(s: BeamSupport, L: number, P: number, a: number): [number, number] {
  switch (s) {
    case 'simple':
      return [(P * (L - a)) / L, (P * a) / L];
    case 'fixed': {
      const { R1, R2 } = fixedPointReactions(L, P, a);
      return [R1, R2];
    }
    case 'cantilever':
      return [P, 0];
  }
}

// ---- closed forms for a UDL w over the whole span ---------------------------------------------------------------

/** AWC DA6 Fig. 1 (simple), AISC 3-23 case 15 (fixed), AWC DA6 Fig. 12 (cantilever). Returns EI·y. */
function fullUdlEIy(s: BeamSupport, L: number, w: number, x: number): number {
  switch (s) {
    case 'simple':
      return (w * x * (L ** 3 - 2 * L * x * x + x ** 3)) / 24;
    case 'fixed':
      return (w * x * x * (L - x) ** 2) / 24;
    case 'cantilever':
      return (w * x * x * (6 * L * L - 4 * L * x + x * x)) / 24;
  }
}
function fullUdlM(s: BeamSupport, L: number, w: number, x: number): number {
  switch (s) {
    case 'simple':
      return (w * x * (L - x)) / 2;
    case 'fixed':
      return (w * (6 * L * x - 6 * x * x - L * L)) / 12;
    case 'cantilever':
      return (-w * (L - x) ** 2) / 2;
  }
}

// ---- a partial UDL w from c to d: Macaulay's method -------------------------------------------------------------

// Double integration with singularity functions (Macaulay's method; e.g. Gere & Timoshenko, Mechanics of
// Materials): M(x) = M1 + R1·x − w/2·(⟨x−c⟩² − ⟨x−d⟩²) and EI·y = −(M1·x²/2 + R1·x³/6 − w/24·(⟨x−c⟩⁴ − ⟨x−d⟩⁴)) + C1·x,
// with the end moment M1, left reaction R1 and slope constant C1 fixed by each support's boundary conditions.
const mac = (x: number, k: number, n: number): number => (x > k ? (x - k) ** n : 0);

function partialUdl(s: BeamSupport, L: number, w: number, c: number, d: number): Influence {
  const q = w * (d - c);
  const A3 = (L - c) ** 3 - (L - d) ** 3;
  const A4 = (L - c) ** 4 - (L - d) ** 4;
  let M1 = 0;
  let R1: number;
  let C1 = 0;
  switch (s) {
    case 'simple': // y(0) = y(L) = 0, M1 = 0
      R1 = (q * (L - (c + d) / 2)) / L;
      C1 = ((R1 * L ** 3) / 6 - (w * A4) / 24) / L;
      break;
    case 'fixed': // y and y' zero at both ends
      R1 = (w * (A3 * L - A4 / 2)) / L ** 3;
      M1 = ((w * A3) / 6 - (R1 * L * L) / 2) / L;
      break;
    case 'cantilever': // y and y' zero at x = 0; statics gives the rest
      R1 = q;
      M1 = (-q * (c + d)) / 2;
      break;
  }
  const candidates = [c, d];
  if (w !== 0 && c + R1 / w > c && c + R1 / w < d) candidates.push(c + R1 / w); // zero shear: a moment extreme
  return {
    deflection: (x) => -((M1 * x * x) / 2 + (R1 * x ** 3) / 6 - (w / 24) * (mac(x, c, 4) - mac(x, d, 4))) + C1 * x,
    moment: (x) => M1 + R1 * x - (w / 2) * (mac(x, c, 2) - mac(x, d, 2)),
    reactions: s === 'cantilever' ? [q, 0] : [R1, q - R1],
    candidates,
  };
}

function influenceOf(load: BeamLoad, s: BeamSupport, L: number): Influence {
  if (load.kind === 'point') {
    const { P_N: P, a_mm: a } = load;
    const candidates = [a];
    if (s === 'simple') {
      const b = Math.min(a, L - a);
      const xm = Math.sqrt((L * L - b * b) / 3); // AWC DA6 Fig. 8: position of the maximum deflection
      candidates.push(a >= L - a ? xm : L - xm);
    }
    return {
      deflection: (x) => pointEIy(s, L, P, a, x),
      moment: (x) => pointM(s, L, P, a, x),
      reactions: pointReactions(s, L, P, a),
      candidates,
    };
  }
  const w = load.w_N_per_mm;
  const lo = load.from_mm ?? 0;
  const hi = load.to_mm ?? L;
  if (lo <= 0 && hi >= L) {
    return {
      deflection: (x) => fullUdlEIy(s, L, w, x),
      moment: (x) => fullUdlM(s, L, w, x),
      reactions: s === 'cantilever' ? [w * L, 0] : [(w * L) / 2, (w * L) / 2],
      candidates: [L / 2],
    };
  }
  return partialUdl(s, L, w, lo, hi);
}

function validate(input: BeamInput): void {
  const { span_mm: L, E_MPa, I_mm4 } = input;
  if (!(Number.isFinite(L) && L > 0)) throw new InputError('span_mm', 'span_mm: the span must be a positive length');
  if (!(Number.isFinite(E_MPa) && E_MPa > 0)) throw new InputError('E_MPa', 'E_MPa: the modulus must be positive');
  if (!(Number.isFinite(I_mm4) && I_mm4 > 0)) throw new InputError('I_mm4', 'I_mm4: the second moment must be positive');
  if (!['simple', 'fixed', 'cantilever'].includes(input.support)) {
    throw new InputError('support', `support: "${String(input.support)}" is not simple, fixed or cantilever`);
  }
  input.loads.forEach((load, i) => {
    const f = `loads[${i}]`;
    if (load.kind === 'point') {
      if (!Number.isFinite(load.P_N)) throw new InputError(`${f}.P_N`, `${f}.P_N: the load must be a number`);
      if (!(Number.isFinite(load.a_mm) && load.a_mm >= 0 && load.a_mm <= L)) {
        throw new InputError(`${f}.a_mm`, `${f}.a_mm: the load position must lie on the span (0 to ${L} mm)`);
      }
    } else if (load.kind === 'udl') {
      if (!Number.isFinite(load.w_N_per_mm)) throw new InputError(`${f}.w_N_per_mm`, `${f}.w_N_per_mm: the load must be a number`);
      const lo = load.from_mm ?? 0;
      const hi = load.to_mm ?? L;
      if (!(Number.isFinite(lo) && Number.isFinite(hi) && lo >= 0 && hi <= L && lo < hi)) {
        throw new InputError(`${f}.from_mm`, `${f}.from_mm/to_mm: the loaded length must lie on the span with from < to`);
      }
    } else {
      throw new InputError(`${f}.kind`, `${f}.kind: must be "point" or "udl"`);
    }
  });
}

const GRID = 48;
const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** Position in [lo, hi] maximising f, assuming f is unimodal there (golden-section search). */
function refine(f: (x: number) => number, lo: number, hi: number, tol: number): number {
  let a = lo;
  let b = hi;
  let c = b - GOLDEN * (b - a);
  let d = a + GOLDEN * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let i = 0; i < 60 && b - a > tol; i++) {
    if (fc >= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - GOLDEN * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + GOLDEN * (b - a);
      fd = f(d);
    }
  }
  return (a + b) / 2;
}

/** Largest |f| over [0, L]: a grid plus known candidate positions, then a local search around the best. */
function extreme(f: (x: number) => number, L: number, candidates: number[]): { x: number; value: number } {
  const xs: number[] = [];
  for (let i = 0; i <= GRID; i++) xs.push((L * i) / GRID);
  for (const c of candidates) if (c >= 0 && c <= L) xs.push(c);
  xs.sort((p, q) => p - q);
  let best = 0;
  let bestAbs = -1;
  for (let i = 0; i < xs.length; i++) {
    const v = Math.abs(f(xs[i]));
    if (v > bestAbs) {
      bestAbs = v;
      best = i;
    }
  }
  const abs = (x: number) => Math.abs(f(x));
  let x = xs[best];
  const lo = xs[Math.max(0, best - 1)];
  const hi = xs[Math.min(xs.length - 1, best + 1)];
  for (const [p, q] of [
    [lo, x],
    [x, hi],
  ]) {
    if (q > p) {
      const r = refine(abs, p, q, L * 1e-6); // the value's error goes with the square of x's
      if (abs(r) > abs(x)) x = r;
    }
  }
  return { x, value: f(x) };
}

/** Deflection, moment and reactions of a single-span beam under any mix of point loads and (partial) UDLs. */
export function beam(input: BeamInput): BeamResult {
  validate(input);
  const { span_mm: L, support } = input;
  const EI = input.E_MPa * input.I_mm4;
  const parts = input.loads.map((l) => influenceOf(l, support, L));
  const candidates = [0, L, L / 2, ...parts.flatMap((p) => p.candidates)];
  const y = (x: number) => {
    let sum = 0;
    for (const p of parts) sum += p.deflection(x);
    return sum / EI;
  };
  const m = (x: number) => {
    let sum = 0;
    for (const p of parts) sum += p.moment(x);
    return sum;
  };
  const d = extreme(y, L, candidates);
  const mm = extreme(m, L, candidates);
  const reactions = parts.reduce<[number, number]>((s, p) => [s[0] + p.reactions[0], s[1] + p.reactions[1]], [0, 0]);
  return {
    deflection_mm: d.value,
    x_max_mm: d.x,
    max_moment_Nmm: Math.abs(mm.value),
    x_moment_mm: mm.x,
    reactions_N: reactions,
  };
}

/** The reactions alone (no search for the extremes): what a load path needs from each span. */
export function beamReactions(input: BeamInput): [number, number] {
  validate(input);
  let r0 = 0;
  let r1 = 0;
  for (const l of input.loads) {
    const p = influenceOf(l, input.support, input.span_mm).reactions;
    r0 += p[0];
    r1 += p[1];
  }
  return [r0, r1];
}

/**
 * Upper bounds of the largest moment and deflection of a span, from its loads' magnitudes alone: no load anywhere
 * on a simple span gives more than PL/4 and PL³/48EI (at midspan), none on a cantilever more than PL and PL³/3EI
 * (at its tip) (AISC Manual Table 3-23, cases 7 and 22); superposition of the magnitudes bounds the sum.
 */
export function beamBound(input: BeamInput): { moment_Nmm: number; deflection_mm: number } {
  let Q = 0;
  for (const l of input.loads) Q += l.kind === 'point' ? Math.abs(l.P_N) : Math.abs(l.w_N_per_mm) * ((l.to_mm ?? input.span_mm) - (l.from_mm ?? 0));
  const L = input.span_mm;
  const cantilever = input.support === 'cantilever';
  return {
    moment_Nmm: cantilever ? Q * L : (Q * L) / 4,
    deflection_mm: (Q * L ** 3) / ((cantilever ? 3 : 48) * input.E_MPa * input.I_mm4),
  };
}

/** Deflection (positive downwards) at x, for plotting or checking a particular point. */
export function beamDeflectionAt(input: BeamInput, x_mm: number): number {
  validate(input);
  const parts = input.loads.map((l) => influenceOf(l, input.support, input.span_mm));
  return parts.reduce((s, p) => s + p.deflection(x_mm), 0) / (input.E_MPa * input.I_mm4);
}

/** Bending moment (sagging positive) at x. */
export function beamMomentAt(input: BeamInput, x_mm: number): number {
  validate(input);
  const parts = input.loads.map((l) => influenceOf(l, input.support, input.span_mm));
  return parts.reduce((s, p) => s + p.moment(x_mm), 0);
}

/** Bending stress σ = M / W, MPa from N·mm and mm³. */
export function beamStress(M_Nmm: number, W_mm3: number): number {
  if (!(W_mm3 > 0)) throw new InputError('W_mm3', 'W_mm3: the section modulus must be positive');
  return Math.abs(M_Nmm) / W_mm3;
}
