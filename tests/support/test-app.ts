import type { Express } from 'express';
import type pg from 'pg';
import type session from 'express-session';
import { createApp, disposeApp } from '../../server/app';
import { loadConfig, type Config } from '../../server/config';
import { createOrm, createSessionPool, type Orm } from '../../server/db';
import { createSessionStore } from '../../server/http/session';
import { WorkerPool, type WorkerPoolOptions } from '../../server/workers/pool';

// One running app over the test database, built the way server/index.ts builds it.

export interface TestContext {
  app: Express;
  orm: Orm;
  config: Config;
  /** Unexpected errors the app reported (a test that provokes a 500 can look here). */
  loggedErrors: unknown[];
  workers: WorkerPool;
  close(): Promise<void>;
}

export const TEST_SESSION_SECRET = 'test-session-secret-0123456789abcdef';

export function testConfig(overrides: Record<string, string> = {}): Config {
  return loadConfig({
    ...process.env,
    NODE_ENV: 'test',
    SESSION_SECRET: TEST_SESSION_SECRET,
    SERVE_CLIENT: 'false',
    ...overrides,
  });
}

export async function createTestContext(overrides: Record<string, string> = {}, workerOptions?: WorkerPoolOptions): Promise<TestContext> {
  const config = testConfig(overrides);
  const orm = await createOrm(config);
  const pool: pg.Pool = createSessionPool(config);
  const store: session.Store = createSessionStore(pool, { pruneIntervalSeconds: false });
  const loggedErrors: unknown[] = [];
  const workers = new WorkerPool(workerOptions);
  const app = createApp({ orm, config, sessionStore: store, workers, logError: (_m, err) => loggedErrors.push(err) });
  let closed = false;
  return {
    app,
    orm,
    config,
    loggedErrors,
    workers,
    async close() {
      if (closed) return;
      closed = true;
      (store as session.Store & { close?: () => void }).close?.();
      await workers.close();
      await disposeApp(app);
      await pool.end();
      await orm.close(true);
    },
  };
}

/** Empties every table but the migrations log (schema stays), so a test file starts from nothing. */
export async function truncateAll(orm: Orm): Promise<void> {
  const conn = orm.em.fork().getConnection();
  const rows = await conn.execute<{ tablename: string }[]>(
    "select tablename from pg_tables where schemaname = current_schema() and tablename <> 'mikro_orm_migrations'",
  );
  if (rows.length === 0) return;
  const list = rows.map((r) => `"${r.tablename.replace(/"/g, '""')}"`).join(', ');
  await conn.execute(`truncate table ${list} restart identity cascade`);
}
