import { z } from 'zod';
import { LIMITS, lengthMm } from '../limits';
import { idSchema, nameSchema } from './ids';

/** Join methods every frame has; a document's own methods must use other ids. */
export const BUILT_IN_JOIN_METHODS = ['corner-bracket', 'end-connector', 'gusset', 'end-cap', 'none'] as const;
export type BuiltInJoinMethod = (typeof BUILT_IN_JOIN_METHODS)[number];

/**
 * A builder's own way of joining, as a hardware recipe per joint (or per free end): named parts (a bracket, a
 * plate, a cap) with an approximate mass each, screws with T-nuts into each member's slot (the screw passes
 * through `clamp_mm` of bracket or plate), and the machining it needs (an end tap in the butting member, an
 * access hole in the member it butts against).
 */
export const joinMethodSchema = z.strictObject({
  type: z.literal('join-method'),
  id: idSchema.refine((id) => !(BUILT_IN_JOIN_METHODS as readonly string[]).includes(id), {
    message: `must differ from the built-in methods (${BUILT_IN_JOIN_METHODS.join(', ')})`,
  }),
  name: nameSchema.min(1, 'must not be empty'),
  appliesTo: z.enum(['joint', 'free-end']).default('joint'),
  parts: z
    .array(
      z.strictObject({
        name: nameSchema.min(1, 'must not be empty'),
        qty: z.number().int('must be a whole number').nonnegative('must not be negative').max(100, 'must be at most 100').default(1),
        mass_g: z.number().nonnegative('must not be negative').max(1e6, 'must be at most 1000000 g').optional(),
      }),
    )
    .max(LIMITS.listItems, `at most ${LIMITS.listItems} parts`)
    .default([]),
  fastenersPerMember: z.number().int('must be a whole number').nonnegative('must not be negative').max(100, 'must be at most 100').default(0),
  clamp_mm: lengthMm().nonnegative('must not be negative').default(0),
  endTap: z.boolean().default(false),
  accessHole: z.boolean().default(false),
});
export type JoinMethod = z.output<typeof joinMethodSchema>;
export type JoinMethodInput = z.input<typeof joinMethodSchema>;
