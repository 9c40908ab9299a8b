import { z } from 'zod';
import type { RevisionDiff } from '../engine/revision-diff';
import { idSchema, isoDateSchema, nameSchema, text, userRefSchema } from './common';
import { roleSchema } from './roles';

export const frameParamsSchema = z.object({ frameId: idSchema });
export const revisionParamsSchema = z.object({
  frameId: idSchema,
  version: z.coerce.number({ message: 'Must be a whole number' }).int({ message: 'Must be a whole number' }).min(1),
});

/**
 * The frame document as it travels over the API. Its full schema lives in shared/model; the server validates it
 * there (422 with fields on failure), so here it is only "a JSON object".
 */
export const frameDocumentJsonSchema = z.record(z.string(), z.unknown(), { message: 'Must be an object' });
export type FrameDocumentJson = z.infer<typeof frameDocumentJsonSchema>;

export const frameSummarySchema = z.object({
  id: idSchema,
  projectId: idSchema,
  name: z.string(),
  version: z.number().int(),
  memberCount: z.number().int(),
  updatedAt: isoDateSchema,
  deletedAt: isoDateSchema.nullable(),
});
export type FrameSummary = z.infer<typeof frameSummarySchema>;

export const frameSchema = z.object({
  id: idSchema,
  projectId: idSchema,
  workshopId: idSchema,
  name: z.string(),
  version: z.number().int(),
  document: frameDocumentJsonSchema,
  memberCount: z.number().int(),
  role: roleSchema,
  updatedAt: isoDateSchema,
  updatedBy: userRefSchema.nullable(),
  deletedAt: isoDateSchema.nullable(),
});
/** GET /api/frames/:frameId and POST .../frames (201). */
export type Frame = z.infer<typeof frameSchema>;

export const listFramesQuerySchema = z.object({
  /** 'true' lists the deleted frames only (the recovery list); otherwise the live ones. */
  deleted: z.enum(['true', 'false'], { message: "Must be 'true' or 'false'" }).optional(),
});

export const createFrameRequestSchema = z.object({
  name: nameSchema,
  document: frameDocumentJsonSchema.optional(),
});
export type CreateFrameRequest = z.input<typeof createFrameRequestSchema>;

/** PATCH /api/frames/:frameId → FrameSummary. Renaming does not change `version`. */
export const renameFrameRequestSchema = z.object({ name: nameSchema });
export type RenameFrameRequest = z.input<typeof renameFrameRequestSchema>;

export const saveFrameDocumentRequestSchema = z.object({
  baseVersion: z.number({ message: 'Must be a number' }).int({ message: 'Must be a whole number' }).min(1),
  document: frameDocumentJsonSchema,
});
export type SaveFrameDocumentRequest = z.input<typeof saveFrameDocumentRequestSchema>;

export const saveFrameDocumentResponseSchema = z.object({ version: z.number().int(), updatedAt: isoDateSchema });
export type SaveFrameDocumentResponse = z.infer<typeof saveFrameDocumentResponseSchema>;

/**
 * GET /api/frames/:frameId/revisions, newest first. The first entry is the frame's current version
 * (`current: true`); the others are the documents kept by earlier saves.
 */
export const revisionSummarySchema = z.object({
  version: z.number().int(),
  savedAt: isoDateSchema,
  savedBy: userRefSchema.nullable(),
  memberCount: z.number().int(),
  current: z.boolean(),
  /** "sent to client", "as cut"…; null when unnamed. */
  name: z.string().nullable(),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

export const revisionSchema = z.object({
  version: z.number().int(),
  name: z.string().nullable(),
  document: frameDocumentJsonSchema,
  savedAt: isoDateSchema,
  savedBy: userRefSchema.nullable(),
});
export type Revision = z.infer<typeof revisionSchema>;

/**
 * Saves by one person with less than this between them are one editing stretch, kept as one revision (the last
 * state of the stretch). A longer pause, another person's save, leaving the editor or "Save revision" ends it.
 */
export const REVISION_PAUSE_MINUTES = 10;

/** Versions are stored as a PostgreSQL integer: anything past its largest value is a slip, not a version. */
const MAX_VERSION = 2_147_483_647;
const versionSchema = z.coerce
  .number({ message: 'Must be a whole number' })
  .int({ message: 'Must be a whole number' })
  .min(1, { message: 'At least 1' })
  .max(MAX_VERSION, { message: `At most ${MAX_VERSION}` });

const revisionNameSchema = text(
  z.string({ message: 'Must be text' }).trim().max(80, { message: 'At most 80 characters' }),
).transform((v) => (v === '' ? null : v));

/** POST /api/frames/:frameId/revisions: end the editing stretch at the current version, optionally naming it. */
export const keepRevisionRequestSchema = z.object({
  /** The version the caller is looking at; 409 when a newer save came in meanwhile. */
  baseVersion: versionSchema,
  name: revisionNameSchema.nullable().optional(),
});
export type KeepRevisionRequest = z.input<typeof keepRevisionRequestSchema>;

/** PATCH /api/frames/:frameId/revisions/:version: name (or, with an empty name, unname) a kept revision. */
export const nameRevisionRequestSchema = z.object({ name: revisionNameSchema.nullable() });
export type NameRevisionRequest = z.input<typeof nameRevisionRequestSchema>;

/** POST /api/frames/:frameId/revisions/:version/restore: that revision's document becomes a new save. */
export const restoreRevisionRequestSchema = z.object({ baseVersion: versionSchema });
export type RestoreRevisionRequest = z.input<typeof restoreRevisionRequestSchema>;

/** GET /api/frames/:frameId/revisions/compare?from=&to= */
export const compareRevisionsQuerySchema = z.object({ from: versionSchema, to: versionSchema });

export type RevisionComparison = {
  from: Omit<Revision, 'document'>;
  to: Omit<Revision, 'document'>;
  diff: RevisionDiff;
};
/** Checked for shape only; the server's engine made it. */
export const revisionComparisonSchema = z.custom<RevisionComparison>(
  (v) => typeof v === 'object' && v !== null && 'diff' in v && 'from' in v && 'to' in v,
  { message: 'Not a comparison of two revisions' },
);
