import { Router } from 'express';
import type { HealthResponse } from '@shared/api/errors';
import type { Orm } from '../../db';

/** A probe that never hangs: a database that does not answer within this long counts as down. */
const PROBE_TIMEOUT_MS = 2_000;

export function healthRouter(orm: Orm): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<{ ok: false }>((resolve) => {
      timer = setTimeout(() => resolve({ ok: false }), PROBE_TIMEOUT_MS);
    });
    const { ok } = await Promise.race([orm.checkConnection().catch(() => ({ ok: false })), timeout]);
    clearTimeout(timer);
    if (!ok) res.set('Retry-After', '5');
    res.set('Cache-Control', 'no-store');
    res.status(ok ? 200 : 503).json({ ok, db: ok ? 'up' : 'down' } satisfies HealthResponse);
  });
  return router;
}
