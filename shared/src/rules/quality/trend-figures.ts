import { capability, type Capability } from '../../process/capability';
import { individualsChart, type FrozenLimits, type IndividualsChart } from '../../process/control-chart';
import { ProcessInputError } from '../../process/process-input-error';

/** Below this many included points the figures are provisional (common practice, no source). */
export const PROVISIONAL_BELOW_POINTS = 20;

/**
 * The Cpk below which a spec is listed as not capable: Montgomery's minimum of 1.33 for an
 * existing process (REFERENCES §6.1, interpretation guides).
 */
export const LOW_CPK = 1.33;

/** Capability is judged on the dashboard from this many included points on (common practice, no source). */
export const LOW_CPK_MIN_POINTS = 5;

/** A reading as a trend needs it: the value judged is the corrected one when there is one. */
export interface TrendReading {
  id: number;
  value: number;
  correctedValue: number | null;
  supersededById: number | null;
  recordedAt: Date;
}

/**
 * The points of a trend: readings still standing (a corrected reading gives way to the one
 * that replaced it), oldest first, ties broken by id so the order never changes between reads.
 * @example selectTrendReadings([{ id: 2, recordedAt: t1, supersededById: null, … }, { id: 1, recordedAt: t1, supersededById: 2, … }])
 * // → [the reading with id 2]
 */
export function selectTrendReadings<T extends TrendReading>(readings: readonly T[]): T[] {
  return readings
    .filter((r) => r.supersededById === null)
    .sort((a, b) => a.recordedAt.getTime() - b.recordedAt.getTime() || a.id - b.id);
}

/**
 * The value a trend plots: corrected to the reference temperature when it was, as judged.
 * @example judgedValue({ value: 11.9, correctedValue: 11.56 }) // → 11.56
 */
export const judgedValue = (reading: Pick<TrendReading, 'value' | 'correctedValue'>): number => reading.correctedValue ?? reading.value;

/** A note on one point; the newest (highest id) per reading is the one in force. */
export interface PointNote {
  id: number;
  readingId: number;
  excluded: boolean;
  reason: string;
}

/**
 * The note in force for each reading: notes are kept as history, the newest wins.
 * @example latestPointNotes([{ id: 1, readingId: 7, excluded: true, … }, { id: 3, readingId: 7, excluded: false, … }]).get(7)?.excluded // → false
 */
export function latestPointNotes<T extends PointNote>(notes: readonly T[]): Map<number, T> {
  const latest = new Map<number, T>();
  for (const note of notes) {
    const held = latest.get(note.readingId);
    if (!held || note.id > held.id) latest.set(note.readingId, note);
  }
  return latest;
}

export interface SpecLimitsView {
  lowerLimit: number | null;
  upperLimit: number | null;
}

export interface TrendFigures {
  chart: Omit<IndividualsChart, 'movingRanges' | 'sigma'> | null;
  capability: Capability | null;
  isProvisional: boolean;
  /** Why a figure is missing, in plain words; null when both are there. */
  note: string | null;
}

/**
 * The control chart and capability of a trend from its included values in time order: the
 * chart with frozen limits when a baseline is set (else from the values), capability against
 * the spec's limits. A figure that cannot be had is null and the note says why.
 * @example
 * trendFigures([52, 55, 51, 54, 53, 56, 52, 50, 54, 53], { lowerLimit: 44, upperLimit: 60 }, null)
 * // → { chart: { mean: 53, ucl: 60.389, lcl: 45.611, … }, capability: { cp: 1.0829, cpk: 0.9475, … }, isProvisional: true, note: null }
 */
export function trendFigures(values: readonly number[], limits: SpecLimitsView, frozen: FrozenLimits | null): TrendFigures {
  const notes: string[] = [];
  let chart: TrendFigures['chart'] = null;
  if (values.length >= (frozen ? 1 : 2)) {
    const { movingRanges: _ranges, sigma: _sigma, ...figures } = individualsChart(values, frozen ?? undefined);
    chart = figures;
  } else {
    notes.push(frozen ? 'No included points yet.' : 'Control limits need at least 2 included points.');
  }
  return { chart, capability: capabilityOrNote(values, limits, notes), isProvisional: values.length < PROVISIONAL_BELOW_POINTS, note: notes.length > 0 ? notes.join(' ') : null };
}

function capabilityOrNote(values: readonly number[], limits: SpecLimitsView, notes: string[]): Capability | null {
  if (limits.lowerLimit === null && limits.upperLimit === null) {
    notes.push('The spec has no limits, so there is no capability to compute.');
    return null;
  }
  if (values.length < 2) {
    notes.push('Capability needs at least 2 included points.');
    return null;
  }
  try {
    return capability(values, { lsl: limits.lowerLimit ?? undefined, usl: limits.upperLimit ?? undefined });
  } catch (error) {
    if (!(error instanceof ProcessInputError)) throw error;
    notes.push(error.message);
    return null;
  }
}

/**
 * Limits to freeze from a baseline's included values in time order: their mean and the
 * moving-range σ (MR̄/1.128). Refused when they are too few or do not vary.
 * @example baselineLimits([52, 55, 51, 54, 53, 56, 52, 50, 54, 53]) // → { mean: 53, sigma: 2.4626 }
 */
export function baselineLimits(values: readonly number[]): FrozenLimits {
  if (values.length < 2) throw new ProcessInputError('baselineRunIds', `A baseline needs at least 2 included points; these runs have ${values.length}.`);
  const { mean, sigma } = individualsChart(values);
  if (!(sigma > 0)) throw new ProcessInputError('baselineRunIds', 'The baseline points do not vary, so they give no limits. Pick runs with more readings.');
  return { mean, sigma };
}
