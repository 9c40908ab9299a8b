import { Router, type Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { AuthResponse, CsrfResponse, MeResponse } from '@shared/api/auth';
import { signInRequestSchema, signUpRequestSchema } from '@shared/api/auth';
import type { Config } from '../../config';
import type { Orm } from '../../db';
import { HttpError, UnauthenticatedError } from '../../errors';
import { ensureCsrfToken, newCsrfToken } from '../../http/csrf';
import { destroySession, regenerateSession, saveSession, SESSION_COOKIE } from '../../http/session';
import { parseInput } from '../../validate';
import { createUser, findUser, membershipsOf, toUserDto, verifyCredentials } from './auth.service';

function emailKey(req: Request): string {
  const email: unknown = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase() : '';
}

/** A fresh session id for the signed-in user (no fixation), with a fresh CSRF token. */
async function startSignedInSession(req: Request, userId: string): Promise<string> {
  await regenerateSession(req);
  req.session.userId = userId;
  req.session.csrfToken = newCsrfToken();
  await saveSession(req);
  return req.session.csrfToken;
}

export function authRouter(orm: Orm, config: Config): Router {
  const router = Router();

  const rateLimited = (message: string) => (_req: Request, _res: unknown, next: (err: unknown) => void) =>
    next(new HttpError('rate_limited', message));

  // Failed attempts per address and e-mail; a successful sign-in does not count against the limit.
  const signInLimiter = rateLimit({
    windowMs: config.signInRateLimit.windowMs,
    limit: config.signInRateLimit.max,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${emailKey(req)}`,
    handler: rateLimited('Too many sign-in attempts; wait a few minutes and try again'),
  });
  const signUpLimiter = rateLimit({
    windowMs: config.signUpRateLimit.windowMs,
    limit: config.signUpRateLimit.max,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    keyGenerator: (req) => ipKeyGenerator(req.ip ?? ''),
    handler: rateLimited('Too many accounts created from this address; try again later'),
  });

  router.get('/auth/csrf', async (req, res) => {
    const token = ensureCsrfToken(req);
    await saveSession(req);
    res.json({ token } satisfies CsrfResponse);
  });

  router.post('/auth/signup', signUpLimiter, async (req, res) => {
    const input = parseInput(signUpRequestSchema, req.body);
    const user = await createUser(orm.em, input, config.bcryptCost);
    const csrfToken = await startSignedInSession(req, user.id);
    res.status(201).json({ user: toUserDto(user), csrfToken } satisfies AuthResponse);
  });

  router.post('/auth/signin', signInLimiter, async (req, res) => {
    const input = parseInput(signInRequestSchema, req.body);
    const user = await verifyCredentials(orm.em, input.email, input.password, config.bcryptCost);
    if (!user) throw new HttpError('invalid_credentials', 'Wrong e-mail or password');
    const csrfToken = await startSignedInSession(req, user.id);
    res.json({ user: toUserDto(user), csrfToken } satisfies AuthResponse);
  });

  router.post('/auth/signout', async (req, res) => {
    await destroySession(req);
    res.clearCookie(SESSION_COOKIE, { path: '/' });
    res.status(204).end();
  });

  router.get('/auth/me', async (req, res) => {
    const userId = req.session.userId;
    const user = userId ? await findUser(orm.em, userId) : null;
    if (!user) {
      // A session that points at no account is of no further use.
      if (userId) await destroySession(req);
      throw new UnauthenticatedError();
    }
    const memberships = await membershipsOf(orm.em, user.id);
    const csrfToken = ensureCsrfToken(req);
    res.json({ user: toUserDto(user), memberships, csrfToken } satisfies MeResponse);
  });

  return router;
}
