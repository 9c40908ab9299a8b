import { Router } from 'express';
import pg from 'pg';
import type { HealthResponse } from '@shared/api/errors';

/** A probe that never hangs: a database that does not answer within this long counts as down. */
const PROBE_TIMEOUT_MS = 2_000;

/**
 * The probe has its own single connection, so it answers at once even when every pooled connection is busy
 * with requests (it asks whether the database is up, not how long the queue is).
 */
export function createHealthPool(databaseUrl: string): pg.Pool {
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 1, connectionTimeoutMillis: PROBE_TIMEOUT_MS, idleTimeoutMillis: 30_000, allowExitOnIdle: true });
  pool.on('error', () => undefined); // a lost idle connection is replaced on the next probe
  return pool;
}

export function healthRouter(pool: pg.Pool): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<boolean>((resolve) => {
      timer = setTimeout(() => resolve(false), PROBE_TIMEOUT_MS);
    });
    const query = pool.query('select 1').then(
      () => true,
      () => false,
    );
    const ok = await Promise.race([query, timeout]);
    clearTimeout(timer);
    if (!ok) res.set('Retry-After', '5');
    res.set('Cache-Control', 'no-store');
    res.status(ok ? 200 : 503).json({ ok, db: ok ? 'up' : 'down' } satisfies HealthResponse);
  });
  return router;
}
