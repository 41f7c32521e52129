import { config } from '@/lib/config';
import { db } from '@/lib/db';
import { invalid } from '@/lib/errors';
import { sendMail } from '@/lib/mail';
import { hashPassword } from '@/lib/passwords';
import { hashToken, newToken } from '@/lib/tokens';
import { PasswordResetToken, User } from '@/models';

export const RESET_VALID_MS = 3600 * 1000;

/** Sends a single-use reset link valid for one hour. Unknown e-mails get no mail and no hint. */
export async function requestPasswordReset(email: string): Promise<void> {
  db();
  const user = await User.findOne({ where: { email } });
  if (!user) return;
  const token = newToken();
  await PasswordResetToken.create({ userId: user.id, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + RESET_VALID_MS) });
  await sendMail({
    to: user.email,
    subject: 'Reset your Seamline password',
    text: `Someone asked to reset the password of the Seamline account for ${user.email}.\n\nChoose a new password (the link works once, for one hour):\n${config.appUrl}/reset/${token}\n\nIf it was not you, ignore this message; your password stays as it is.`,
  });
}

/** Uses a reset token exactly once. Expired and reused tokens each get their own message. */
export async function confirmPasswordReset(token: string, password: string): Promise<void> {
  const sequelize = db();
  const passwordHash = await hashPassword(password);
  await sequelize.transaction(async (transaction) => {
    const row = await PasswordResetToken.findOne({ where: { tokenHash: hashToken(token) }, transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw invalid('This reset link is not valid. Ask for a new one.', [{ path: 'token', message: 'unknown reset link' }]);
    if (row.usedAt) throw invalid('This reset link has already been used. Ask for a new one.', [{ path: 'token', message: 'already used' }]);
    if (row.expiresAt.getTime() < Date.now()) throw invalid('This reset link has expired (links last one hour). Ask for a new one.', [{ path: 'token', message: 'expired' }]);
    await row.update({ usedAt: new Date() }, { transaction });
    await User.update({ passwordHash }, { where: { id: row.userId }, transaction });
  });
}
