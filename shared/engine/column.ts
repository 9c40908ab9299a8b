import { InputError } from '../errors';

/**
 * Uprights as columns: the Euler critical load and the flexural buckling resistance of EN 1999-1-1 §6.3.1
 * (recalled from the standard, not confirmed against the document: check the edition you cite).
 */
export const COLUMN_SOURCE =
  'Euler critical load N_cr = π²EI/(KL)² about the weak axis; buckling resistance N_b,Rd = χ·A·f_o/γ_M1 from ' +
  'EN 1999-1-1 §6.3.1 (χ = 1/(φ + √(φ² − λ̄²)), φ = 0.5·(1 + α(λ̄ − λ̄₀) + λ̄²), λ̄ = √(A·f_o/N_cr), γ_M1 = 1.10, κ = 1 ' +
  'without welds; recalled from the standard, check the edition you cite).';

/**
 * EN 1999-1-1 buckling classes [M]: class A for heat-treated alloys (α 0.20, λ̄₀ 0.10), class B otherwise
 * (α 0.32, λ̄₀ 0). Only the T6 tempers are taken as class A here; a T5 temper is checked as class B, which gives
 * the lower resistance, since we have not confirmed its class against the standard.
 */
export const BUCKLING_CLASSES = {
  A: { alpha: 0.2, lambda0: 0.1 },
  B: { alpha: 0.32, lambda0: 0 },
} as const;
export type BucklingClass = keyof typeof BUCKLING_CLASSES;
export const GAMMA_M1 = 1.1;

export const bucklingClassOf = (alloy: string): BucklingClass => (/-T6$/.test(alloy) ? 'A' : 'B');

export type ColumnInput = {
  length_mm: number;
  K: number;
  E_MPa: number;
  /** Least second moment of area (the weak, or minor principal, axis). */
  I_mm4: number;
  area_mm2: number;
  /** 0.2 % proof stress f_o. */
  fo_MPa: number;
  bucklingClass: BucklingClass;
  load_N: number;
};

export type ColumnResult = {
  length_mm: number;
  K: number;
  /** KL/r with r = √(I/A). */
  slenderness: number;
  /** λ̄ = √(A·f_o/N_cr). */
  relative_slenderness: number;
  euler_N: number;
  chi: number;
  /** N_b,Rd, the design buckling resistance. */
  capacity_N: number;
  utilisation: number;
};

export function eulerLoad(E_MPa: number, I_mm4: number, K: number, L_mm: number): number {
  return (Math.PI ** 2 * E_MPa * I_mm4) / (K * L_mm) ** 2;
}

/** χ of EN 1999-1-1 §6.3.1.2 for a relative slenderness λ̄ (never above 1). */
export function reductionFactor(lambdaBar: number, cls: BucklingClass): number {
  const { alpha, lambda0 } = BUCKLING_CLASSES[cls];
  const phi = 0.5 * (1 + alpha * (lambdaBar - lambda0) + lambdaBar ** 2);
  return Math.min(1, 1 / (phi + Math.sqrt(Math.max(phi * phi - lambdaBar ** 2, 0))));
}

export function checkColumn(c: ColumnInput): ColumnResult {
  const positive: [keyof ColumnInput, number][] = [
    ['length_mm', c.length_mm],
    ['K', c.K],
    ['E_MPa', c.E_MPa],
    ['I_mm4', c.I_mm4],
    ['area_mm2', c.area_mm2],
    ['fo_MPa', c.fo_MPa],
  ];
  for (const [k, v] of positive) if (!(Number.isFinite(v) && v > 0)) throw new InputError(k, `${k}: must be a positive number`);
  if (!(Number.isFinite(c.load_N) && c.load_N >= 0)) throw new InputError('load_N', 'load_N: must be a compressive load of 0 or more');
  const r = Math.sqrt(c.I_mm4 / c.area_mm2);
  const Ncr = eulerLoad(c.E_MPa, c.I_mm4, c.K, c.length_mm);
  const lambdaBar = Math.sqrt((c.area_mm2 * c.fo_MPa) / Ncr);
  const chi = reductionFactor(lambdaBar, c.bucklingClass);
  const capacity = (chi * c.area_mm2 * c.fo_MPa) / GAMMA_M1;
  return {
    length_mm: c.length_mm,
    K: c.K,
    slenderness: (c.K * c.length_mm) / r,
    relative_slenderness: lambdaBar,
    euler_N: Ncr,
    chi,
    capacity_N: capacity,
    utilisation: c.load_N / capacity,
  };
}
