import { z } from 'zod';
import { ALLOY_IDS, type AlloyId } from '../catalog/alloys';
import { storable } from '../limits';

/** ISO 2768-1 general tolerance classes: fine, medium, coarse, very coarse. */
export const toleranceClassSchema = z.enum(['f', 'm', 'c', 'v']);
export type ToleranceClass = z.infer<typeof toleranceClassSchema>;

/**
 * Defaults, and why:
 * - kerf 3 mm: a non-ferrous carbide blade cuts about 2.5–3.2 mm (common practice, REFERENCES.md).
 * - machining allowance 0: parts cut on a good saw are used as cut; set e.g. 0.5 mm per end to face them square.
 * - tolerance class m: ISO 2768-1 "medium", what a drawing assumes when it names none.
 * - shock factor 2.5: fittings in a van see 2–3 g vertical over bumps; no published value, common practice (and
 *   recalled, not confirmed: REFERENCES.md marks it [CP][M]). Use 1 for a bench that never moves.
 * - deflection limit span/240: IBC Table 1604.3 allows L/240 under total (dead + live) load on floors; our check
 *   already includes the shock factor, so under the static load alone the limit is about L/600, well inside the
 *   visible-sag rule of thumb of L/384 (common practice, REFERENCES.md).
 * - safety factor 1.65 on the alloy's design-minimum yield: the Aluminum Design Manual's allowable-stress factor
 *   for yielding in building-type structures (recalled from memory, not confirmed against the manual).
 * - spares 10 %: small hardware gets lost or a nut is forgotten in a closed slot; common practice, no source.
 * - forward / rearward / sideways 0.9 / 0.5 / 0.7 g: load securing for vans up to 2.0 t (VDI 2700 Sheet 16 /
 *   ISO 27956), the largest of the published sets (EN 12195-1 gives 0.8 / 0.5 / 0.5 g over 3.5 t); forward
 *   direction unknown until set, so braking is checked toward every side (REFERENCES.md).
 * - in a vehicle: braking and cornering are checked; a bench or shelf that never moves sets it false.
 * - column K unset: chosen from the frame (2 for a frame that can sway, 1 where braces stop it).
 * - T-nuts slide-in: cheaper and stronger than drop-in ones; the report warns where one must go in early.
 */
export const settingsSchema = z.strictObject({
  kerf_mm: z.number().nonnegative('must not be negative').max(20, 'must be at most 20 mm').default(3),
  machiningAllowance_mm: z.number().min(-10, 'must be at least -10 mm').max(20, 'must be at most 20 mm').default(0),
  toleranceClass: toleranceClassSchema.default('m'),
  shockFactor: z.number().min(1, 'must be at least 1 (the static load)').max(20, 'must be at most 20').default(2.5),
  deflectionLimitN: z.number().min(10, 'must be at least 10').max(5000, 'must be at most 5000').default(240),
  safetyFactor: z.number().min(1, 'must be at least 1').max(10, 'must be at most 10').default(1.65),
  inVehicle: z.boolean().default(true),
  forward_g: z.number().min(0, 'must not be negative').max(3, 'must be at most 3 g').default(0.9),
  rearward_g: z.number().min(0, 'must not be negative').max(3, 'must be at most 3 g').default(0.5),
  sideways_g: z.number().min(0, 'must not be negative').max(3, 'must be at most 3 g').default(0.7),
  forward: z.enum(['unknown', '+x', '-x', '+y', '-y']).default('unknown'),
  columnK: z.number().min(0.5, 'must be at least 0.5').max(5, 'must be at most 5').optional(),
  sparesPct: z.number().min(0, 'must not be negative').max(100, 'must be at most 100').default(10),
  alloy: z.enum(ALLOY_IDS as [AlloyId, ...AlloyId[]]).optional(),
  tNut: z.enum(['slide-in', 'drop-in']).default('slide-in'),
  defaultJoin: storable(z.string().min(1).max(64)).default('corner-bracket'),
  // 10 mm squares the mill end of a bar; 150 mm is about the shortest piece a saw's clamp still holds safely
  // (common practice, no source).
  /** The profile new members are drawn in, until the builder picks another. */
  defaultProfile: storable(z.string().min(1).max(64)).optional(),
  trim_mm: z.number().min(0, 'must not be negative').max(200, 'must be at most 200 mm').default(10),
  minOffcut_mm: z.number().min(0, 'must not be negative').max(3000, 'must be at most 3000 mm').default(150),
});
export type FrameSettings = z.output<typeof settingsSchema>;

/** How dates are written: ISO 8601 (2026-12-02), day first (02/12/2026 or 02.12.2026) or month first (12/02/2026). */
export const DATE_FORMATS = ['iso', 'dmy', 'dmy-dot', 'mdy'] as const;
export const dateFormatSchema = z.enum(DATE_FORMATS);
export type DateFormat = z.infer<typeof dateFormatSchema>;

/**
 * How a frame's figures are read and typed: lengths in mm or in inches to 1/16 or 1/32, masses in kg or lb, the
 * date format, and whether a typed "1,5" is a decimal comma. Inside, lengths stay millimetres and masses kilograms.
 */
export const displayUnitsSchema = z.strictObject({
  display: z.enum(['mm', 'in']).default('mm'),
  frac: z.union([z.literal(16), z.literal(32)]).default(16),
  mass: z.enum(['kg', 'lb']).default('kg'),
  date: dateFormatSchema.default('iso'),
  decimalComma: z.boolean().default(false),
});
export type DisplayUnits = z.output<typeof displayUnitsSchema>;
