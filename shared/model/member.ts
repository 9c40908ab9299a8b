import { z } from 'zod';
import { lengthMm, storable } from '../limits';
import { axisSchema } from './axis';
import { idSchema, nameSchema } from './ids';
import { placeSchema, positionSchema } from './position';

/**
 * A member end: where it is (a position on the member's own axis), how it is joined when it butts against
 * another member (a join-method id; the frame's default otherwise), and the machining allowance for this end
 * (negative for a deliberate gap; the frame's allowance when absent).
 */
export const memberEndSchema = positionSchema.safeExtend({
  join: idSchema.optional(),
  allowance_mm: lengthMm().optional(),
});
export type MemberEnd = z.output<typeof memberEndSchema>;

/** Which end of a member is bolted to the vehicle's wall. */
export const wallFixingSchema = z.enum(['start', 'end', 'both'], { message: 'must be "start", "end" or "both"' });
export type WallFixing = z.infer<typeof wallFixingSchema>;

export const MEMBER_ROLES = ['upright', 'rail', 'cross-member', 'brace', 'other'] as const;
export const memberRoleSchema = z.enum(MEMBER_ROLES);
export type MemberRole = z.infer<typeof memberRoleSchema>;

/**
 * A straight length of profile along one axis. Its extent on that axis runs from `start` to `end` (or
 * `start + length_mm`); `place` positions its cross-section on the other two axes (the low face by default,
 * `align` to put the centre or high face there instead). Rotation turns the profile about its own axis in
 * quarter turns. `mark` pins a part mark (e.g. once the part has been cut and labelled). `wallFixing` marks the
 * end (or both) the builder bolts to the vehicle's wall; the floor fixings are the feet of the uprights.
 */
export const memberSchema = z
  .strictObject({
    type: z.literal('member'),
    id: idSchema,
    name: nameSchema.optional(),
    role: memberRoleSchema.optional(),
    profile: storable(z.string().min(1, 'must name a profile').max(64)),
    axis: axisSchema,
    rotation_deg: z.union([z.literal(0), z.literal(90), z.literal(180), z.literal(270)]).default(0),
    start: memberEndSchema,
    end: memberEndSchema.optional(),
    length_mm: lengthMm().positive('must be more than 0').optional(),
    place: placeSchema,
    mark: z.string().regex(/^[A-Z]{1,3}$/, 'must be capital letters, e.g. "A" or "AB"').optional(),
    wallFixing: wallFixingSchema.optional(),
  })
  .superRefine((m, ctx) => {
    if ((m.end === undefined) === (m.length_mm === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['end'], message: 'give either an end position or length_mm' });
    }
    if (m.place[m.axis] !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['place', m.axis], message: `a member along ${m.axis} is placed on ${m.axis} by start and end` });
    }
  });
export type Member = z.output<typeof memberSchema>;
export type MemberInput = z.input<typeof memberSchema>;

/** Uprights stand along z; horizontal members along x are rails, along y cross-members. */
export function roleOf(m: Pick<Member, 'role' | 'axis'>): MemberRole {
  if (m.role) return m.role;
  return m.axis === 'z' ? 'upright' : m.axis === 'x' ? 'rail' : 'cross-member';
}
