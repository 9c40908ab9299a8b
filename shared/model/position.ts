import { z } from 'zod';
import { lengthMm } from '../limits';
import { datumRefSchema, idSchema } from './ids';

/** Which face of the thing being placed sits at the position: its low face, its centre or its high face. */
export const alignSchema = z.enum(['min', 'center', 'max']);
export type Align = z.infer<typeof alignSchema>;

/**
 * A coordinate on one axis: a datum, or a face of another member (its low or high face on the same axis), or
 * the origin when neither is given; plus an offset. Hand-drawn members use the origin and an offset; snapping to
 * a bay edge or a member face attaches the reference, so the position follows when the frame re-lays.
 */
export const positionSchema = z
  .strictObject({
    datum: datumRefSchema.optional(),
    member: idSchema.optional(),
    face: z.enum(['min', 'max']).optional(),
    offset_mm: lengthMm().default(0),
    align: alignSchema.optional(),
  })
  .superRefine((p, ctx) => {
    if (p.datum !== undefined && p.member !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['member'], message: 'give either a datum or a member face, not both' });
    }
    if (p.member !== undefined && p.face === undefined) {
      ctx.addIssue({ code: 'custom', path: ['face'], message: 'say which face of the member: "min" or "max"' });
    }
    if (p.member === undefined && p.face !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['face'], message: 'a face needs a member' });
    }
  });
export type Position = z.output<typeof positionSchema>;
export type PositionInput = z.input<typeof positionSchema>;

export const placeSchema = z
  .strictObject({ x: positionSchema.optional(), y: positionSchema.optional(), z: positionSchema.optional() })
  .prefault({});
export type Place = z.output<typeof placeSchema>;
