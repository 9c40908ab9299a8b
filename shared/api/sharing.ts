import { z } from 'zod';
import { idSchema, isoDateSchema } from './common';
import { frameDocumentJsonSchema } from './frames';

// Read-only links to a project for people without an account.

export const shareLinkParamsSchema = z.object({ shareLinkId: idSchema });
export const MAX_SHARE_DAYS = 90;

export const createShareLinkRequestSchema = z.object({
  days: z.number({ message: 'Must be a number of days' }).int({ message: 'Must be a whole number of days' }).min(1, { message: 'At least 1 day' }).max(MAX_SHARE_DAYS, { message: `At most ${MAX_SHARE_DAYS} days` }),
});
export type CreateShareLinkRequest = z.input<typeof createShareLinkRequestSchema>;

export const shareLinkSchema = z.object({
  id: idSchema,
  expiresAt: isoDateSchema,
  revokedAt: isoDateSchema.nullable(),
  createdAt: isoDateSchema,
  createdBy: z.object({ id: idSchema, name: z.string() }).nullable(),
});
export type ShareLink = z.infer<typeof shareLinkSchema>;

/** POST /api/projects/:id/share-links (201): the only time the link itself is shown. */
export const createdShareLinkSchema = shareLinkSchema.extend({ url: z.string(), token: z.string() });
export type CreatedShareLink = z.infer<typeof createdShareLinkSchema>;

/** GET /api/shared/:token: what anyone with the link sees. */
export const sharedProjectSchema = z.object({
  project: z.object({ name: z.string(), client: z.string() }),
  workshop: z.string(),
  expiresAt: isoDateSchema,
  frames: z.array(z.object({ id: idSchema, name: z.string(), version: z.number().int(), updatedAt: isoDateSchema, document: frameDocumentJsonSchema })),
  attachments: z.array(z.object({ id: idSchema, filename: z.string(), contentType: z.string(), size: z.number().int() })),
});
export type SharedProject = z.infer<typeof sharedProjectSchema>;
