import { z } from 'zod';
import { emailSchema, idSchema, nameSchema } from './common';
import { userSchema } from './auth';
import { roleSchema, workshopRoleSchema } from './roles';

export const workshopParamsSchema = z.object({ workshopId: idSchema });
export const memberParamsSchema = z.object({ workshopId: idSchema, userId: idSchema });

export const workshopSummarySchema = z.object({
  id: idSchema,
  name: z.string(),
  role: roleSchema,
  memberCount: z.number().int(),
});
/** GET /api/workshops items; also the body returned by POST (201) and PATCH. */
export type WorkshopSummary = z.infer<typeof workshopSummarySchema>;

export const createWorkshopRequestSchema = z.object({ name: nameSchema });
export type CreateWorkshopRequest = z.input<typeof createWorkshopRequestSchema>;

export const renameWorkshopRequestSchema = z.object({ name: nameSchema });
export type RenameWorkshopRequest = z.input<typeof renameWorkshopRequestSchema>;

export const memberSchema = z.object({ user: userSchema, role: workshopRoleSchema });
/** GET .../members items; also the body returned by POST (201) and PATCH on a member. */
export type Member = z.infer<typeof memberSchema>;

export const addMemberRequestSchema = z.object({ email: emailSchema, role: workshopRoleSchema });
export type AddMemberRequest = z.input<typeof addMemberRequestSchema>;

export const updateMemberRequestSchema = z.object({ role: workshopRoleSchema });
export type UpdateMemberRequest = z.input<typeof updateMemberRequestSchema>;
