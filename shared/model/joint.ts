import { z } from 'zod';
import { idSchema } from './ids';

/**
 * Which of two members runs through where they meet (the other butts against it and is cut to its face). Without
 * a record the engine decides: uprights run through, then the longer member (see engine/joints.ts). Two straight
 * members meet at most once, so the pair identifies the joint.
 */
export const jointSettingSchema = z
  .strictObject({
    type: z.literal('joint'),
    members: z.tuple([idSchema, idSchema]),
    through: idSchema,
  })
  .superRefine((j, ctx) => {
    if (j.members[0] === j.members[1]) ctx.addIssue({ code: 'custom', path: ['members'], message: 'must name two different members' });
    if (!j.members.includes(j.through)) ctx.addIssue({ code: 'custom', path: ['through'], message: 'must be one of the two members' });
  });
export type JointSetting = z.output<typeof jointSettingSchema>;
