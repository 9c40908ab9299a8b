import { Router, type Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { AuthResponse, CsrfResponse, MeResponse } from '@shared/api/auth';
import {
  changePasswordRequestSchema,
  passwordResetConfirmSchema,
  passwordResetRequestSchema,
  signInRequestSchema,
  signUpRequestSchema,
} from '@shared/api/auth';
import type { Config } from '../../config';
import type { Orm } from '../../db';
import { HttpError, UnauthenticatedError } from '../../errors';
import { ensureCsrfToken, newCsrfToken } from '../../http/csrf';
import { destroySession, regenerateSession, saveSession, SESSION_COOKIE } from '../../http/session';
import { parseInput } from '../../validate';
import { createMailer } from '../../mail/mailer';
import { currentUserId } from '../../http/current-user';
import { clientProjectsOf, createUser, findUser, membershipsOf, toUserDto, verifyCredentials } from './auth.service';
import { changePassword, confirmPasswordReset, requestPasswordReset } from './password.service';

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

/** Signs the request in as `userId` (a new session id and CSRF token); used by sign-up, sign-in and invitations. */
export { startSignedInSession };

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

  // Per address and e-mail, like sign-in, so nobody fills someone's mailbox with reset links.
  const resetLimiter = rateLimit({
    windowMs: config.signInRateLimit.windowMs,
    limit: config.signInRateLimit.max,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${emailKey(req)}`,
    handler: rateLimited('Too many reset requests; wait a few minutes and try again'),
  });

  router.post('/auth/password-reset', resetLimiter, async (req, res) => {
    const { email } = parseInput(passwordResetRequestSchema, req.body);
    const sendLater = await requestPasswordReset(orm.em, config, email);
    res.status(202).json({ message: 'If this address has an account, a link to choose a new password is on its way.' });
    const mailer = createMailer(config.mail);
    sendLater(mailer)
      .catch((err: unknown) => console.error('Password reset mail not sent:', err instanceof Error ? err.message : err))
      .finally(() => mailer.close());
  });

  router.post('/auth/password-reset/confirm', async (req, res) => {
    const { token, password } = parseInput(passwordResetConfirmSchema, req.body);
    await confirmPasswordReset(orm.em, config, token, password);
    res.status(204).end();
  });

  router.post('/auth/password', async (req, res) => {
    const userId = currentUserId(req);
    const { currentPassword, password } = parseInput(changePasswordRequestSchema, req.body);
    await changePassword(orm.em, config, userId, req.sessionID, currentPassword, password);
    const csrfToken = await startSignedInSession(req, userId);
    res.json({ csrfToken });
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
    const user = await verifyCredentials(orm.em, input.email, input.password);
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
    const clientProjects = await clientProjectsOf(orm.em, user.id);
    const csrfToken = ensureCsrfToken(req);
    res.json({ user: toUserDto(user), memberships, clientProjects, csrfToken } satisfies MeResponse);
  });

  return router;
}
