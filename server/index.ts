import type { Server } from 'node:http';
import { createApp, disposeApp } from './app';
import { ConfigError, loadConfig } from './config';
import { createOrm, createSessionPool } from './db';
import { createSessionStore } from './http/session';
import { WorkerPool } from './workers/pool';
import { scheduleBinPurge } from './modules/bin/bin.routes';

// Listen, and on SIGINT/SIGTERM stop taking connections, let requests in flight finish, then close the
// session store, its pool and the ORM, so no transaction is left half-done.

async function main(): Promise<void> {
  const config = loadConfig();
  // A made-up secret would differ between servers on one database (a session valid on one only) and end every
  // session on restart: only a development server may run without one.
  if (config.sessionSecretGenerated && config.env !== 'development') {
    throw new ConfigError(`Invalid environment:\n  SESSION_SECRET: required to serve when NODE_ENV=${config.env}`);
  }
  if (config.sessionSecretGenerated) {
    console.warn('SESSION_SECRET is not set: using a random one, so sessions end when the server stops.');
  }
  const orm = await createOrm(config);
  const pool = createSessionPool(config);
  const sessionStore = createSessionStore(pool);
  const workers = new WorkerPool();
  const app = createApp({ orm, config, sessionStore, workers });

  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(config.port, config.host, (err?: Error) => (err ? reject(err) : resolve(s)));
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.port;
  console.log(`Slotwright API listening on http://${config.host}:${port}/api`);
  // The bin's 30 days are also checked whenever it is opened; this catches a bin nobody opens.
  const stopPurge = scheduleBinPurge(orm, 6 * 60 * 60 * 1000, (err) => console.error('Bin purge failed:', err instanceof Error ? err.message : err));

  let closing = false;
  const shutdown = async (signal: string) => {
    if (closing) return;
    closing = true;
    console.log(`${signal}: shutting down`);
    // Idle keep-alive sockets would otherwise hold server.close() open.
    const force = setTimeout(() => server.closeAllConnections(), 10_000).unref();
    server.closeIdleConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    clearTimeout(force);
    stopPurge();
    (sessionStore as typeof sessionStore & { close?: () => void }).close?.();
    await workers.close();
    await disposeApp(app);
    await pool.end();
    await orm.close(true);
    process.exit(0);
  };
  process.on('SIGINT', () => void shutdown('SIGINT'));
  process.on('SIGTERM', () => void shutdown('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error(err instanceof ConfigError ? err.message : err);
  process.exit(1);
});
