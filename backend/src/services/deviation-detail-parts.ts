import { Op } from 'sequelize';

import { judgedValue, type DeviationDetail, type DraftContent } from '@tracewright/shared';

import type { DeviationDispositionModel } from '../models/deviation-disposition.model';
import { DeviationEventModel } from '../models/deviation-event.model';
import type { DeviationModel } from '../models/deviation.model';
import { RunReadingModel } from '../models/run-reading.model';
import { SignatureModel } from '../models/signature.model';
import { parseJsonColumn } from './catalogue-dto';
import { personRef } from './recipe-dto';
import type { People } from './run-dto';

type SignatureView = DeviationDetail['dispositions'][number]['signature'];

/** Readings review needs beside the deviation: the one that raised it, and the step's readings of its pieces. */
export async function deviationReadings(row: DeviationModel, content: DraftContent): Promise<DeviationDetail['readings']> {
  const pieceIds = parseJsonColumn<number[]>(row.pieceIds, []);
  const fromSource = row.sourceType === 'reading' && row.sourceId !== null ? [{ id: row.sourceId }, { supersededById: row.sourceId }] : [];
  const atStep = row.stepId === null ? [] : [{ stepId: row.stepId, ...(pieceIds.length > 0 ? { pieceId: { [Op.in]: pieceIds } } : {}) }];
  if (fromSource.length + atStep.length === 0) return [];
  const rows = await RunReadingModel.findAll({ where: { runId: row.runId, [Op.or]: [...fromSource, ...atStep] }, order: [['recordedAt', 'ASC'], ['id', 'ASC']], limit: 100 });
  const specs = new Map(content.steps.flatMap((s) => (s.readingSpecs ?? []).map((spec) => [spec.id, spec.name] as const)));
  return rows.map((r) => ({ id: r.id, specName: specs.get(r.specId) ?? r.specId, value: judgedValue(r), unit: r.unit, outOfLimits: Boolean(r.outOfLimits), recordedAt: r.recordedAt.toISOString() }));
}

/** The deviation's history, oldest first. */
export async function deviationEvents(deviationId: number, people: People): Promise<DeviationDetail['events']> {
  const rows = await DeviationEventModel.findAll({ where: { deviationId }, order: [['id', 'ASC']] });
  return rows.map((e) => ({ id: Number(e.id), at: e.at.toISOString(), by: personRef(people, e.byId), kind: e.kind, text: e.text }));
}

export const eventPeople = async (deviationId: number) =>
  (await DeviationEventModel.findAll({ where: { deviationId }, attributes: ['byId'] })).map((e) => e.byId);

/** Signatures by id, as the detail prints them: name as signed, meaning, time and hash. */
export async function signatureViews(ids: readonly (number | null)[]): Promise<Map<number, SignatureView>> {
  const wanted = ids.filter((id): id is number => id !== null);
  if (wanted.length === 0) return new Map();
  const rows = await SignatureModel.findAll({ where: { id: { [Op.in]: wanted } } });
  return new Map(rows.map((s) => [s.id, { signedBy: s.printedName, meaning: s.meaning, signedAt: s.signedAt.toISOString(), contentHash: s.contentHash }]));
}

export function dispositionViews(rows: readonly DeviationDispositionModel[], people: People, signatures: Map<number, SignatureView>): DeviationDetail['dispositions'] {
  return rows.flatMap((d) => {
    const signature = signatures.get(d.signatureId);
    if (!signature) return [];
    const correctiveAction =
      d.correctiveActionNote === null
        ? null
        : { note: d.correctiveActionNote, owner: personRef(people, d.correctiveActionOwnerId), dueOn: d.correctiveActionDueOn ?? '', verifiedAt: d.verifiedAt?.toISOString() ?? null };
    return [{ id: d.id, disposition: d.disposition, rationale: d.rationale, pieceIds: parseJsonColumn<number[]>(d.pieceIds, []), reworkRunId: d.reworkRunId, correctiveAction, signature }];
  });
}
