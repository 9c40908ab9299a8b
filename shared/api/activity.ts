import { z } from 'zod';
import { idSchema, isoDateSchema, userRefSchema } from './common';

export const ACTIVITY_KINDS = ['frame.created', 'frame.saved', 'order.sent', 'cuts.ticked', 'client.invited', 'client.removed', 'link.made', 'link.revoked'] as const;
export type ActivityKind = (typeof ACTIVITY_KINDS)[number];

export const activityEntrySchema = z.object({
  id: idSchema,
  kind: z.enum(ACTIVITY_KINDS),
  subject: z.string(),
  /** How many times in one stretch (saves, ticks); 1 for the rest. */
  count: z.number().int(),
  firstAt: isoDateSchema,
  lastAt: isoDateSchema,
  user: userRefSchema.nullable(),
});
/** GET /api/projects/:id/activity items, newest first. */
export type ActivityEntry = z.infer<typeof activityEntrySchema>;
