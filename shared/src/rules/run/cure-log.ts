import { cureDoseMinutes, type TemperatureSample } from '../../process/cure-dose';
import { ProcessInputError } from '../../process/process-input-error';
import { formatNumber as f } from '../../process/units';
import type { Ink } from '../../schemas/material.schema';
import { CURE_DOSE_PASS_PERCENT } from '../recipe/cure-dose-checks';

export interface CureLogDose {
  /** False when the ink lacks its reference cure or activation energy, or the log is unusable. */
  canJudge: boolean;
  equivalentMinutes: number | null;
  referenceMinutes: number | null;
  percent: number | null;
  /** Below 100 % of the reference cure (the recipe checks' pass line); false when it can't be judged. */
  isShort: boolean;
  message: string;
}

type CureInk = Pick<Ink, 'name' | 'cureReferenceTempC' | 'cureReferenceMinutes' | 'activationEnergyKJPerMol' | 'minEffectiveCureTempC'>;

const cannotJudge = (message: string): CureLogDose => ({ canJudge: false, equivalentMinutes: null, referenceMinutes: null, percent: null, isShort: false, message });

/**
 * The cure dose of a logged oven profile against the ink's reference cure: equivalent minutes at
 * the reference temperature by Arrhenius time–temperature equivalence (trapezoids between log
 * points; points below the ink's minimum effective temperature count nothing). Points are taken
 * in minute order, whatever order they were typed in. Missing ink data, fewer than two points or
 * two points at the same minute give a "can't judge" result, never a throw.
 *
 * @example
 * // Ea 80 kJ/mol, reference 150 °C / 10 min; log 10 min @100 °C, 20 min @130 °C, 10 min @150 °C
 * // (near-instant steps) → 16.948 min equivalent, 169 %, not short (REFERENCES §5.1)
 * cureLogDose(samples, ink) // → { canJudge: true, equivalentMinutes: 16.948, referenceMinutes: 10, percent: 169.48, isShort: false, message: '…' }
 */
export function cureLogDose(samples: readonly TemperatureSample[], ink: CureInk): CureLogDose {
  const { cureReferenceTempC: refTemp, cureReferenceMinutes: refMinutes, activationEnergyKJPerMol: ea } = ink;
  if (refTemp === null || refMinutes === null || ea === null) {
    return cannotJudge(`Can't judge the cure: ${ink.name} needs its reference cure temperature and time and its activation energy on record.`);
  }
  if (samples.length < 2) return cannotJudge('Can\'t judge the cure: the log needs at least two points (minute, °C).');
  const ordered = [...samples].sort((a, b) => a.minute - b.minute);
  const repeated = ordered.find((s, i) => i > 0 && s.minute === ordered[i - 1]?.minute);
  if (repeated) return cannotJudge(`Can't judge the cure: two log points share minute ${repeated.minute}; keep one per minute.`);
  let equivalentMinutes: number;
  try {
    equivalentMinutes = cureDoseMinutes({ samples: ordered, referenceTempC: refTemp, activationEnergyKJPerMol: ea, minEffectiveTempC: ink.minEffectiveCureTempC ?? undefined });
  } catch (error) {
    if (!(error instanceof ProcessInputError)) throw error;
    return cannotJudge(`Can't judge the cure: ${error.message}`);
  }
  const percent = (equivalentMinutes / refMinutes) * 100;
  const isShort = percent < CURE_DOSE_PASS_PERCENT;
  const ref = `${f(refMinutes)} min at ${f(refTemp)} °C`;
  const floor = ink.minEffectiveCureTempC === null ? '' : `; log points below ${f(ink.minEffectiveCureTempC)} °C count nothing`;
  const numbers = `${f(equivalentMinutes)} min equivalent at ${f(refTemp)} °C against ${ink.name}'s reference cure of ${ref}: ${f(percent)} % (Ea ${f(ea)} kJ/mol${floor})`;
  const verdict = isShort ? 'The cure is short.' : 'The cure is enough.';
  return { canJudge: true, equivalentMinutes, referenceMinutes: refMinutes, percent, isShort, message: `${verdict} The log gives ${numbers}.` };
}
