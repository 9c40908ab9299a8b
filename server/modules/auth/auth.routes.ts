import { Router, type Request } from 'express';
import { ipKeyGenerator } from 'express-rate-limit';
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
import { refuseCommonPassword } from './common-passwords';
import { forget, recordFailure, refuseIfBlocked, type ThrottleRule } from './throttle';
import { changePassword, confirmPasswordReset, requestPasswordReset } from './password.service';

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

  // Failed sign-ins per address and e-mail (growing delays past the allowance), and per address across every
  // e-mail (a larger allowance, so a shared office address is not slowed by one mistyped password). Counted in
  // PostgreSQL: every server sees them and a restart keeps them. A successful sign-in forgets its pair's count.
  const { max, windowMs } = config.signInRateLimit;
  const pairRule: ThrottleRule = { free: max, windowMs, firstDelayS: 30 };
  const addressRule: ThrottleRule = { free: max * 3, windowMs, firstDelayS: 30 };
  const signUpRule: ThrottleRule = { free: config.signUpRateLimit.max, windowMs: config.signUpRateLimit.windowMs, firstDelayS: 60 };
  const policy = (res: { set(name: string, value: string): unknown }, rule: ThrottleRule) =>
    res.set('RateLimit-Policy', `${rule.free};w=${Math.round(rule.windowMs / 1000)}`);
  const address = (req: Request) => ipKeyGenerator(req.ip ?? '');

  // Reset requests per address and e-mail (nobody fills someone's mailbox with reset links) and per address across
  // e-mails, in the same table as sign-in failures: every request counts, since mail is what is being limited.
  const resetPairRule: ThrottleRule = { free: max, windowMs, firstDelayS: 60 };
  const resetAddressRule: ThrottleRule = { free: max * 3, windowMs, firstDelayS: 60 };

  router.post('/auth/password-reset', async (req, res) => {
    const em = orm.em;
    const { email } = parseInput(passwordResetRequestSchema, req.body);
    const pair = `reset:${address(req)}|${email}`;
    const ip = `reset-ip:${address(req)}`;
    policy(res, resetPairRule);
    await refuseIfBlocked(em, [pair, ip], 'Too many reset requests; wait a few minutes and try again');
    await recordFailure(em, pair, resetPairRule);
    await recordFailure(em, ip, resetAddressRule);
    const sendLater = await requestPasswordReset(orm.em, config, email);
    res.status(202).json({ message: 'If this address has an account, a link to choose a new password is on its way.' });
    const mailer = createMailer(config.mail);
    sendLater(mailer)
      .catch((err: unknown) => console.error('Password reset mail not sent:', err instanceof Error ? err.message : err))
      .finally(() => mailer.close());
  });

  router.post('/auth/password-reset/confirm', async (req, res) => {
    const { token, password } = parseInput(passwordResetConfirmSchema, req.body);
    refuseCommonPassword(password, []);
    await confirmPasswordReset(orm.em, config, token, password);
    res.status(204).end();
  });

  router.post('/auth/password', async (req, res) => {
    const userId = currentUserId(req);
    const { currentPassword, password } = parseInput(changePasswordRequestSchema, req.body);
    refuseCommonPassword(password, []);
    await changePassword(orm.em, config, userId, req.sessionID, currentPassword, password);
    const csrfToken = await startSignedInSession(req, userId);
    res.json({ csrfToken });
  });

  router.get('/auth/csrf', async (req, res) => {
    const token = ensureCsrfToken(req);
    await saveSession(req);
    res.json({ token } satisfies CsrfResponse);
  });

  router.post('/auth/signup', async (req, res) => {
    const em = orm.em;
    const key = `signup:${address(req)}`;
    policy(res, signUpRule);
    await refuseIfBlocked(em, [key], 'Too many accounts created from this address; try again later');
    const input = parseInput(signUpRequestSchema, req.body);
    refuseCommonPassword(input.password, [input.email, input.name]);
    // Every attempt counts here, not only failures: accounts are what is being limited.
    await recordFailure(em, key, signUpRule);
    const user = await createUser(orm.em, input, config.bcryptCost);
    const csrfToken = await startSignedInSession(req, user.id);
    res.status(201).json({ user: toUserDto(user), csrfToken } satisfies AuthResponse);
  });

  router.post('/auth/signin', async (req, res) => {
    const em = orm.em;
    // Parsed first (cheap): the keys below hold only an e-mail the database can store.
    const input = parseInput(signInRequestSchema, req.body);
    const pair = `pair:${address(req)}|${input.email}`;
    const ip = `ip:${address(req)}`;
    policy(res, pairRule);
    await refuseIfBlocked(em, [pair, ip], 'Too many sign-in attempts; wait and try again');
    const user = await verifyCredentials(em, input.email, input.password, config.bcryptCost);
    if (!user) {
      await recordFailure(em, pair, pairRule);
      await recordFailure(em, ip, addressRule);
      throw new HttpError('invalid_credentials', 'Wrong e-mail or password');
    }
    await forget(em, pair);
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
