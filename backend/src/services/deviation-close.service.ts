import { Op, type Transaction } from 'sequelize';
import type { z } from 'zod';

import { closeBlockers, deviationStateAfter, QUALITY_SIGNATURE_MEANINGS, type CloseDeviationInputSchema, type DeviationDetail } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { conflict, unprocessable } from '../errors/app-error';
import { DeviationDispositionModel } from '../models/deviation-disposition.model';
import type { DeviationModel } from '../models/deviation.model';
import { RunModel } from '../models/run.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { getDeviation } from './deviation-detail.service';
import { addDeviationEvent, assertDeviationAllows, changeDeviation, deviationRecord, dispositionsOf, loadDeviation } from './deviation-record';
import { assertUnchangedWhileSigning, confirmDeviationSigner } from './deviation-signing';
import { recordSignature } from './signature.service';

type CloseInput = z.infer<typeof CloseDeviationInputSchema>;

/** The shared closeBlockers over the deviation's dispositions and rework runs: a field to fix is 422, a state to wait for 409. */
async function assertClosable(row: DeviationModel, verificationNote: string, transaction?: Transaction) {
  const dispositions = await dispositionsOf(row.id, transaction);
  const reworkIds = dispositions.flatMap((d) => (d.reworkRunId === null ? [] : [d.reworkRunId]));
  const reworkRuns = reworkIds.length === 0 ? [] : await RunModel.findAll({ where: { id: { [Op.in]: reworkIds } }, attributes: ['id', 'code', 'state'], transaction });
  const blockers = closeBlockers({ deviationId: row.id, hasCorrectiveAction: dispositions.some((d) => d.correctiveActionNote !== null), verificationNote, reworkRuns });
  const fields = blockers.filter((b) => b.field);
  if (fields.length > 0) {
    throw unprocessable(fields.map((b) => b.message).join(' '), { formErrors: [], fieldErrors: Object.fromEntries(fields.map((b) => [b.field, [b.message]])) });
  }
  if (blockers.length > 0) throw conflict(blockers.map((b) => b.message).join(' '), { blockers: blockers.map((b) => b.message) });
  return dispositions;
}

/**
 * Closes a dispositioned deviation, signed: any corrective action is marked verified with the
 * note given, and the deviation becomes a final, read-only record (a trigger refuses even raw
 * SQL changes to it from then on).
 */
export async function closeDeviation(ctx: AppContext, actor: UserModel, id: number, input: CloseInput, ip: string | null): Promise<DeviationDetail> {
  const seen = await loadDeviation(id);
  assertDeviationAllows(seen, 'close');
  await assertClosable(seen, input.verificationNote);
  const meaning = QUALITY_SIGNATURE_MEANINGS.close;
  const contentHash = await confirmDeviationSigner(ctx, actor, seen, input, meaning, ip);
  await ctx.sequelize.transaction(async (transaction) => {
    const row = await loadDeviation(id, transaction, true);
    assertDeviationAllows(row, 'close');
    await assertUnchangedWhileSigning(row, contentHash, transaction);
    const dispositions = await assertClosable(row, input.verificationNote, transaction);
    const signature = await recordSignature(ctx, actor, meaning, { entityType: 'deviation', entityId: id, contentHash }, transaction);
    const now = ctx.clock.now();
    const actions = dispositions.filter((d) => d.correctiveActionNote !== null).map((d) => d.id);
    if (actions.length > 0) {
      await DeviationDispositionModel.update({ verifiedAt: now, verifiedBy: actor.id, verificationNote: input.verificationNote }, { where: { id: { [Op.in]: actions } }, transaction });
    }
    const before = deviationRecord(row);
    const note = input.verificationNote;
    await changeDeviation(ctx, row, { state: deviationStateAfter(row.state, 'close'), closedAt: now, closedBy: actor.id, closureNote: note, closureSignatureId: signature.id }, transaction);
    await addDeviationEvent(ctx, { deviationId: id, kind: 'closed', text: note ? `Closed. Verification: ${note}` : 'Closed.', byId: actor.id }, transaction);
    await recordAudit(ctx, { actorId: actor.id, action: 'deviation.closed', entityType: 'deviation', entityId: id, before, after: { ...deviationRecord(row), verifiedDispositionIds: actions, signatureId: signature.id }, ip }, transaction);
  });
  return getDeviation(ctx, id);
}
