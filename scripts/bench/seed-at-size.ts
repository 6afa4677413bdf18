import { QueryTypes } from 'sequelize';

import { DEVIATION_RULES, evaluateReading, pieceCodes, type ReadingSpec } from '@tracewright/shared';

import type { AppContext } from '../../backend/src/app-context';
import { InkModel } from '../../backend/src/models/ink.model';
import { InstrumentModel } from '../../backend/src/models/instrument.model';
import { RecipeVersionModel } from '../../backend/src/models/recipe-version.model';
import { RecipeModel } from '../../backend/src/models/recipe.model';
import { UserModel } from '../../backend/src/models/user.model';
import { versionContent } from '../../backend/src/services/recipe-dto';
import { insertRows, pick, seededRandom, weighted } from './bulk-insert';
import { deviationText } from './deviation-texts';

export const SIZES = { runs: 2_000, piecesPerRun: 8, readings: 20_000, deviations: 100_000, extraOperators: 10 };

const DAY = 86_400_000;
/** Two years of history, the span a lab's queue and trends look back over. */
const HISTORY_DAYS = 730;

export interface SeededLab {
  recipeId: number;
  /** The spec with the most points, for the trend. */
  trendSpecId: string;
  trendPoints: number;
  operatorIds: number[];
}

interface Run {
  id: number;
  code: string;
  createdAt: Date;
}

/** The demo lab grown to a busy lab's size: runs of TOUCH-4K over two years, their readings and deviations. */
export async function seedAtSize(ctx: AppContext): Promise<SeededLab> {
  const random = seededRandom(20_261_202);
  const recipe = await RecipeModel.findOne({ where: { code: 'TOUCH-4K' } });
  const version = recipe && (await RecipeVersionModel.findOne({ where: { recipeId: recipe.id, number: 1 } }));
  if (!recipe || !version) throw new Error('The demo recipe TOUCH-4K v1 is missing: the bench seeds on top of the demo lab.');
  const operatorIds = await addOperators(ctx);
  const engineer = await UserModel.findOne({ where: { role: 'engineer' } });
  const runs = await addRuns(ctx, random, { recipeId: recipe.id, versionId: version.id, engineerId: engineer?.id ?? null });
  const pieceIds = await addPieces(ctx, runs);
  const inspect = versionContent(version).steps.find((s) => s.id === 'inspect-keys');
  if (!inspect) throw new Error('TOUCH-4K v1 has no inspect-keys step.');
  const specs = inspect.readingSpecs ?? [];
  const readings = await addReadings(ctx, random, { runs, pieceIds, specs, operatorIds });
  await addDeviations(ctx, random, { runs, recipeId: recipe.id, operatorIds, steps: versionContent(version).steps });
  const trendSpec = specs[0] as ReadingSpec;
  return { recipeId: recipe.id, trendSpecId: trendSpec.id, trendPoints: readings.get(trendSpec.id) ?? 0, operatorIds };
}

async function addOperators(ctx: AppContext): Promise<number[]> {
  const demo = await UserModel.findOne({ where: { role: 'operator' } });
  const now = new Date();
  const rows = Array.from({ length: SIZES.extraOperators }, (_, i) => [`operator${i + 10}@larkspur-lab.example`, `Bench operator ${i + 1}`, 'operator', 'active', demo?.passwordHash ?? null, now, now]);
  await insertRows(ctx.sequelize, 'users', ['email', 'name', 'role', 'status', 'password_hash', 'created_at', 'updated_at'], rows);
  return (await UserModel.findAll({ where: { role: 'operator' }, attributes: ['id'] })).map((u) => u.id);
}

async function addRuns(ctx: AppContext, random: () => number, r: { recipeId: number; versionId: number; engineerId: number | null }): Promise<Run[]> {
  const now = Date.now();
  const rows = Array.from({ length: SIZES.runs }, (_, i) => {
    // Oldest first, so ids grow with time as in a real lab.
    const createdAt = new Date(now - (HISTORY_DAYS - (i * HISTORY_DAYS) / SIZES.runs) * DAY - random() * DAY);
    const ageDays = (now - createdAt.getTime()) / DAY;
    const state = ageDays > 30 ? 'closed' : ageDays > 3 ? weighted(random, [['completed', 3], ['closed', 1]] as const) : 'in-progress';
    const code = `R-${createdAt.getUTCFullYear()}-${String(10_000 + i)}`;
    return [code, r.recipeId, r.versionId, state, SIZES.piecesPerRun, '', 1, r.engineerId, createdAt, createdAt];
  });
  await insertRows(ctx.sequelize, 'runs', ['code', 'recipe_id', 'version_id', 'state', 'quantity', 'notes', 'version', 'created_by', 'created_at', 'updated_at'], rows);
  const found = await ctx.sequelize.query<{ id: number; code: string; created_at: Date }>("SELECT id, code, created_at FROM runs WHERE code LIKE 'R-%-1____' ORDER BY id", { type: QueryTypes.SELECT });
  return found.map((f) => ({ id: Number(f.id), code: f.code, createdAt: new Date(f.created_at) }));
}

/** Piece ids by run id, in piece order. */
async function addPieces(ctx: AppContext, runs: readonly Run[]): Promise<Map<number, number[]>> {
  const rows = runs.flatMap((run) => pieceCodes(run.code, SIZES.piecesPerRun).map((code, i) => [run.id, i + 1, code]));
  await insertRows(ctx.sequelize, 'run_pieces', ['run_id', 'number', 'code'], rows);
  const found = await ctx.sequelize.query<{ id: number; run_id: number }>('SELECT id, run_id FROM run_pieces ORDER BY run_id, number', { type: QueryTypes.SELECT });
  const byRun = new Map<number, number[]>();
  for (const f of found) byRun.set(Number(f.run_id), [...(byRun.get(Number(f.run_id)) ?? []), Number(f.id)]);
  return byRun;
}

