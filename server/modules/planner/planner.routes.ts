import { Router } from 'express';
import { planCuts } from '@shared/planner';
import { planCutRequestSchema } from '@shared/planner/api';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';

/**
 * POST /plan/cut — plan one profile's cutting from a pasted job. Any signed-in user may plan (nothing is stored).
 * planCuts yields to the event loop between slices, so other requests are served while it runs, and a client that
 * goes away cancels it.
 */
export function plannerRouter(): Router {
  const router = Router();
  router.post('/plan/cut', async (req, res) => {
    currentUserId(req);
    const body = parseInput(planCutRequestSchema, req.body);
    const stop = new AbortController();
    res.on('close', () => {
      if (!res.writableEnded) stop.abort();
    });
    const plan = await planCuts(body.job, { timeLimitMs: body.timeLimitMs, signal: stop.signal });
    res.json(plan);
  });
  return router;
}
