import type { Transaction } from 'sequelize';

import type { DraftContent, RecipeStep, RunState, StepRef } from '@tracewright/shared';
import { substitutedContent, type Substitution, type VersionMachineKind } from '@tracewright/shared';

import { conflict, notFound } from '../errors/app-error';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { RunEquipmentModel } from '../models/run-equipment.model';
import { RunModel } from '../models/run.model';
import { versionContent } from './recipe-dto';

/** Reads a run; with `lock`, FOR UPDATE: every tablet write locks its run first, so writes to one run take turns. */
export async function loadRun(id: number, transaction?: Transaction, lock = false): Promise<RunModel> {
  const row = await RunModel.findByPk(id, { transaction, lock: lock && transaction ? transaction.LOCK.UPDATE : undefined });
  if (!row) throw notFound('Run', id);
  return row;
}

/** The machines this run uses in place of the version's, from its equipment rows. */
export function substitutionsOf(rows: readonly RunEquipmentModel[]): Substitution[] {
  return rows
    .filter((r) => r.replacesId !== null && r.kind !== 'instrument')
    .map((r) => ({ kind: r.kind as VersionMachineKind, id: r.equipmentId, fromId: r.replacesId as number }));
}

/** The version's content with the run's machines in place: what the operator actually follows. */
export async function runContent(run: RunModel, transaction?: Transaction): Promise<DraftContent> {
  const [version, equipment] = await Promise.all([
    RecipeVersionModel.findByPk(run.versionId, { transaction }),
    RunEquipmentModel.findAll({ where: { runId: run.id }, transaction }),
  ]);
  if (!version) throw notFound('Recipe version', run.versionId);
  return substitutedContent(versionContent(version), substitutionsOf(equipment));
}

export interface StepAt {
  step: RecipeStep;
  index: number;
  /** How messages and deviations name it: 1-based number and title. */
  ref: StepRef;
}

/** A step of the run's recipe by id (404 when the recipe has none). */
export function stepAt(content: DraftContent, run: RunModel, stepId: string): StepAt {
  const index = content.steps.findIndex((s) => s.id === stepId);
  const step = content.steps[index];
  if (!step) throw notFound(`Step “${stepId}” in run ${run.code}`);
  return { step, index, ref: { number: index + 1, title: step.title } };
}

const REFUSALS: Partial<Record<RunState, string>> = {
  'on-hold': 'is on hold',
  cancelled: 'was cancelled',
  closed: 'is closed',
};

/** On-hold, cancelled and closed runs take no records (409); planned, running and completed ones do. */
export function assertAcceptsWrites(run: RunModel): void {
  const refusal = REFUSALS[run.state];
  if (!refusal) return;
  const hold = run.state === 'on-hold' && run.holdReason ? ` (${run.holdReason})` : '';
  const next = run.state === 'on-hold' ? ' Ask an engineer or quality to resume it, then record it again.' : ' Nothing more can be recorded on it.';
  throw conflict(`Run ${run.code} ${refusal}${hold}, so this was not recorded.${next}`, { runState: run.state });
}
