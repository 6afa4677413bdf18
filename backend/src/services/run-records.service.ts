import type { z } from 'zod';

import { cureLogDose, deviationDraft, stateInWords, STEP_KIND_LABELS, type DeviationSummary } from '@tracewright/shared';
import type { ConfirmLotInputSchema, CureLogInputSchema, NozzleCheckInputSchema } from '@tracewright/shared';
import type { CureLogView, CureLogWriteResult, StepWriteResult } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { conflict, fieldProblem } from '../errors/app-error';
import { RunCureLogModel } from '../models/run-cure-log.model';
import { RunLotConfirmationModel } from '../models/run-lot-confirmation.model';
import { RunLotModel } from '../models/run-lot.model';
import { RunNozzleCheckModel } from '../models/run-nozzle-check.model';
import { StoredFileModel } from '../models/stored-file.model';
import { raiseDeviation } from './deviation.service';
import type { TabletWrite, WriteResult } from './idempotency.service';
import { loadReferences } from './recipe-references';
import { stampedTime } from './run-clock';
import { stepAt } from './run-content';
import { inksCuredAt } from './run-step-context';
import { auditRun, lockStepRecord, noteDeviceTime, runWrite, stepResult } from './run-write';

type CureLogInput = z.infer<typeof CureLogInputSchema>;

/**
 * A logged oven profile of a cure step, judged for each ink printed since the previous cure
 * (shared cureLogDose); a short dose raises `cure-dose-short` for that ink.
 */
export function recordCureLog(ctx: AppContext, write: TabletWrite, runId: number, input: CureLogInput): Promise<WriteResult<CureLogWriteResult>> {
  return runWrite(ctx, write, runId, 201, async (scope) => {
    const at = stepAt(scope.content, scope.run, input.stepId);
    if (at.step.kind !== 'cure') throw fieldProblem('stepId', `Cure logs belong to cure steps; step ${at.ref.number} “${at.ref.title}” is of kind ${STEP_KIND_LABELS[at.step.kind]}.`);
    const { inks } = await loadReferences(scope.content, scope.transaction);
    const doses = inksCuredAt(scope.content, at.index, inks).map((ink) => ({ inkId: ink.id, inkName: ink.name, ...cureLogDose(input.samples, ink), ink }));
    const time = stampedTime(ctx, input);
    const log = await RunCureLogModel.create(
      { runId: scope.run.id, stepId: at.step.id, samples: input.samples, dose: doses.map(({ ink: _ink, ...dose }) => dose), recordedBy: scope.actor.id, recordedAt: time.at, deviceTime: time.deviceTime, madeOffline: input.madeOffline },
      { transaction: scope.transaction },
    );
    const view: CureLogView = {
      id: log.id, stepId: at.step.id, samples: input.samples, doses: doses.map(({ ink: _ink, ...dose }) => dose),
      recordedAt: time.at.toISOString(), recordedBy: { id: scope.actor.id, name: scope.actor.name },
    };
    await noteDeviceTime(scope, at.step.id, time);
    await auditRun(scope, { action: 'run-cure-log.recorded', entityType: 'run-cure-log', entityId: log.id, after: { runId: scope.run.id, ...view } });
    const deviations: DeviationSummary[] = [];
    for (const dose of doses.filter((d) => d.isShort)) {
      const context = { step: at.ref, inkName: dose.inkName, equivalentMinutes: dose.equivalentMinutes ?? 0, referenceMinutes: dose.referenceMinutes ?? 0, referenceTempC: dose.ink.cureReferenceTempC ?? 0, percent: dose.percent ?? 0 };
      deviations.push(await raiseDeviation(ctx, scope.actor, scope.run.id, deviationDraft('cure-dose-short', context), { stepId: at.step.id, source: { type: 'cure-log', id: log.id } }, scope.transaction));
    }
    return { runId: scope.run.id, runState: scope.run.state, deviations, cureLog: view };
  });
}

/** The operator confirms the lot in hand at a step is one the run planned; confirming it twice changes nothing. */
export function confirmLot(ctx: AppContext, write: TabletWrite, runId: number, input: z.infer<typeof ConfirmLotInputSchema>): Promise<WriteResult<StepWriteResult>> {
  return runWrite(ctx, write, runId, 201, async (scope) => {
    const at = stepAt(scope.content, scope.run, input.stepId);
    const planned = await RunLotModel.findOne({ where: { runId: scope.run.id, lotId: input.lotId }, transaction: scope.transaction });
    if (!planned) throw fieldProblem('lotId', `Lot ${input.lotId} is not one run ${scope.run.code} planned. Use a planned lot, or report a problem if the right one is not at hand.`);
    const where = { runId: scope.run.id, stepId: at.step.id, lotId: input.lotId };
    if (!(await RunLotConfirmationModel.findOne({ where, transaction: scope.transaction }))) {
      const time = stampedTime(ctx, input);
      const row = await RunLotConfirmationModel.create({ ...where, confirmedBy: scope.actor.id, confirmedAt: time.at, deviceTime: time.deviceTime, madeOffline: input.madeOffline }, { transaction: scope.transaction });
      await noteDeviceTime(scope, at.step.id, time);
      await auditRun(scope, { action: 'run-lot.confirmed', entityType: 'run', entityId: scope.run.id, after: { ...where, id: row.id, at: time.at } });
    }
    return stepResult(scope, at.step.id, []);
  });
}

/** A nozzle check before a print pass (passed or not, with an optional photo); the latest one counts. */
export function recordNozzleCheck(ctx: AppContext, write: TabletWrite, runId: number, input: z.infer<typeof NozzleCheckInputSchema>): Promise<WriteResult<StepWriteResult>> {
  return runWrite(ctx, write, runId, 201, async (scope) => {
    const at = stepAt(scope.content, scope.run, input.stepId);
    if (at.step.kind !== 'print-pass') throw fieldProblem('stepId', `Nozzle checks belong to print passes; step ${at.ref.number} “${at.ref.title}” is of kind ${STEP_KIND_LABELS[at.step.kind]}.`);
    const record = await lockStepRecord(scope, at.step.id);
    if (record.state === 'done' || record.state === 'not-done') throw conflict(`Step ${at.ref.number} “${at.ref.title}” is already ${stateInWords(record.state)}; a nozzle check belongs before or during the print.`, { state: record.state });
    if (input.photoFileId !== null && !(await StoredFileModel.findByPk(input.photoFileId, { transaction: scope.transaction, attributes: ['id'] }))) {
      throw fieldProblem('photoFileId', `There is no photo with id ${input.photoFileId}. Take the photo again.`);
    }
    const time = stampedTime(ctx, input);
    const row = await RunNozzleCheckModel.create(
      { runId: scope.run.id, stepId: at.step.id, passed: input.passed, photoFileId: input.photoFileId, checkedBy: scope.actor.id, checkedAt: time.at, deviceTime: time.deviceTime, madeOffline: input.madeOffline },
      { transaction: scope.transaction },
    );
    await noteDeviceTime(scope, at.step.id, time);
    await auditRun(scope, { action: 'run-nozzle-check.recorded', entityType: 'run', entityId: scope.run.id, after: { id: row.id, stepId: at.step.id, passed: input.passed, photoFileId: input.photoFileId, at: time.at } });
    return stepResult(scope, at.step.id, []);
  });
}
