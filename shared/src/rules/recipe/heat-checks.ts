import { formatNumber as f } from '../../process/units';
import type { Substrate } from '../../schemas/material.schema';
import { checkMaker, stepLabel } from './check-helpers';
import { heatExposures, type HeatExposure } from './heat-exposure';
import type { CheckStatus, ProcessCheck } from './process-check';
import { substratesAt, type RecipeContext } from './recipe-context';

const make = checkMaker('heat');

/**
 * Heat within this many °C of a substrate's continuous limit is a Warning: ovens overshoot and
 * hot plates are uneven (common practice, no source).
 */
export const HEAT_MARGIN_C = 10;

/**
 * A temperature held for a time against one substrate's limits: ≤ continuous − 10 °C Pass;
 * up to the continuous limit Warning; above it, within the short-exposure limit and time,
 * Warning; beyond that Blocked.
 *
 * @example
 * // PET-like film: continuous 120 °C, short 160 °C for 60 s; a 15 s press at 150 °C → 'warning'
 * heatStatus(150, 15, { maxContinuousTempC: 120, maxShortExposureTempC: 160, maxShortExposureSeconds: 60 })
 */
export function heatStatus(tempC: number, seconds: number, limits: Pick<Substrate, 'maxContinuousTempC' | 'maxShortExposureTempC' | 'maxShortExposureSeconds'>): CheckStatus {
  if (tempC <= limits.maxContinuousTempC - HEAT_MARGIN_C) return 'pass';
  if (tempC <= limits.maxContinuousTempC) return 'warning';
  if (tempC <= limits.maxShortExposureTempC && seconds <= limits.maxShortExposureSeconds) return 'warning';
  return 'blocked';
}

/**
 * Seconds as people say them: under 2 minutes in s, else in min.
 * @example formatSeconds(15) // → '15 s'; formatSeconds(1800) // → '30 min'
 */
export function formatSeconds(seconds: number): string {
  return seconds < 120 ? `${f(seconds)} s` : `${f(seconds / 60)} min`;
}

function substrateWhy(h: HeatExposure, s: Substrate, status: CheckStatus): string {
  const t = `${f(h.tempC)} °C`;
  const cont = `${f(s.maxContinuousTempC)} °C`;
  const short = `${f(s.maxShortExposureTempC)} °C for ${formatSeconds(s.maxShortExposureSeconds)}`;
  if (status === 'pass') return `${t} stays ${f(s.maxContinuousTempC - h.tempC)} °C under ${s.name}'s continuous limit of ${cont}.`;
  if (h.tempC <= s.maxContinuousTempC) {
    return `${t} is within ${HEAT_MARGIN_C} °C of ${s.name}'s continuous limit of ${cont} (margin: common practice, no source); check the real temperature, as heaters overshoot.`;
  }
  if (status === 'warning') {
    return `${t} is above ${s.name}'s continuous ${cont} but inside its short-exposure limit of ${short}, and this step takes ${formatSeconds(h.longestSeconds)}; keep the time tight.`;
  }
  if (h.tempC > s.maxShortExposureTempC) return `${t} is above even ${s.name}'s short-exposure limit of ${f(s.maxShortExposureTempC)} °C: expect warping, shrinking or melting, so lower the temperature.`;
  return `${t} is above ${s.name}'s continuous ${cont}, and ${formatSeconds(h.longestSeconds)} is longer than the ${short} it tolerates: lower the temperature or shorten the step.`;
}

function sourceCheck(ctx: RecipeContext, h: HeatExposure): ProcessCheck | null {
  const source = h.heatSourceId === null ? undefined : ctx.heatSourceById.get(h.heatSourceId);
  if (!source) return null;
  const base = { id: `heat:${h.step.id}:heat-source`, stepId: h.step.id, title: `${source.name} reaches ${f(h.tempC)} °C` };
  const numbers = `set ${f(h.tempC)} °C; ${source.name} max ${f(source.maxTempC)} °C`;
  if (h.tempC > source.maxTempC) {
    return make({ ...base, status: 'blocked', numbers, why: `${stepLabel(h.index, h.step)} asks ${f(h.tempC)} °C, above the ${f(source.maxTempC)} °C ${source.name} can reach; pick another heat source or lower the temperature.` });
  }
  return make({ ...base, status: 'pass', numbers, why: `${source.name} reaches up to ${f(source.maxTempC)} °C, enough for ${f(h.tempC)} °C.` });
}

/**
 * Every heat step (dry or platen above 25 °C, cure, transfer, attach with a working temperature)
 * against each substrate it heats (the print substrate until the first transfer, both at the
 * transfer, the receiving substrate after it), and against its heat source's maximum. A step is
 * judged at its longest allowed time: the worst case for the film.
 *
 * @example
 * // cure 30 min at 150 °C on a film rated 120 °C continuous, 160 °C for 60 s → Blocked
 * heatChecks(ctx) // → [{ id: 'heat:cure-1:print-substrate', status: 'blocked', … }]
 */
export function heatChecks(ctx: RecipeContext): ProcessCheck[] {
  const out: ProcessCheck[] = [];
  for (const h of heatExposures(ctx.steps)) {
    const source = sourceCheck(ctx, h);
    if (source) out.push(source);
    for (const { role, substrate } of substratesAt(ctx, h.index)) {
      const status = heatStatus(h.tempC, h.longestSeconds, substrate);
      const numbers =
        `${f(h.tempC)} °C for up to ${formatSeconds(h.longestSeconds)} (${h.what}); ${substrate.name}: continuous ≤ ${f(substrate.maxContinuousTempC)} °C, ` +
        `short ≤ ${f(substrate.maxShortExposureTempC)} °C for ${formatSeconds(substrate.maxShortExposureSeconds)}`;
      out.push(make({ id: `heat:${h.step.id}:${role}`, stepId: h.step.id, status, title: `${h.what} at ${f(h.tempC)} °C on ${substrate.name}`, numbers, why: substrateWhy(h, substrate, status) }));
    }
  }
  return out;
}
