import { Router } from 'express';
import type { HealthResponse } from '@shared/api/errors';
import type { Orm } from '../../db';

export function healthRouter(orm: Orm): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const { ok } = await orm.checkConnection();
    res.status(ok ? 200 : 503).json({ ok, db: ok ? 'up' : 'down' } satisfies HealthResponse);
  });
  return router;
}
