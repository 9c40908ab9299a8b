import { z } from 'zod';
import { idSchema, isoDateSchema, userRefSchema } from './common';

// Every error response: `{ error: { code, message, fields? } }`. `fields` maps a request field path
// (zod issue path joined with '.') to a message.
export const ERROR_STATUS = {
  bad_request: 400,
  validation: 400,
  unauthenticated: 401,
  invalid_credentials: 401,
  forbidden: 403,
  csrf: 403,
  not_found: 404,
  version_conflict: 409,
  conflict: 409,
  payload_too_large: 413,
  unprocessable: 422,
  rate_limited: 429,
  internal: 500,
  unavailable: 503,
} as const;
export type ErrorCode = keyof typeof ERROR_STATUS;
export const errorCodeSchema = z.enum(Object.keys(ERROR_STATUS) as [ErrorCode, ...ErrorCode[]]);

/** The stored state sent back with a 409 so the client can show what someone else saved. */
export const versionConflictCurrentSchema = z.object({
  version: z.number().int(),
  document: z.unknown(),
  savedAt: isoDateSchema,
  savedBy: userRefSchema.nullable(),
});
export type VersionConflictCurrent = z.infer<typeof versionConflictCurrentSchema>;

export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
    current: versionConflictCurrentSchema.optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorSchema>;

export const healthResponseSchema = z.object({ ok: z.boolean(), db: z.enum(['up', 'down']) });
export type HealthResponse = z.infer<typeof healthResponseSchema>;

