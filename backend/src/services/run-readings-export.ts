import { readingsCsv, type ReadingCsvRow } from '@tracewright/shared';

import { InstrumentModel } from '../models/instrument.model';
import { RunPieceModel } from '../models/run-piece.model';
import { RunReadingModel } from '../models/run-reading.model';
import { peopleNames } from './recipe-dto';
import { loadRun, runContent } from './run-content';

/** The run's readings as CSV (shared readingsCsv), corrected ones with what replaced them and why. */
export async function exportReadings(runId: number): Promise<{ filename: string; csv: string }> {
  const run = await loadRun(runId);
  const [content, readings, pieces] = await Promise.all([
    runContent(run),
    RunReadingModel.findAll({ where: { runId }, order: [['recordedAt', 'ASC'], ['id', 'ASC']] }),
    RunPieceModel.findAll({ where: { runId } }),
  ]);
  const [people, instruments] = await Promise.all([
    peopleNames(readings.map((r) => r.recordedBy)),
    InstrumentModel.findAll({ where: { id: [...new Set(readings.flatMap((r) => (r.instrumentId === null ? [] : [r.instrumentId])))] }, attributes: ['id', 'name'] }),
  ]);
  const byId = new Map(readings.map((r) => [r.id, r]));
  const rows = readings.map((r): ReadingCsvRow => {
    const step = content.steps.find((s) => s.id === r.stepId);
    const spec = step?.readingSpecs.find((s) => s.id === r.specId);
    const replacement = r.supersededById === null ? undefined : byId.get(r.supersededById);
    return {
      runCode: run.code,
      pieceCode: pieces.find((p) => p.id === r.pieceId)?.code ?? null,
      stepTitle: step?.title ?? r.stepId,
      readingName: spec?.name ?? r.specId,
      value: r.value,
      unit: r.unit,
      correctedValue: r.correctedValue,
      lowerLimit: spec?.lowerLimit ?? null,
      upperLimit: spec?.upperLimit ?? null,
      inLimits: !r.outOfLimits,
      instrumentName: instruments.find((i) => i.id === r.instrumentId)?.name ?? null,
      recordedBy: people.get(r.recordedBy) ?? `Person #${r.recordedBy}`,
      recordedAt: r.recordedAt,
      supersededBy: replacement ? `reading ${replacement.id} (${replacement.recordedAt.toISOString()})` : null,
      correctionReason: r.correctionReason ?? null,
    };
  });
  return { filename: `${run.code}-readings.csv`, csv: readingsCsv(rows) };
}
