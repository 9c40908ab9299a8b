import { z } from 'zod';
import { createProjectRequestSchema } from './projects';
import { cutSessionPlanSchema } from './cut-plan';
import { ATTACHMENT_TYPES, MAX_ATTACHMENT_BYTES } from './shop';
import { isoDateSchema, nameSchema, text } from './common';
import { frameDocumentJsonSchema } from './frames';

// A whole project as one file of our own: the live frames with every earlier revision and their cutting at the
// saw, and the project's files (base64). Nothing in it names a user or an id of the workshop it came from, so it
// can be imported into any workshop, where every record gets a new id. `format` and `version` say how to read
// it; a later version of the file gets its own reader, and this one refuses what it does not know.

export const PROJECT_FILE_FORMAT = 'slotwright-project';
export const PROJECT_FILE_VERSION = 1;
/** The largest project file an import reads (and an export writes). */
export const MAX_PROJECT_FILE_BYTES = 50 * 1024 * 1024;
export const PROJECT_FILE_LIMITS = { frames: 500, revisions: 1000, cuttingSessions: 50, ticks: 20_000, attachments: 200 } as const;

const many = <T extends z.ZodType>(item: T, max: number) => z.array(item, { message: 'Must be a list' }).max(max, { message: `At most ${max} entries` });
const version = z.number({ message: 'Must be a whole number' }).int({ message: 'Must be a whole number' }).min(1).max(1_000_000);
const short = (max: number) => text(z.string({ message: 'Must be text' }).min(1, { message: 'Must not be empty' }).max(max, { message: `At most ${max} characters` }));
/** base64 of at most MAX_ATTACHMENT_BYTES bytes. */
const base64 = z
  .string({ message: 'Must be base64 text' })
  .max(Math.ceil(MAX_ATTACHMENT_BYTES / 3) * 4, { message: `At most ${MAX_ATTACHMENT_BYTES / 1024 / 1024} MB of file` })
  .regex(/^[A-Za-z0-9+/]*={0,2}$/, { message: 'Must be base64 text' });

export const projectFileTickSchema = z.strictObject({ cutKey: short(200), mark: short(40), tickedAt: isoDateSchema });

export const projectFileCuttingSchema = z.strictObject({
  frameVersion: version,
  startedAt: isoDateSchema,
  plan: cutSessionPlanSchema,
  ticks: many(projectFileTickSchema, PROJECT_FILE_LIMITS.ticks),
});

export const projectFileRevisionSchema = z.strictObject({ version, savedAt: isoDateSchema, document: frameDocumentJsonSchema });

export const projectFileFrameSchema = z.strictObject({
  name: nameSchema,
  version,
  savedAt: isoDateSchema,
  document: frameDocumentJsonSchema,
  /** Earlier versions, oldest first. */
  revisions: many(projectFileRevisionSchema, PROJECT_FILE_LIMITS.revisions),
  /** Cutting started on this frame, oldest first (the last is the one the saw works from). */
  cutting: many(projectFileCuttingSchema, PROJECT_FILE_LIMITS.cuttingSessions),
});

export const projectFileAttachmentSchema = z.strictObject({
  filename: short(150),
  contentType: z.enum(ATTACHMENT_TYPES, { message: `One of ${ATTACHMENT_TYPES.join(', ')}` }),
  sharedWithClient: z.boolean(),
  createdAt: isoDateSchema,
  data: base64,
});

/** Read first on its own, so a file of another kind or a later version is named as such, not as a list of fields. */
export const projectFileHeaderSchema = z.object({
  format: z.literal(PROJECT_FILE_FORMAT, { message: `Not a project file (format must be "${PROJECT_FILE_FORMAT}")` }),
  version: z.literal(PROJECT_FILE_VERSION, { message: `This server reads project files of version ${PROJECT_FILE_VERSION}` }),
});

export const projectFileSchema = z.strictObject({
  format: z.literal(PROJECT_FILE_FORMAT),
  version: z.literal(PROJECT_FILE_VERSION),
  exportedAt: isoDateSchema,
  project: createProjectRequestSchema.strict(),
  frames: many(projectFileFrameSchema, PROJECT_FILE_LIMITS.frames),
  attachments: many(projectFileAttachmentSchema, PROJECT_FILE_LIMITS.attachments),
});
export type ProjectFile = z.infer<typeof projectFileSchema>;
