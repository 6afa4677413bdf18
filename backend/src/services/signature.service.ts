import type { Transaction } from 'sequelize';

import type { QualitySignatureMeaning, SignatureMeaning } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { AppError } from '../errors/app-error';
import { verifySecret } from '../lib/secret-hashing';
import { SignatureModel } from '../models/signature.model';
import { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';

export interface SignedRecord {
  entityType: string;
  entityId: number;
  contentHash: string;
}

/** Every meaning a stored signature may carry: release's, and quality's decisions. */
export type StoredMeaning = SignatureMeaning | QualitySignatureMeaning;

/**
 * A signature needs the signer's password again. A wrong one is refused, and the refusal is
 * audited in a transaction of its own (the change it was for never starts), so nothing can roll
 * the attempt back. `onRefused` adds the record's own trace of it (e.g. a deviation's history
 * line) in that same transaction.
 */
export async function confirmSigner(
  ctx: AppContext,
  signer: UserModel,
  attempt: { password: string; meaning: StoredMeaning },
  record: SignedRecord,
  ip: string | null,
  onRefused?: (transaction: Transaction) => Promise<void>,
): Promise<void> {
  // Re-read: the session's copy may predate a password change made in another tab.
  const current = await UserModel.findByPk(signer.id, { attributes: ['id', 'passwordHash'] });
  if (await verifySecret(current?.passwordHash, attempt.password)) return;
  await ctx.sequelize.transaction(async (transaction) => {
    await recordAudit(
      ctx,
      {
        actorId: signer.id,
        action: 'signature.refused',
        entityType: record.entityType,
        entityId: record.entityId,
        after: { meaning: attempt.meaning, contentHash: record.contentHash, reason: 'wrong password' },
        ip,
      },
      transaction,
    );
    await onRefused?.(transaction);
  });
  throw new AppError(401, 'UNAUTHENTICATED', 'That password is not right, so nothing was signed. Enter your own password to sign.', {
    formErrors: [],
    fieldErrors: { password: ['That password is not right.'] },
  });
}

/** Writes the signature, with the signer's name as printed now, and its audit row. */
export async function recordSignature(
  ctx: AppContext,
  signer: UserModel,
  meaning: StoredMeaning,
  record: SignedRecord,
  transaction: Transaction,
): Promise<SignatureModel> {
  const signature = await SignatureModel.create(
    { userId: signer.id, printedName: signer.name, meaning, signedAt: ctx.clock.now(), ...record },
    { transaction },
  );
  await recordAudit(
    ctx,
    {
      actorId: signer.id,
      action: 'signature.created',
      entityType: 'signature',
      entityId: signature.id,
      after: { userId: signer.id, printedName: signer.name, meaning, signedAt: signature.signedAt.toISOString(), ...record },
    },
    transaction,
  );
  return signature;
}
