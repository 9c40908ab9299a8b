import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import express, { type Express, type RequestHandler } from 'express';
import expressStaticGzip from 'express-static-gzip';
import helmet from 'helmet';
import type session from 'express-session';
import { RequestContext } from '@mikro-orm/core';
import type { Config } from './config';
import { createSessionPool, type Orm } from './db';
import { NotFoundError } from './errors';
import { csrfProtection } from './http/csrf';
import { errorHandler, loggableError, type ErrorLogger } from './http/error-handler';
import { createSessionStore, sessionMiddleware } from './http/session';
import { authRouter } from './modules/auth/auth.routes';
import { framesRouter } from './modules/frames/frames.routes';
import { createHealthPool, healthRouter } from './modules/health/health.routes';
import { projectFileRouter } from './modules/projects/project-file.routes';
import { projectsRouter } from './modules/projects/projects.routes';
import { workshopsRouter } from './modules/workshops/workshops.routes';
import { attachmentsRouter } from './modules/attachments/attachments.routes';
import { cuttingRouter } from './modules/cutting/cutting.routes';
import { ordersRouter } from './modules/orders/orders.routes';
import { outboxRouter } from './modules/outbox/outbox.routes';
import { stockRouter } from './modules/stock/stock.routes';
import { suppliersRouter } from './modules/suppliers/suppliers.routes';
import { plannerRouter } from './modules/planner/planner.routes';
import { invitationsRouter } from './modules/invitations/invitations.routes';
import { sharingRouter } from './modules/sharing/sharing.routes';
import { activityRouter } from './modules/activity/activity.routes';
import { binRouter } from './modules/bin/bin.routes';
import { WorkerPool } from './workers/pool';

export interface Services {
  orm: Orm;
  config: Config;
  /** Where sessions live; when omitted the app opens its own PostgreSQL store (closed by disposeApp). */
  sessionStore?: session.Store;
  /** Where unexpected errors are reported; defaults to stderr. */
  logError?: ErrorLogger;
  /** Worker threads for plans and documents; when omitted the app starts its own (closed by disposeApp). */
  workers?: WorkerPool;
}

const ownedStores = new WeakMap<Express, { close(): Promise<void> }>();

const defaultLogger: ErrorLogger = (message, err) => {
  console.error(`${message}: ${loggableError(err)}`);
};

/** Hashed build output: a new build gives new names, so a copy never needs checking again. */
export const IMMUTABLE = 'public, max-age=31536000, immutable';
/** index.html and other unhashed files: always asked again (cheap with the ETag), so a new build shows at once. */
export const REVALIDATE = 'no-cache';

/**
 * The built client, served as the brotli or gzip copy made at build time when the browser takes one (see
 * vite.config.ts), with cache headers by kind of file; any other page address gets index.html (the router's).
 */
function clientFiles(dir: string): RequestHandler[] {
  const root = resolve(dir);
  const index = resolve(root, 'index.html');
  if (!existsSync(index)) return [];
  const assets = resolve(root, 'assets');
  const files = expressStaticGzip(root, {
    enableBrotli: true,
    orderPreference: ['br', 'gzip'],
    index: 'index.html',
    serveStatic: {
      cacheControl: false,
      setHeaders: (res, path) => res.setHeader('Cache-Control', resolve(path).startsWith(assets) ? IMMUTABLE : REVALIDATE),
    },
  });
  const spaFallback: RequestHandler = (req, res, next) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || req.path.startsWith('/api/') || req.path === '/api') return next();
    // A missing hashed file is a 404, not the app: a stale page asking for an old chunk must see it fail.
    if (req.path.startsWith('/assets/')) return next();
    req.url = '/index.html';
    files(req, res, next);
  };
  return [files, spaFallback];
}

/** Builds the HTTP app; listening, and closing the ORM and pools, are the caller's business. */
export function createApp(services: Services): Express {
  const { orm, config } = services;
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);

  const owned: (() => Promise<void>)[] = [];
  let store = services.sessionStore;
  if (!store) {
    const pool = createSessionPool(config);
    const own = createSessionStore(pool);
    owned.push(async () => {
      (own as session.Store & { close?: () => void }).close?.();
      await pool.end();
    });
    store = own;
  }
  let workers = services.workers;
  if (!workers) {
    const own = new WorkerPool();
    owned.push(() => own.close());
    workers = own;
  }
  ownedStores.set(app, { close: async () => void (await Promise.all(owned.map((c) => c()))) });

  // Upgrading sub-requests to https only makes sense when the site is served over https.
  app.use(
    helmet({
      contentSecurityPolicy: { directives: { upgradeInsecureRequests: config.cookieSecure === true ? [] : null } },
    }),
  );

  // Before the session, so health checks and static files never touch the session table.
  const healthPool = createHealthPool(config.databaseUrl);
  owned.push(() => healthPool.end());
  app.use('/api', healthRouter(healthPool));
  if (config.serveClient) app.use(clientFiles(config.clientDir));

  const api = express.Router();
  api.use(express.json({ limit: config.bodyLimit }));
  api.use(sessionMiddleware(config, store));
  api.use(csrfProtection());
  api.use((_req, _res, next) => RequestContext.create(orm.em, next));
  api.use(authRouter(orm, config));
  api.use(workshopsRouter(orm));
  api.use(projectsRouter(orm));
  api.use(projectFileRouter(orm, workers));
  api.use(framesRouter(orm, workers));
  api.use(suppliersRouter(orm));
  api.use(ordersRouter(orm, config, workers));
  api.use(cuttingRouter(orm, workers));
  api.use(stockRouter(orm));
  api.use(attachmentsRouter(orm));
  api.use(outboxRouter(orm, config));
  api.use(plannerRouter(workers));
  api.use(invitationsRouter(orm, config));
  api.use(sharingRouter(orm, config));
  api.use(activityRouter(orm));
  api.use(binRouter(orm));
  api.use((req, _res, next) => next(new NotFoundError(`API route ${req.method} ${req.baseUrl}${req.path}`)));
  app.use('/api', api);

  app.use(errorHandler(services.logError ?? defaultLogger));
  return app;
}

/** Closes what createApp opened itself (the session store when none was passed in). */
export async function disposeApp(app: Express): Promise<void> {
  await ownedStores.get(app)?.close();
  ownedStores.delete(app);
}
