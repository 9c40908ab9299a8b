import { z } from 'zod';
import { emailSchema, idSchema, isoDateSchema, nameSchema } from './common';
import { passwordSchema, userSchema } from './auth';
import { roleSchema, workshopRoleSchema } from './roles';

// Invitations by e-mail: to the workshop with a role, or as a client to some of its projects only.

/** The token in an e-mailed link: 32 random bytes, base64url. */
export const tokenSchema = z.string({ message: 'Required' }).regex(/^[A-Za-z0-9_-]{43}$/, { message: 'Not a valid link' });
export const tokenParamsSchema = z.object({ token: tokenSchema });
export const invitationParamsSchema = z.object({ invitationId: idSchema });

export const MAX_CLIENT_PROJECTS = 50;

export const inviteRequestSchema = z.discriminatedUnion('role', [
  z.object({ email: emailSchema, role: workshopRoleSchema }),
  z.object({
    email: emailSchema,
    role: z.literal('client'),
    projectIds: z.array(idSchema).min(1, { message: 'Choose at least one project' }).max(MAX_CLIENT_PROJECTS, { message: `At most ${MAX_CLIENT_PROJECTS} projects` }),
  }),
], { message: 'Choose a role' });
export type InviteRequest = z.input<typeof inviteRequestSchema>;

export const invitationSchema = z.object({
  id: idSchema,
  email: z.string(),
  role: roleSchema,
  projects: z.array(z.object({ id: idSchema, name: z.string() })),
  expiresAt: isoDateSchema,
  createdAt: isoDateSchema,
  invitedBy: z.object({ id: idSchema, name: z.string() }).nullable(),
});
/** POST /api/workshops/:id/invitations (201) and GET ... items (pending only). */
export type Invitation = z.infer<typeof invitationSchema>;

/** GET /api/invitations/:token, open to anyone holding the link. */
export const invitationPreviewSchema = z.object({
  workshop: z.string(),
  email: z.string(),
  role: roleSchema,
  projects: z.array(z.string()),
  invitedBy: z.string().nullable(),
  /** Whether the invited address has an account (sign in to accept) or not (choose a name and password). */
  hasAccount: z.boolean(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/** POST /api/invitations/:token/accept: signed in as the invited address with no body, or signed out with a new account. */
export const acceptInvitationRequestSchema = z.object({
  name: nameSchema.optional(),
  password: passwordSchema.optional(),
});
export type AcceptInvitationRequest = z.input<typeof acceptInvitationRequestSchema>;

export const acceptInvitationResponseSchema = z.object({
  user: userSchema,
  csrfToken: z.string(),
  workshopId: idSchema,
  role: roleSchema,
  /** For a client: the first project they were let into, to open. */
  projectId: idSchema.nullable(),
});
export type AcceptInvitationResponse = z.infer<typeof acceptInvitationResponseSchema>;

export const projectClientSchema = z.object({ user: userSchema, since: isoDateSchema });
/** GET /api/projects/:id/clients items. */
export type ProjectClient = z.infer<typeof projectClientSchema>;
export const projectClientParamsSchema = z.object({ projectId: idSchema, userId: idSchema });
