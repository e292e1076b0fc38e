import 'server-only';
import { Op } from 'sequelize';
import { hashPassword } from '@/lib/auth/password';
import { passwordDiffersFromEmail } from '@/lib/auth/password-policy';
import { hashToken, newToken } from '@/lib/auth/tokens';
import { recordAudit } from '@/lib/audit';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { sendMail } from '@/lib/mail/mailer';
import { passwordResetMail } from '@/lib/mail/templates';
import { PasswordResetToken, User } from '@/models';

/** A reset link is good for one hour (common practice for e-mailed reset links). */
export const RESET_TOKEN_LIFETIME_MS = 60 * 60 * 1000;

/**
 * E-mails a reset link when the address has an account. Answers the same either
 * way so that the form cannot be used to find out who has an account.
 */
export async function requestPasswordReset({ email, now = new Date() }: { email: string; now?: Date }): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const user = await User.findOne({ where: { email }, transaction });
    if (!user) return;
    const { token, hash } = newToken();
    const expiresAt = new Date(now.getTime() + RESET_TOKEN_LIFETIME_MS);
    await PasswordResetToken.create({ userId: user.id, tokenHash: hash, expiresAt }, { transaction });
    await recordAudit({ action: 'auth.password_reset_requested', actorId: user.id, targetType: 'user', targetId: user.id }, transaction);
    // Sent inside the transaction: if the mail server refuses, no unusable token is left behind.
    await sendMail(passwordResetMail({ to: user.email, name: user.name, token, expiresAt }));
  });
}

/** Sets a new password with a reset token; the token and every other open token of the user stop working. */
export async function confirmPasswordReset({ token, password, now = new Date() }: { token: string; password: string; now?: Date }): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const row = await PasswordResetToken.findOne({ where: { tokenHash: hashToken(token) }, transaction, lock: transaction.LOCK.UPDATE });
    if (!row || row.usedAt || row.expiresAt <= now) {
      throw new AppError('invalid', 'token', 'This reset link is unknown, used or expired; ask for a new one', 'token');
    }
    const user = await User.findByPk(row.userId, { transaction });
    if (!user) throw new AppError('invalid', 'token', 'This reset link is unknown, used or expired; ask for a new one', 'token');
    if (!passwordDiffersFromEmail(password, user.email)) {
      throw new AppError('invalid', 'password', 'password: do not use your e-mail address in the password', 'password');
    }
    await user.update({ passwordHash: await hashPassword(password) }, { transaction });
    await PasswordResetToken.update({ usedAt: now }, { where: { userId: user.id, usedAt: { [Op.is]: null } }, transaction });
    await recordAudit({ action: 'auth.password_reset', actorId: user.id, targetType: 'user', targetId: user.id }, transaction);
  });
}
