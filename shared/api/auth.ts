import { z } from 'zod';
import { emailSchema, idSchema, text } from './common';
import { roleSchema } from './roles';

// bcrypt only reads the first 72 bytes of a password; a longer one would be silently truncated.
const BCRYPT_MAX_BYTES = 72;

export const passwordSchema = text(z.string({ message: 'Required' }))
  .min(10, { message: 'At least 10 characters' })
  .refine((p) => new TextEncoder().encode(p).length <= BCRYPT_MAX_BYTES, {
    message: `At most ${BCRYPT_MAX_BYTES} bytes`,
  });

export const signUpRequestSchema = z.object({
  email: emailSchema,
  password: passwordSchema,
  name: text(z.string({ message: 'Required' }).trim().min(1, { message: 'Must not be empty' }).max(100, { message: 'At most 100 characters' })),
});
export type SignUpRequest = z.input<typeof signUpRequestSchema>;

export const signInRequestSchema = z.object({
  email: emailSchema,
  password: text(z.string({ message: 'Required' }).min(1, { message: 'Must not be empty' }).max(1024)),
});
export type SignInRequest = z.input<typeof signInRequestSchema>;

export const userSchema = z.object({ id: idSchema, email: z.string(), name: z.string() });
export type User = z.infer<typeof userSchema>;

/** Returned by sign-up (201) and sign-in (200); the token is new because the session was regenerated. */
export const authResponseSchema = z.object({ user: userSchema, csrfToken: z.string() });
export type AuthResponse = z.infer<typeof authResponseSchema>;

export const membershipSchema = z.object({
  workshop: z.object({ id: idSchema, name: z.string() }),
  role: roleSchema,
});
export type Membership = z.infer<typeof membershipSchema>;

/** A project someone was let into as a client (they are no member of its workshop). */
export const clientProjectSchema = z.object({
  project: z.object({ id: idSchema, name: z.string() }),
  workshop: z.object({ id: idSchema, name: z.string() }),
});
export type ClientProject = z.infer<typeof clientProjectSchema>;

export const meResponseSchema = z.object({
  user: userSchema,
  memberships: z.array(membershipSchema),
  clientProjects: z.array(clientProjectSchema),
  csrfToken: z.string(),
});
export type MeResponse = z.infer<typeof meResponseSchema>;

export const csrfResponseSchema = z.object({ token: z.string() });
export type CsrfResponse = z.infer<typeof csrfResponseSchema>;

/** Header carrying the synchronizer token on every POST/PUT/PATCH/DELETE under /api. */
export const CSRF_HEADER = 'X-CSRF-Token';

/** POST /api/auth/password-reset: always 202 with the same answer, whether or not the address has an account. */
export const passwordResetRequestSchema = z.object({ email: emailSchema });
export type PasswordResetRequest = z.input<typeof passwordResetRequestSchema>;

/** POST /api/auth/password-reset/confirm: the token from the e-mailed link and the new password; 204. */
export const passwordResetConfirmSchema = z.object({
  token: z.string({ message: 'Required' }).regex(/^[A-Za-z0-9_-]{43}$/, { message: 'Not a valid link' }),
  password: passwordSchema,
});
export type PasswordResetConfirm = z.input<typeof passwordResetConfirmSchema>;

/** POST /api/auth/password (signed in): every other session of the account ends; the reply carries a new token. */
export const changePasswordRequestSchema = z.object({
  currentPassword: z.string({ message: 'Required' }).min(1, { message: 'Must not be empty' }).max(1024),
  password: passwordSchema,
});
export type ChangePasswordRequest = z.input<typeof changePasswordRequestSchema>;
