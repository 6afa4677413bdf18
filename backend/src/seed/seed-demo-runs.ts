import type { Transaction } from 'sequelize';

import { deviationDraft, evaluateReading, pieceCodes, type DraftContent, type Ink } from '@tracewright/shared';
import { versionMachines } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { InkModel } from '../models/ink.model';
import { InstrumentModel } from '../models/instrument.model';
import { MaterialLotModel } from '../models/material-lot.model';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { RecipeModel } from '../models/recipe.model';
import { RunEquipmentModel } from '../models/run-equipment.model';
import { RunLotModel } from '../models/run-lot.model';
import { RunPieceModel } from '../models/run-piece.model';
import { RunReadingModel } from '../models/run-reading.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import { RunTimerModel } from '../models/run-timer.model';
import { RunModel } from '../models/run.model';
import { UserModel } from '../models/user.model';
import { recordAudit } from '../services/audit.service';
import { raiseDeviation } from '../services/deviation.service';
import { toInkDto } from '../services/material-dto';
import { versionContent } from '../services/recipe-dto';
import { nextRunCode } from '../services/run-planning.service';
import { DEMO_PEOPLE } from './demo-people';

const MINUTE = 60_000;

// Demo data only, invented: three of eight strips measured, key 4 of the third one high.
// [piece number, key 1 Ω, key 4 Ω, isolation MΩ]; the room was at 21.5 °C.
const MEASURED: Array<[number, number, number, number]> = [
  [1, 5.2, 8.3, 48],
  [2, 5.6, 7.9, 52],
  [3, 5.0, 12.6, 45],
];
const AMBIENT_C = 21.5;

async function find<T>(label: string, row: Promise<T | null>): Promise<T> {
  const found = await row;
  if (!found) throw new Error(`Demo ${label} is missing: seed the materials and recipes first.`);
  return found;
}

/** Minutes before now, for a story told backwards from the moment of seeding. */
const ago = (ctx: AppContext, minutes: number) => new Date(ctx.clock.now().getTime() - minutes * MINUTE);

/**
 * Demo data only: run R-…-0001 of TOUCH-4K v1, eight strips, written inside the caller's seeding
 * transaction. Five steps are done (a 7-minute dry on the hot plate among them); the inspection is
 * under way with three strips measured, one of them out of limits with its deviation, so the
 * tablet, the deviation queue and the readings export all have something to show.
 */
export async function seedDemoRuns(ctx: AppContext, transaction: Transaction): Promise<void> {
  const recipe = await find('recipe TOUCH-4K', RecipeModel.findOne({ where: { code: 'TOUCH-4K' }, transaction }));
  const version = await find('TOUCH-4K v1', RecipeVersionModel.findOne({ where: { recipeId: recipe.id, number: 1 }, transaction }));
  const person = (role: string) => find(`person ${role}`, UserModel.findOne({ where: { email: DEMO_PEOPLE.find((p) => p.email.startsWith(`${role}@`))?.email ?? '' }, transaction }));
  const [engineer, operator] = [await person('engineer'), await person('operator')];
  const content = versionContent(version);
  const silver = toInkDto(await find('silver ink', InkModel.findOne({ where: { name: 'Quillmere QS-30 nanosilver ink' }, transaction })));
  const meter = await find('multimeter', InstrumentModel.findOne({ where: { name: 'Bench multimeter M-3' }, transaction }));
  const lots = await MaterialLotModel.findAll({ where: { lotNumber: ['QS30-2611', 'FM-PET-1208'] }, transaction });

  const code = await nextRunCode(ctx, ctx.clock.now().getUTCFullYear(), transaction);
  const run = await RunModel.create(
    { code, recipeId: recipe.id, versionId: version.id, state: 'in-progress', quantity: 8, dueOn: null, notes: 'Pilot batch for the kiosk panel.', createdBy: engineer.id },
    { transaction },
  );
  const pieces = await RunPieceModel.bulkCreate(pieceCodes(code, 8).map((c, i) => ({ runId: run.id, number: i + 1, code: c })), { transaction, returning: true });
  await RunLotModel.bulkCreate(lots.map((l) => ({ runId: run.id, lotId: l.id, reason: null })), { transaction });
  const machines = [...versionMachines(content), { kind: 'instrument' as const, id: meter.id }];
  await RunEquipmentModel.bulkCreate(machines.map((m) => ({ runId: run.id, kind: m.kind, equipmentId: m.id, replacesId: null, reason: null })), { transaction });
  await recordAudit(ctx, { actorId: null, action: 'seed.run', entityType: 'run', entityId: run.id, after: { code, version: version.id, quantity: 8 } }, transaction);

  await seedStepRecords(ctx, run, content, operator.id, transaction);
  await RunTimerModel.create(
    { runId: run.id, stepId: 'dry-keys', label: 'Hot plate dry', plannedSeconds: 420, startedAt: ago(ctx, 314), startedOnDeviceClock: false, startedBy: operator.id, stoppedAt: ago(ctx, 307), stoppedBy: operator.id },
    { transaction },
  );
  await seedReadings(ctx, { run, content, silver, meterId: meter.id, operator, pieces }, transaction);
}

