// HTTP contract of the quick planner: one profile's job, an optional time limit, and the plan back.
import { z } from 'zod';
import { cutJobSchema } from './job';

/** Longest improvement stage the server grants one request (ms). */
export const MAX_SERVER_TIME_LIMIT_MS = 5000;

export const planCutRequestSchema = z.strictObject({
  job: cutJobSchema,
  timeLimitMs: z.number().int().min(0).max(MAX_SERVER_TIME_LIMIT_MS).optional(),
});

export type PlanCutRequest = z.input<typeof planCutRequestSchema>;
