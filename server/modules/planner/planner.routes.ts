import { Router } from 'express';
import type { CutPlan } from '@shared/planner';
import { planCutRequestSchema } from '@shared/planner/api';
import { ValidationError } from '../../errors';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { clientGone, type WorkerPool } from '../../workers/pool';

/**
 * What one request may ask of the planner, whatever the job schema allows: a stranger's job stays a few seconds
 * of one worker and a few MB (the planner works per piece). The Quick planner's largest useful lists are far below.
 */
export const PLAN_ROUTE_LIMITS = { parts: 2_000, pieces: 10_000, stock: 100 } as const;

function checkJobSize(job: { parts: { qty: number }[]; stock: unknown[] }): void {
  const fields: Record<string, string> = {};
  if (job.parts.length > PLAN_ROUTE_LIMITS.parts) fields['job.parts'] = `At most ${PLAN_ROUTE_LIMITS.parts} part lines`;
  const pieces = job.parts.reduce((n, p) => n + p.qty, 0);
  if (!(pieces <= PLAN_ROUTE_LIMITS.pieces)) fields['job.parts'] ??= `At most ${PLAN_ROUTE_LIMITS.pieces} pieces in all (sum of qty); this job has ${pieces}`;
  if (job.stock.length > PLAN_ROUTE_LIMITS.stock) fields['job.stock'] = `At most ${PLAN_ROUTE_LIMITS.stock} stock lines`;
  if (Object.keys(fields).length > 0) throw new ValidationError(fields, 'The cutting job is larger than one request may plan');
}

/**
 * POST /plan/cut — plan one profile's cutting from a pasted job. Any signed-in user may plan (nothing is stored).
 * The plan runs in a worker thread, so other requests are served meanwhile; a client that goes away ends it.
 */
export function plannerRouter(workers: WorkerPool): Router {
  const router = Router();
  router.post('/plan/cut', async (req, res) => {
    currentUserId(req);
    const body = parseInput(planCutRequestSchema, req.body);
    checkJobSize(body.job);
    const plan = await workers.run<CutPlan>({ task: 'plan', job: body.job, timeLimitMs: body.timeLimitMs }, clientGone(res));
    res.json(plan);
  });
  return router;
}
