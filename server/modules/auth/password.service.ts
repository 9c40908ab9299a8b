import bcrypt from 'bcryptjs';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { Config } from '../../config';
import { HttpError, UnauthenticatedError } from '../../errors';
import type { Mailer } from '../../mail/mailer';
import { hashToken, newToken } from '../access/tokens';
import { User } from '../users/user.entity';
import { hashPassword } from './auth.service';
import { PasswordReset } from './password-reset.entity';
import { endSessionsOf } from './sessions.service';

const invalidLink = () => new HttpError('unprocessable', 'This reset link is not valid any more; ask for a new one', { token: 'Expired or already used' });

function resetMail(to: string, link: string, minutes: number) {
  return {
    kind: 'password-reset' as const,
    to,
    subject: 'Reset your Slotwright password',
    text: [
      'Someone (hopefully you) asked to reset the password of the Slotwright account for this address.',
      '',
      `Choose a new password here within ${minutes} minutes:`,
      link,
      '',
      'The link works once. If you did not ask for it, ignore this mail: your password stays as it is.',
    ].join('\n'),
  };
}

/**
 * Starts a reset when the address has an account, and otherwise does nothing; the caller answers the same in
 * both cases. The mail goes out after the answer, so the time taken tells nothing either.
 */
export async function requestPasswordReset(em: EntityManager, config: Config, email: string): Promise<(mailer: Mailer) => Promise<void>> {
  const user = await em.findOne(User, { email });
  if (!user) return async () => {};
  const { token, hash } = newToken();
  em.create(PasswordReset, { user, tokenHash: hash, expiresAt: new Date(Date.now() + config.resetTtlMs) });
  await em.flush();
  const link = `${config.appUrl}/reset-password/${token}`;
  return async (mailer) => {
    await mailer.send(resetMail(user.email, link, Math.round(config.resetTtlMs / 60_000)));
  };
}

/** Sets the new password, spends the token (and every other open one of the user) and ends all their sessions. */
export async function confirmPasswordReset(em: EntityManager, config: Config, token: string, password: string): Promise<void> {
  const passwordHash = await hashPassword(password, config.bcryptCost);
  await em.transactional(async (tem) => {
    // Spending the token and reading it are one statement, so two uses at once cannot both succeed.
    const rows = await tem.execute<{ user_id: string }[]>(
      `update "password_resets" set "used_at" = now() where "token_hash" = ? and "used_at" is null and "expires_at" > now() returning "user_id"`,
      [hashToken(token)],
    );
    const userId = rows[0]?.user_id;
    if (!userId) throw invalidLink();
    await tem.nativeUpdate(User, { id: userId }, { passwordHash });
    await tem.nativeUpdate(PasswordReset, { user: userId, usedAt: null }, { usedAt: new Date() });
    await endSessionsOf(tem, userId);
  });
}

/** Changes a signed-in user's password after checking the current one; ends every other session of theirs. */
export async function changePassword(em: EntityManager, config: Config, userId: string, sid: string, current: string, password: string): Promise<void> {
  const user = await em.findOne(User, { id: userId });
  if (!user) throw new UnauthenticatedError();
  if (!(await bcrypt.compare(current, user.passwordHash))) {
    throw new HttpError('validation', 'The current password is not right', { currentPassword: 'Not your current password' });
  }
  user.passwordHash = await hashPassword(password, config.bcryptCost);
  await em.flush();
  await endSessionsOf(em, userId, sid);
}
