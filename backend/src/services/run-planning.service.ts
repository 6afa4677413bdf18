import { QueryTypes, type Transaction } from 'sequelize';

import { checkSummary, deviationDraft, equipmentChoiceIssues, lotChoiceIssues, missingReasons, pieceCodes, recipeChecks, runCode } from '@tracewright/shared';
import { stateInWords, substitutedContent, type VersionMachineKind } from '@tracewright/shared';
import type { ChoiceIssue, DeviationDraft, DraftContent, PlanRunInput, RunDetail } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { badRequest, fieldProblem, notFound, unprocessable } from '../errors/app-error';
import { RecipeModel } from '../models/recipe.model';
import { RunEquipmentModel } from '../models/run-equipment.model';
import { RunLotModel } from '../models/run-lot.model';
import { RunPieceModel } from '../models/run-piece.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import { RunModel } from '../models/run.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { raiseDeviation } from './deviation.service';
import { labToday } from './lab-calendar';
import { versionContent } from './recipe-dto';
import { checkInputOf, loadReferences } from './recipe-references';
import { loadVersion } from './recipe-version.service';
import { getRun } from './run-detail.service';
import { runRecord } from './run-dto';
import { resolveEquipment, type RunMachine } from './run-plan-equipment';
import { resolveLots, type ChosenLot } from './run-plan-lots';

/** Another machine than the version's re-runs the version's checks with it in place; a block refuses the plan (422). */
async function assertSubstitutesPass(content: DraftContent, machines: readonly RunMachine[], label: string, transaction: Transaction) {
  const substitutes = machines.filter((m) => m.replacesId !== null && m.kind !== 'instrument');
  if (substitutes.length === 0) return;
  const substituted = substitutedContent(content, substitutes.map((m) => ({ kind: m.kind as VersionMachineKind, id: m.id, fromId: m.replacesId as number })));
  const checks = recipeChecks(checkInputOf(substituted, await loadReferences(substituted, transaction)));
  const summary = checkSummary(checks);
  if (!summary.isBlocked) return;
  const titles = checks.filter((c) => c.status === 'blocked').map((c) => `“${c.title}”`).join(', ');
  const names = substitutes.map((m) => m.name).join(', ');
  throw unprocessable(`With ${names} in place of the version's machines, ${label} cannot run: ${titles}. Pick other machines, or plan it with the version's own.`, { checks, summary });
}

/** A flagged lot or machine without a reason: 400 naming each, at its field where it has one. */
function assertReasonsGiven(issues: readonly ChoiceIssue[], input: PlanRunInput) {
  const missing = missingReasons(issues, input);
  if (missing.length === 0) return;
  const fieldErrors: Record<string, string[]> = {};
  const formErrors: string[] = [];
  for (const issue of missing) {
    const index = issue.kind === 'lot' ? input.lots.findIndex((l) => l.lotId === issue.id) : input.equipment.findIndex((e) => e.kind === issue.kind && e.id === issue.id);
    const field = `${issue.kind === 'lot' ? 'lots' : 'equipment'}.${index}.reason`;
    if (index === -1) formErrors.push(`${issue.message} Add it to the plan's machines with a reason, or pick another.`);
    else (fieldErrors[field] ??= []).push(`${issue.message} Say why it is used anyway.`);
  }
  throw badRequest(`A reason is needed for each flagged choice. ${missing.map((i) => i.message).join(' ')}`, { formErrors, fieldErrors, issues: missing });
}

/** The deviation a flagged choice (given with its reason) opens. */
function choiceDraft(issue: ChoiceIssue, lots: readonly ChosenLot[], machines: readonly RunMachine[], today: string): DeviationDraft {
  if (issue.kind !== 'lot') {
    const machine = machines.find((m) => m.kind === issue.kind && m.id === issue.id) as RunMachine;
    return deviationDraft('calibration-overdue', { equipmentName: machine.name, dueOn: machine.calibrationDueOn ?? '', usedOn: today, reason: machine.reason });
  }
  const { lot, materialName, potLifeHours, reason } = lots.find((l) => l.lot.id === issue.id) as ChosenLot;
  const common = { lotNumber: lot.lotNumber, materialName, usedOn: today, reason };
  if (issue.rule === 'expired-lot') return deviationDraft('expired-lot', { ...common, expiresOn: lot.expiresOn ?? '' });
  return deviationDraft('lot-past-pot-life', { ...common, openedOn: lot.openedOn ?? '', potLifeHours: potLifeHours ?? 0 });
}