/** Every piece of the newest runs measured on every spec, until SIZES.readings; counts per spec. */
async function addReadings(ctx: AppContext, random: () => number, r: { runs: readonly Run[]; pieceIds: Map<number, number[]>; specs: readonly ReadingSpec[]; operatorIds: number[] }) {
  const silver = await InkModel.findOne({ where: { name: 'Quillmere QS-30 nanosilver ink' } });
  const meter = await InstrumentModel.findOne({ where: { name: 'Bench multimeter M-3' } });
  const rows: unknown[][] = [];
  const perSpec = new Map<string, number>();
  for (const run of [...r.runs].reverse()) {
    for (const pieceId of r.pieceIds.get(run.id) ?? []) {
      for (const spec of r.specs) {
        if (rows.length >= SIZES.readings) break;
        const centre = spec.target ?? ((spec.lowerLimit ?? 0) + (spec.upperLimit ?? (spec.lowerLimit ?? 0) * 3)) / 2;
        const value = Number((centre * (1 + (random() + random() + random() - 1.5) * 0.35)).toFixed(2));
        const ambient = Number((20 + random() * 4).toFixed(1));
        const judged = evaluateReading(spec, value, { ambientTempC: ambient, tcrPerK: silver?.tcrPerK ?? null });
        const at = new Date(run.createdAt.getTime() + 6 * 3_600_000 + rows.length * 1_000);
        rows.push([run.id, 'inspect-keys', spec.id, pieceId, value, spec.unit, judged.correctedValue, ambient, meter?.id ?? null, judged.outOfLimits, pick(random, r.operatorIds), at, false]);
        perSpec.set(spec.id, (perSpec.get(spec.id) ?? 0) + 1);
      }
    }
  }
  const columns = ['run_id', 'step_id', 'spec_id', 'piece_id', 'value', 'unit', 'corrected_value', 'ambient_temp_c', 'instrument_id', 'out_of_limits', 'recorded_by', 'recorded_at', 'made_offline'];
  await insertRows(ctx.sequelize, 'run_readings', columns, rows);
  return perSpec;
}

const RULE_STEP: Record<string, string | null> = {
  'reading-out-of-limits': 'inspect-keys',
  'timer-over-maximum': 'dry-keys',
  'timer-ended-early': 'dry-keys',
  'cure-dose-short': 'cure-keys',
  'calibration-overdue': 'cure-keys',
  'treatment-wait-exceeded': 'print-keys',
  'expired-lot': 'print-keys',
  'lot-past-pot-life': 'print-keys',
};

async function addDeviations(ctx: AppContext, random: () => number, r: { runs: readonly Run[]; recipeId: number; operatorIds: number[]; steps: ReadonlyArray<{ id: string; kind: string }> }) {
  const quality = await UserModel.findOne({ where: { role: 'quality' } });
  const now = Date.now();
  const rules = DEVIATION_RULES.map((rule) => [rule, rule === 'reported' ? 8 : rule === 'reading-out-of-limits' ? 6 : 1] as const);
  const rows = Array.from({ length: SIZES.deviations }, () => {
    const run = pick(random, r.runs);
    const rule = weighted(random, rules);
    const stepId = rule in RULE_STEP ? RULE_STEP[rule] : random() < 0.15 ? null : pick(random, r.steps).id;
    const stepKind = r.steps.find((s) => s.id === stepId)?.kind ?? null;
    const createdAt = new Date(Math.min(now - 60_000, run.createdAt.getTime() + random() * DAY));
    const young = now - createdAt.getTime() < 60 * DAY;
    const state = young ? weighted(random, [['open', 4], ['in-review', 3], ['dispositioned', 2], ['closed', 1]] as const) : weighted(random, [['closed', 19], ['dispositioned', 1]] as const);
    const severity = weighted(random, [['minor', 6], ['major', 3], ['critical', 1]] as const);
    const text = deviationText(random, rule, `${run.code}-0${1 + Math.floor(random() * 8)}`);
    const reviewed = state !== 'open';
    const later = (hours: number) => new Date(createdAt.getTime() + hours * 3_600_000);
    return [
      run.id, r.recipeId, stepId, stepKind, rule, severity, state, text.title, text.expected, text.actual, '[]', '[]', pick(random, r.operatorIds), createdAt, later(reviewed ? 30 : 0),
      reviewed ? (quality?.id ?? null) : null, reviewed ? later(4) : null, reviewed ? 2 : 1, state === 'dispositioned' || state === 'closed' ? later(28) : null,
      state === 'closed' ? later(30) : null, state === 'closed' ? (quality?.id ?? null) : null, state === 'closed' ? 'Reviewed with the operator; no further action.' : null,
    ];
  });
  const columns = ['run_id', 'recipe_id', 'step_id', 'step_kind', 'rule', 'severity', 'state', 'title', 'expected', 'actual', 'piece_ids', 'photo_file_ids', 'created_by', 'created_at', 'updated_at', 'assignee_id', 'assigned_at', 'revision', 'dispositioned_at', 'closed_at', 'closed_by', 'closure_note'];
  await insertRows(ctx.sequelize, 'deviations', columns, rows);
}