/** Steps 1–5 done in order over the last six hours; the inspection started 40 minutes ago. */
async function seedStepRecords(ctx: AppContext, run: RunModel, content: DraftContent, operatorId: number, transaction: Transaction) {
  // [started, completed] in minutes before now; the cure includes its ramp and 200 min at temperature.
  const times: Record<string, [number, number | null]> = {
    'wipe-pet': [360, 355],
    'print-keys': [350, 320],
    'dry-keys': [315, 305],
    'cure-keys': [300, 80],
    'attach-tail': [70, 50],
    'inspect-keys': [40, null],
  };
  await RunStepRecordModel.bulkCreate(
    content.steps.map((step) => {
      const [started, completed] = times[step.id] ?? [null, null];
      const common = { runId: run.id, stepId: step.id, note: '' };
      if (started === null) return { ...common, state: 'pending' as const };
      const begun = { safetyAcknowledgedBy: operatorId, safetyAcknowledgedAt: ago(ctx, started + 1), startedBy: operatorId, startedAt: ago(ctx, started) };
      if (completed === null) return { ...common, ...begun, state: 'in-progress' as const };
      return { ...common, ...begun, state: 'done' as const, completedBy: operatorId, completedAt: ago(ctx, completed) };
    }),
    { transaction },
  );
}

interface ReadingContext {
  run: RunModel;
  content: DraftContent;
  silver: Ink;
  meterId: number;
  operator: UserModel;
  pieces: RunPieceModel[];
}

/** Readings judged by the shared rule, as the API would; the out-of-limit one opens its deviation. */
async function seedReadings(ctx: AppContext, c: ReadingContext, transaction: Transaction) {
  const index = c.content.steps.findIndex((s) => s.id === 'inspect-keys');
  const step = c.content.steps[index];
  if (!step) throw new Error('Demo TOUCH-4K v1 has no inspect-keys step.');
  let minutesAgo = 35;
  for (const [number, key1, key4, isolation] of MEASURED) {
    const piece = c.pieces.find((p) => p.number === number) as RunPieceModel;
    for (const [specId, value] of [['r-key-1', key1], ['r-key-4', key4], ['iso-keys', isolation]] as const) {
      const spec = step.readingSpecs.find((s) => s.id === specId);
      if (!spec) throw new Error(`Demo TOUCH-4K v1 has no reading ${specId}.`);
      const evaluation = evaluateReading(spec, value, { ambientTempC: AMBIENT_C, tcrPerK: c.silver.tcrPerK });
      const reading = await RunReadingModel.create(
        {
          runId: c.run.id, stepId: step.id, specId, pieceId: piece.id, value, unit: spec.unit, correctedValue: evaluation.correctedValue, ambientTempC: AMBIENT_C,
          instrumentId: c.meterId, outOfLimits: evaluation.outOfLimits, recordedBy: c.operator.id, recordedAt: ago(ctx, minutesAgo), deviceTime: null, madeOffline: false,
        },
        { transaction },
      );
      minutesAgo -= 1;
      if (!evaluation.outOfLimits) continue;
      const ref = { number: index + 1, title: step.title };
      const draft = deviationDraft('reading-out-of-limits', { step: ref, spec, value, correctedValue: evaluation.correctedValue, correctedTo: evaluation.correctedTo, pieceCode: piece.code });
      await raiseDeviation(ctx, c.operator, c.run.id, draft, { stepId: step.id, pieceIds: [piece.id], source: { type: 'reading', id: reading.id } }, transaction);
    }
  }
}
