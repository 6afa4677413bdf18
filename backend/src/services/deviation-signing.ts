import type { Transaction } from 'sequelize';

import type { AppContext } from '../app-context';
import { conflict } from '../errors/app-error';
import type { DeviationModel } from '../models/deviation.model';
import type { UserModel } from '../models/user.model';
import { addDeviationEvent, currentContentHash } from './deviation-record';
import { confirmSigner, type StoredMeaning } from './signature.service';

/**
 * Before anything is signed on a deviation: the hash the person reviewed must still be the
 * deviation's (409 otherwise), and their password must be right (401 otherwise; the refusal is
 * audited and added to the deviation's history). Returns the hash the signature will cover.
 */
export async function confirmDeviationSigner(
  ctx: AppContext,
  actor: UserModel,
  row: DeviationModel,
  input: { password: string; contentHash?: string },
  meaning: StoredMeaning,
  ip: string | null,
): Promise<string> {
  const contentHash = await currentContentHash(row);
  if (input.contentHash !== undefined && input.contentHash !== contentHash) {
    throw conflict(`Deviation ${row.id} changed since you opened it; nothing was signed. Reload and review it again.`, { contentHash });
  }
  const record = { entityType: 'deviation', entityId: row.id, contentHash };
  await confirmSigner(ctx, actor, { password: input.password, meaning }, record, ip, (transaction) =>
    addDeviationEvent(ctx, { deviationId: row.id, kind: 'signature-refused', text: `Signature refused (${meaning}): the password was not right. Nothing was signed.`, byId: actor.id }, transaction),
  );
  return contentHash;
}

/** Inside the signing transaction, with the row locked: a change made while the password was checked refuses the signature. */
export async function assertUnchangedWhileSigning(row: DeviationModel, contentHash: string, transaction: Transaction): Promise<void> {
  if ((await currentContentHash(row, transaction)) === contentHash) return;
  throw conflict(`Deviation ${row.id} changed while you were signing; nothing was signed. Reload and review it again.`);
}