/** R-year-sequence: the upsert locks the year's counter row until commit, so codes never repeat. */
export async function nextRunCode(ctx: AppContext, year: number, transaction: Transaction): Promise<string> {
  await ctx.sequelize.query('INSERT INTO run_sequences (year, last_value) VALUES (?, 1) ON DUPLICATE KEY UPDATE last_value = last_value + 1', { replacements: [year], transaction });
  const [row] = await ctx.sequelize.query<{ last_value: number }>('SELECT last_value FROM run_sequences WHERE year = ?', { replacements: [year], transaction, type: QueryTypes.SELECT });
  return runCode(year, Number(row?.last_value));
}

async function createRun(ctx: AppContext, actor: UserModel, input: PlanRunInput, recipeId: number, content: DraftContent, today: string, transaction: Transaction) {
  const code = await nextRunCode(ctx, Number(today.slice(0, 4)), transaction);
  const run = await RunModel.create({ code, recipeId, versionId: input.versionId, state: 'planned', quantity: input.quantity, dueOn: input.dueOn, notes: input.notes, createdBy: actor.id }, { transaction });
  await RunPieceModel.bulkCreate(pieceCodes(code, input.quantity).map((pieceCode, i) => ({ runId: run.id, number: i + 1, code: pieceCode })), { transaction });
  await RunStepRecordModel.bulkCreate(content.steps.map((s) => ({ runId: run.id, stepId: s.id, state: 'pending' as const, note: '' })), { transaction });
  return run;
}

/**
 * Plans a run of a released version: lots of the materials it uses, its machines unless others
 * are chosen (then the checks run again with them in place), a reason for every expired, over-
 * aged or overdue choice (each then opens a deviation), and N pieces with their codes.
 */
export async function planRun(ctx: AppContext, actor: UserModel, input: PlanRunInput): Promise<RunDetail> {
  const today = await labToday(ctx);
  const runId = await ctx.sequelize.transaction(async (transaction) => {
    const version = await loadVersion(input.versionId, transaction);
    const recipe = await RecipeModel.findByPk(version.recipeId, { transaction });
    if (!recipe) throw notFound('Recipe', version.recipeId);
    const label = `${recipe.code} version ${version.number}`;
    if (version.state !== 'released') throw fieldProblem('versionId', `${label} is ${stateInWords(version.state)}; only released versions can be run.`);
    const content = versionContent(version);
    const lots = await resolveLots(content, input, label, transaction);
    const machines = await resolveEquipment(content, input, transaction);
    await assertSubstitutesPass(content, machines, label, transaction);
    const lotIssues = lotChoiceIssues(lots.map(({ lot, materialName, potLifeHours }) => ({ lot: { ...lot.get({ plain: true }), materialName }, potLifeHours })), { today, now: ctx.clock.now() });
    const issues = [...lotIssues, ...equipmentChoiceIssues(machines, today)];
    assertReasonsGiven(issues, input);
    const run = await createRun(ctx, actor, input, recipe.id, content, today, transaction);
    await RunLotModel.bulkCreate(lots.map((l) => ({ runId: run.id, lotId: l.lot.id, reason: l.reason })), { transaction });
    await RunEquipmentModel.bulkCreate(machines.map((m) => ({ runId: run.id, kind: m.kind, equipmentId: m.id, replacesId: m.replacesId, reason: m.reason })), { transaction });
    const after = { ...runRecord(run), lots: lots.map((l) => ({ lotId: l.lot.id, reason: l.reason })), equipment: machines.map(({ kind, id, replacesId, reason }) => ({ kind, id, replacesId, reason })) };
    await recordAudit(ctx, { actorId: actor.id, action: 'run.planned', entityType: 'run', entityId: run.id, after }, transaction);
    for (const issue of issues) {
      const source = { type: issue.kind === 'lot' ? 'lot' : issue.kind, id: issue.id };
      await raiseDeviation(ctx, actor, run.id, choiceDraft(issue, lots, machines, today), { source }, transaction);
    }
    return run.id;
  });
  return getRun(ctx, runId);
}
