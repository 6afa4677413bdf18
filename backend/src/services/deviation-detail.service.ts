import { Op } from 'sequelize';

import type { DeviationDetail } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { notFound } from '../errors/app-error';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { RunPieceModel } from '../models/run-piece.model';
import { parseJsonColumn } from './catalogue-dto';
import { deviationEvents, deviationReadings, dispositionViews, eventPeople, signatureViews } from './deviation-detail-parts';
import { queueItems } from './deviation-queue.service';
import { deviationContentHash, dispositionsOf, loadDeviation } from './deviation-record';
import { peopleNames, versionContent } from './recipe-dto';
import { loadRun } from './run-content';
import { lotViews } from './run-detail-parts';

/**
 * GET /api/deviations/:id: the deviation with everything review needs to decide — the run and
 * step, pieces, lots, readings, history, signed dispositions and closure — and the hash of its
 * current state, which a signer sends back so a change made meanwhile refuses the signature.
 */
export async function getDeviation(ctx: AppContext, id: number): Promise<DeviationDetail> {
  const row = await loadDeviation(id);
  const run = await loadRun(row.runId);
  const pieceIds = parseJsonColumn<number[]>(row.pieceIds, []);
  const [version, dispositions, pieces, lots, [item], eventBy] = await Promise.all([
    RecipeVersionModel.findByPk(run.versionId),
    dispositionsOf(id),
    RunPieceModel.findAll({ where: { id: { [Op.in]: pieceIds } }, order: [['number', 'ASC']] }),
    lotViews(ctx, run.id),
    queueItems(ctx, [row]),
    eventPeople(id),
  ]);
  if (!version || !item) throw notFound('Recipe version', run.versionId);
  const content = versionContent(version);
  const index = row.stepId === null ? -1 : content.steps.findIndex((s) => s.id === row.stepId);
  const step = content.steps[index];
  const [people, signatures, readings] = await Promise.all([
    peopleNames([...eventBy, ...dispositions.map((d) => d.correctiveActionOwnerId)]),
    signatureViews([...dispositions.map((d) => d.signatureId), row.closureSignatureId ?? null]),
    deviationReadings(row, content),
  ]);
  const closureSignature = row.closureSignatureId ? signatures.get(row.closureSignatureId) : undefined;
  return {
    ...item,
    contentHash: deviationContentHash(row, dispositions),
    run: { id: run.id, code: run.code, state: run.state, recipeCode: item.recipeCode, versionNumber: version.number },
    step: step ? { id: step.id, kind: step.kind, title: step.title, number: index + 1 } : null,
    pieces: pieces.map((p) => ({ id: p.id, code: p.code })),
    lots: lots.map((l) => ({ lotId: l.lotId, lotNumber: l.lotNumber, materialName: l.materialName })),
    readings,
    events: await deviationEvents(id, people),
    dispositions: dispositionViews(dispositions, people, signatures),
    closure: closureSignature ? { verificationNote: row.closureNote ?? '', signature: closureSignature } : null,
  };
}
