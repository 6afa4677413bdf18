import { Op } from 'sequelize';

import { deviationDraft, type ReportProblemInput } from '@tracewright/shared';
import type { ProblemWriteResult } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { fieldProblem } from '../errors/app-error';
import { RunPieceModel } from '../models/run-piece.model';
import { StoredFileModel } from '../models/stored-file.model';
import { raiseDeviation } from './deviation.service';
import type { TabletWrite, WriteResult } from './idempotency.service';
import { stepAt } from './run-content';
import { runWrite, type RunScope } from './run-write';

async function assertPiecesOfRun(scope: RunScope, pieceIds: readonly number[]) {
  const ids = [...new Set(pieceIds)];
  if (ids.length === 0) return;
  const found = await RunPieceModel.count({ where: { runId: scope.run.id, id: { [Op.in]: ids } }, transaction: scope.transaction });
  if (found !== ids.length) throw fieldProblem('pieceIds', `Some of the pieces picked are not pieces of run ${scope.run.code}. Pick them again from the run's list.`);
}

async function assertPhotosExist(scope: RunScope, fileIds: readonly number[]) {
  const ids = [...new Set(fileIds)];
  if (ids.length === 0) return;
  const found = await StoredFileModel.count({ where: { id: { [Op.in]: ids } }, transaction: scope.transaction });
  if (found !== ids.length) throw fieldProblem('photoFileIds', 'Some of the photos were not found on the server. Take or attach them again.');
}

/**
 * A problem reported by hand opens a `reported` deviation with the reporter's severity, pieces
 * and photos. Major and critical ones are mailed to every active quality person after the
 * commit, by raiseDeviation (a replay mails nobody: it was told the first time).
 */
export function reportProblem(ctx: AppContext, write: TabletWrite, runId: number, input: ReportProblemInput): Promise<WriteResult<ProblemWriteResult>> {
  return runWrite(ctx, write, runId, 201, async (scope) => {
    const at = input.stepId === null ? null : stepAt(scope.content, scope.run, input.stepId);
    await assertPiecesOfRun(scope, input.pieceIds);
    await assertPhotosExist(scope, input.photoFileIds);
    const draft = deviationDraft('reported', { step: at?.ref ?? null, description: input.description, severity: input.severity });
    const origin = { stepId: at?.step.id ?? null, pieceIds: [...new Set(input.pieceIds)], photoFileIds: [...new Set(input.photoFileIds)] };
    const deviation = await raiseDeviation(ctx, scope.actor, scope.run.id, draft, origin, scope.transaction);
    return { runId: scope.run.id, runState: scope.run.state, deviations: [deviation], deviation };
  });
}
