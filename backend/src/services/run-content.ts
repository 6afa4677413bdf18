import type { Connection } from 'mariadb';
import type { Transaction } from 'sequelize';

import type { DraftContent, RecipeStep, RunState, StepRef } from '@tracewright/shared';
import { substitutedContent, type Substitution, type VersionMachineKind } from '@tracewright/shared';

import { connectionOf, findRow, findRows, sequelizeOf, withConnection } from '../db/direct-rows';
import { begun } from '../db/pipelined-transaction';
import { conflict, notFound } from '../errors/app-error';
import { RunEquipmentModel } from '../models/run-equipment.model';
import { RunModel } from '../models/run.model';
import { cachedVersionContent } from './version-content-cache';

/** Reads a run; with `lock`, FOR UPDATE: every tablet write locks its run first, so writes to one run take turns. */
export async function loadRun(id: number, transaction?: Transaction, lock = false): Promise<RunModel> {
  const row = transaction
    ? await findRow(RunModel, connectionOf(transaction), { id }, { lock })
    : await withConnection(sequelizeOf(RunModel), (c) => findRow(RunModel, c, { id }));
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
  const read = async (connection: Connection) => {
    const [content, equipment] = await Promise.all([cachedVersionContent(connection, run.versionId), findRows(RunEquipmentModel, connection, { runId: run.id })]);
    if (!content) throw notFound('Recipe version', run.versionId);
    return substitutedContent(content, substitutionsOf(equipment));
  };
  return transaction ? read(connectionOf(transaction)) : withConnection(sequelizeOf(RunModel), read);
}

/**
 * The run locked FOR UPDATE, with its content, in one round trip: the lock goes first on the
 * connection, so the reads after it see every write committed before it was granted.
 */
export async function lockRunWithContent(transaction: Transaction, runId: number): Promise<{ run: RunModel; content: DraftContent }> {
  const connection = connectionOf(transaction);
  const [, run, content, equipment] = await Promise.all([
    begun(transaction),
    findRow(RunModel, connection, { id: runId }, { lock: true }),
    cachedVersionContent(connection, { runId }),
    findRows(RunEquipmentModel, connection, { runId }),
  ]);
  if (!run) throw notFound('Run', runId);
  if (!content) throw notFound('Recipe version', run.versionId);
  return { run, content: substitutedContent(content, substitutionsOf(equipment)) };
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
