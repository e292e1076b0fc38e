import 'server-only';
import type { Transaction } from 'sequelize';
import { hashPassword } from '@/lib/auth/password';
import { passwordDiffersFromEmail } from '@/lib/auth/password-policy';
import { recordAudit } from '@/lib/audit';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { User } from '@/models';

export interface AccountInput {
  name: string;
  email: string;
  password: string;
}

/** Creates a user; `conflict:email` when the address is taken. Runs in the given transaction or its own. */
export async function createAccount(input: AccountInput, transaction?: Transaction): Promise<{ id: string; email: string; name: string }> {
  if (!passwordDiffersFromEmail(input.password, input.email)) {
    throw new AppError('invalid', 'password', 'password: do not use your e-mail address in the password', 'password');
  }
  const work = async (t: Transaction) => {
    if (await User.findOne({ where: { email: input.email }, transaction: t })) {
      throw new AppError('conflict', 'email', 'An account with this e-mail address exists already; sign in instead', 'email');
    }
    const user = await User.create({ name: input.name, email: input.email, passwordHash: await hashPassword(input.password) }, { transaction: t });
    await recordAudit({ action: 'account.created', actorId: user.id, targetType: 'user', targetId: user.id }, t);
    return { id: user.id, email: user.email, name: user.name };
  };
  return transaction ? work(transaction) : getSequelize().transaction(work);
}
