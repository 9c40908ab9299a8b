import { z } from 'zod';
import { idSchema, isoDateSchema, nameSchema, text } from './common';
import { frameSummarySchema } from './frames';
import { roleSchema } from './roles';

export const projectParamsSchema = z.object({ projectId: idSchema });

const clientSchema = text(z.string({ message: 'Must be text' }).trim().max(200, { message: 'At most 200 characters' }));
const notesSchema = text(z.string({ message: 'Must be text' }).max(5000, { message: 'At most 5000 characters' }));

/** GET /api/workshops/:workshopId/projects items; also returned by POST (201) and PATCH. `client`/`notes` '' when unset. */
export const projectSummarySchema = z.object({
  id: idSchema,
  name: z.string(),
  client: z.string(),
  notes: z.string(),
  frameCount: z.number().int(),
  updatedAt: isoDateSchema,
  createdAt: isoDateSchema,
});
export type ProjectSummary = z.infer<typeof projectSummarySchema>;

export const projectDetailSchema = z.object({
  id: idSchema,
  workshopId: idSchema,
  name: z.string(),
  client: z.string(),
  notes: z.string(),
  role: roleSchema,
  updatedAt: isoDateSchema,
  createdAt: isoDateSchema,
  frames: z.array(frameSummarySchema),
});
/** GET /api/projects/:projectId — live frames only. */
export type ProjectDetail = z.infer<typeof projectDetailSchema>;

export const createProjectRequestSchema = z.object({
  name: nameSchema,
  client: clientSchema.optional(),
  notes: notesSchema.optional(),
});
export type CreateProjectRequest = z.input<typeof createProjectRequestSchema>;

export const updateProjectRequestSchema = z
  .object({ name: nameSchema.optional(), client: clientSchema.optional(), notes: notesSchema.optional() })
  .refine((b) => b.name !== undefined || b.client !== undefined || b.notes !== undefined, {
    message: 'Give at least one of name, client, notes',
  });
export type UpdateProjectRequest = z.input<typeof updateProjectRequestSchema>;
