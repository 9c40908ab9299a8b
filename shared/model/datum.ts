import { z } from 'zod';
import { axisSchema } from './axis';
import { LIMITS, lengthMm } from '../limits';
import { datumRefSchema, idSchema, nameSchema } from './ids';

/** `factor × module size`: lets a datum follow a module ("cooler width + 2 × 5 mm clearance"). */
export const sizeTermSchema = z.strictObject({
  module: idSchema,
  size: z.enum(['w', 'd', 'h']),
  factor: z.number().min(-100, 'must be at least -100').max(100, 'must be at most 100').default(1),
});
export type SizeTerm = z.output<typeof sizeTermSchema>;

/**
 * A named position on one axis: `from` (another datum, or the origin when absent) + `offset_mm` + any module-size
 * terms. Runs generate further datums of their own (see run.ts).
 */
export const datumSchema = z.strictObject({
  type: z.literal('datum'),
  id: idSchema,
  name: nameSchema.optional(),
  axis: axisSchema,
  from: datumRefSchema.optional(),
  offset_mm: lengthMm().default(0),
  plus: z.array(sizeTermSchema).max(LIMITS.listItems, `at most ${LIMITS.listItems} terms`).default([]),
});
export type Datum = z.output<typeof datumSchema>;
export type DatumInput = z.input<typeof datumSchema>;
