import type { DataSource } from 'typeorm';
import { IsNull } from 'typeorm';
import { PasswordReset } from '../entities/PasswordReset';
import { User } from '../entities/User';
import { ApiError, invalidField } from '../http/ApiError';
import type { Mailer } from '../mail/mailer';
import { passwordResetMail } from '../mail/messages';
import { endSessionsOf, findUserByEmail } from './accounts';
import { recordAudit } from './audit';
import { hashPassword } from './passwords';
import { hashToken, newToken } from './tokens';

export const RESET_VALID_MINUTES = 60;

/** Stores a one-time reset token for the user and returns the token (for the link). */
export async function createPasswordReset(dataSource: DataSource, userId: string, validMinutes = RESET_VALID_MINUTES): Promise<string> {
  const { token, tokenHash } = newToken();
  await dataSource.getRepository(PasswordReset).insert({
    userId,
    tokenHash,
    expiresAt: new Date(Date.now() + validMinutes * 60_000),
  });
  return token;
}

/**
 * Mails a reset link when an account has this address; does nothing visible otherwise, so the
 * answer never tells whether an address is registered.
 */
export async function requestPasswordReset(
  dataSource: DataSource,
  mailer: Mailer,
  publicUrl: string,
  email: string,
): Promise<void> {
  const user = await findUserByEmail(dataSource.manager, email);
  if (!user) return;
  const token = await createPasswordReset(dataSource, user.id);
  mailer.sendInBackground(
    passwordResetMail({ to: user.email, name: user.name, link: `${publicUrl}/reset/${token}`, validMinutes: RESET_VALID_MINUTES }),
  );
}

/**
 * Sets a new password with a reset token: 400 when the token is unknown or used, 410 when it
 * has expired. Uses the token, proves the address, and ends all of the user's sessions.
 */
export async function confirmPasswordReset(
  dataSource: DataSource,
  token: string,
  password: string,
  ip: string | undefined,
): Promise<User> {
  const passwordHash = await hashPassword(password);
  return dataSource.transaction(async (manager) => {
    const reset = await manager.findOne(PasswordReset, {
      where: { tokenHash: hashToken(token) },
      lock: { mode: 'pessimistic_write' },
    });
    if (!reset || reset.usedAt) {
      throw invalidField('token', 'this reset link is not valid or has already been used; ask for a new one');
    }
    if (reset.expiresAt.getTime() <= Date.now()) {
      throw new ApiError(410, 'expired', 'token: this reset link has expired; ask for a new one');
    }
    const now = new Date();
    await manager.update(PasswordReset, { id: reset.id }, { usedAt: now });
    // Every other open link for this account stops working too.
    await manager.update(PasswordReset, { userId: reset.userId, usedAt: IsNull() }, { usedAt: now });
    const user = await manager.findOneByOrFail(User, { id: reset.userId });
    await manager.update(User, { id: user.id }, { passwordHash, emailVerifiedAt: user.emailVerifiedAt ?? now });
    await endSessionsOf(manager, user.id);
    await recordAudit(manager, { action: 'auth.password-reset', actorUserId: user.id, subject: user.email, ip });
    return user;
  });
}
