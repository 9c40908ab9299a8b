import { z } from 'zod';
import { idSchema, isoDateSchema } from './common';

// The bin: deleted projects and frames, kept for BIN_DAYS and restorable by owners and designers until then.
// Past that they are purged for good. Nothing in the bin shows anywhere else.

export const BIN_DAYS = 30;
export const BIN_MS = BIN_DAYS * 24 * 60 * 60 * 1000;

/** GET /api/workshops/:workshopId/bin items, most recently deleted first. */
export const binEntrySchema = z.object({
  kind: z.enum(['project', 'frame']),
  id: idSchema,
  name: z.string(),
  /** The project a frame belongs to (the project itself for a project). */
  projectId: idSchema,
  projectName: z.string(),
  /** A deleted project's frames go and come back with it. */
  frameCount: z.number().int(),
  deletedAt: isoDateSchema,
  deletedBy: z.object({ id: idSchema, name: z.string() }).nullable(),
  /** When it is purged for good unless restored. */
  purgeAt: isoDateSchema,
});
export type BinEntry = z.infer<typeof binEntrySchema>;

/** When something deleted at `deletedAt` leaves the bin for good. */
export function purgeAt(deletedAt: Date): Date {
  return new Date(deletedAt.getTime() + BIN_MS);
}
