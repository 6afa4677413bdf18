import type { Transaction } from 'sequelize';

import type { AppContext } from '../app-context';
import { AppError } from '../errors/app-error';
import { newOneTimeSecret, sha256Hex } from '../lib/one-time-secret';
import { OneTimeTokenModel, type OneTimeTokenPurpose } from '../models/one-time-token.model';
import { UserModel } from '../models/user.model';

const LIFETIME_MINUTES: Record<OneTimeTokenPurpose, number> = {
  invitation: 7 * 24 * 60,
  'password-reset': 60,
};

/** Issues a one-time link token; earlier unused tokens of the same purpose stop working. */
export async function issueOneTimeToken(
  ctx: Pick<AppContext, 'clock'>,
  userId: number,
  purpose: OneTimeTokenPurpose,
  transaction: Transaction,
): Promise<string> {
  const now = ctx.clock.now();
  await OneTimeTokenModel.update({ usedAt: now }, { where: { userId, purpose, usedAt: null }, transaction });
  const { token, hash } = newOneTimeSecret();
  await OneTimeTokenModel.create(
    { userId, purpose, tokenHash: hash, expiresAt: new Date(now.getTime() + LIFETIME_MINUTES[purpose] * 60_000) },
    { transaction },
  );
  return token;
}

/** Finds a usable token with its user, or says why the link does not work. */
export async function findUsableToken(
  ctx: Pick<AppContext, 'clock'>,
  token: string,
  transaction?: Transaction,
): Promise<{ record: OneTimeTokenModel; user: UserModel }> {
  const record = await OneTimeTokenModel.findOne({
    where: { tokenHash: sha256Hex(token) },
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!record) throw new AppError(404, 'NOT_FOUND', 'This link is not valid. Ask for a new one.');
  if (record.usedAt) {
    throw new AppError(410, 'NOT_FOUND', 'This link has already been used. Ask for a new one.', { reason: 'used' });
  }
  if (record.expiresAt.getTime() <= ctx.clock.now().getTime()) {
    throw new AppError(410, 'NOT_FOUND', 'This link has expired. Ask for a new one.', { reason: 'expired' });
  }
  const user = await UserModel.findByPk(record.userId, { transaction });
  if (!user || user.status === 'deactivated') {
    throw new AppError(410, 'NOT_FOUND', 'This account is not active. Ask an admin.', { reason: 'inactive' });
  }
  return { record, user };
}
