import type { Transaction } from 'sequelize';

import { pieceCodes, type DraftContent } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import type { DeviationModel } from '../models/deviation.model';
import { RunEquipmentModel } from '../models/run-equipment.model';
import { RunLotModel } from '../models/run-lot.model';
import { RunPieceModel } from '../models/run-piece.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import { RunModel } from '../models/run.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { runRecord } from './run-dto';
import { nextRunCode } from './run-planning.service';

export interface ReworkPlan {
  deviation: DeviationModel;
  original: RunModel;
  /** The version's content: the rework follows the same version the pieces were made to. */
  content: DraftContent;
  pieceIds: readonly number[];
  stepIds: readonly string[];
  today: string;
}

/**
 * A rework disposition opens a run linked to its deviation: the same version (the pieces were
 * made to it, so the rework repeats its steps even if a later version has been released since),
 * the same lots and machines, one piece per reworked piece (each pointing at the original), and
 * every step outside the chosen ones settled at once as not done, marked not needed and without
 * a deviation. The run then completes by the ordinary rule when the chosen steps are done, and
 * the tablet, traveller and sign-off need nothing special.
 */
export async function openReworkRun(ctx: AppContext, actor: UserModel, plan: ReworkPlan, transaction: Transaction): Promise<RunModel> {
  const { deviation, original, content } = plan;
  const pieces = await RunPieceModel.findAll({ where: { runId: original.id, id: [...plan.pieceIds] }, order: [['number', 'ASC']], transaction });
  const code = await nextRunCode(ctx, Number(plan.today.slice(0, 4)), transaction);
  const numbers = content.steps.flatMap((s, i) => (plan.stepIds.includes(s.id) ? [i + 1] : []));
  const notes = `Rework of deviation #${deviation.id} on run ${original.code}: repeats step${numbers.length === 1 ? '' : 's'} ${numbers.join(', ')} on ${pieces.map((p) => p.code).join(', ')}.`;
  const run = await RunModel.create(
    { code, recipeId: original.recipeId, versionId: original.versionId, state: 'planned', quantity: pieces.length, dueOn: null, notes, createdBy: actor.id, reworkOfDeviationId: deviation.id },
    { transaction },
  );
  const codes = pieceCodes(code, pieces.length);
  await RunPieceModel.bulkCreate(pieces.map((p, i) => ({ runId: run.id, number: i + 1, code: codes[i] as string, reworkOfPieceId: p.id })), { transaction });
  const now = ctx.clock.now();
  const notNeeded = `Not needed: rework of deviation #${deviation.id} repeats step${numbers.length === 1 ? '' : 's'} ${numbers.join(', ')} only.`;
  await RunStepRecordModel.bulkCreate(
    content.steps.map((s) =>
      plan.stepIds.includes(s.id)
        ? { runId: run.id, stepId: s.id, state: 'pending' as const, note: '' }
        : { runId: run.id, stepId: s.id, state: 'not-done' as const, note: '', notNeeded: true, notDoneReason: notNeeded, completedBy: actor.id, completedAt: now },
    ),
    { transaction },
  );
  const [lots, machines] = await Promise.all([RunLotModel.findAll({ where: { runId: original.id }, transaction }), RunEquipmentModel.findAll({ where: { runId: original.id }, transaction })]);
  await RunLotModel.bulkCreate(lots.map((l) => ({ runId: run.id, lotId: l.lotId, reason: l.reason })), { transaction });
  await RunEquipmentModel.bulkCreate(machines.map((m) => ({ runId: run.id, kind: m.kind, equipmentId: m.equipmentId, replacesId: m.replacesId, reason: m.reason })), { transaction });
  const after = { ...runRecord(run), reworkOfDeviationId: deviation.id, reworkOfRunId: original.id, pieces: pieces.map((p) => p.id), stepIds: [...plan.stepIds] };
  await recordAudit(ctx, { actorId: actor.id, action: 'run.planned', entityType: 'run', entityId: run.id, after, reason: notes }, transaction);
  return run;
}
