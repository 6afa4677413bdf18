import { formatNumber as f } from '../../process/units';
import type { Ink } from '../../schemas/material.schema';
import type { RecipeStep, RecipeStepOf } from '../../schemas/recipe-step.schema';
import { checkMaker, stepLabel } from './check-helpers';
import type { ProcessCheck } from './process-check';
import type { RecipeContext } from './recipe-context';
import { stepDurationMinutes } from './timeline';

const make = checkMaker('sequence');

interface Printed {
  index: number;
  step: RecipeStepOf<'print-pass'>;
}

/** State carried forward through the steps, so the whole family is one pass. */
interface Walk {
  wet: Printed | null;
  /** Conductor inks printed since the last cure, by ink id. */
  uncured: Map<number, Printed>;
  partsAttached: { index: number; step: RecipeStep } | null;
}

function printChecks(ctx: RecipeContext, walk: Walk, index: number, step: RecipeStepOf<'print-pass'>, ink: Ink | undefined): ProcessCheck[] {
  const out: ProcessCheck[] = [];
  const here = stepLabel(index, step);
  if (walk.wet) {
    const under = stepLabel(walk.wet.index, walk.wet.step);
    out.push(make({ id: `sequence:${step.id}:wet-on-wet`, stepId: step.id, status: 'blocked', title: 'Printing onto a wet layer', numbers: `${under} → ${here}, no dry or cure between`, why: `${here} prints over the still-wet layer of ${under}; the inks would run into each other, so add a dry or cure step between.` }));
  }
  if (ink && (ink.function === 'dielectric' || ink.function === 'conductor')) {
    for (const [inkId, below] of walk.uncured) {
      if (inkId === step.params.inkId) continue;
      const belowName = ctx.inkById.get(inkId)?.name ?? `ink #${inkId}`;
      // A Warning, not Blocked: labs often print a cover over a dried, uncured conductor and cure
      // both in one bake, which the cure-dose check counts; the risk is solvent trapped under the cover.
      out.push(make({ id: `sequence:${step.id}:over-uncured:ink-${inkId}`, stepId: step.id, status: 'warning', title: `${ink.name} over uncured ${belowName}`, numbers: `${belowName} printed at ${stepLabel(below.index, below.step)}, no cure before ${here}`, why: `${ink.name} goes over ${belowName} before any cure, which can trap solvent and leave the conductor more resistive; cure first unless one shared bake is proven.` }));
    }
  }
  if (walk.partsAttached) {
    const at = stepLabel(walk.partsAttached.index, walk.partsAttached.step);
    out.push(make({ id: `sequence:${step.id}:after-parts`, stepId: step.id, status: 'blocked', title: 'Printing after parts are attached', numbers: `parts attached at ${at}; ${here} prints after`, why: `Parts attached at ${at} stand proud of the surface and would hit the print head; print everything before attaching parts.` }));
  }
  return out;
}

function treatmentChecks(ctx: RecipeContext, index: number, step: RecipeStepOf<'surface-treatment'>, nextPrint: number, minutesBetween: number): ProcessCheck[] {
  const here = stepLabel(index, step);
  if (nextPrint === -1) {
    return [make({ id: `sequence:${step.id}:unused-treatment`, stepId: step.id, status: 'warning', title: 'Treatment with nothing printed after', numbers: '', why: `No print pass follows ${here}, so the treatment does nothing for the print; move it before a print pass or remove it.` })];
  }
  const wait = step.params.maxWaitBeforePrintMinutes;
  if (wait !== null && minutesBetween > wait) {
    const next = stepLabel(nextPrint, ctx.steps[nextPrint] as RecipeStep);
    return [make({ id: `sequence:${step.id}:treatment-wait`, stepId: step.id, status: 'warning', title: 'Treatment may wear off before printing', numbers: `about ${f(minutesBetween)} min until ${next}; treatment lasts ${f(wait)} min`, why: `The steps between ${here} and ${next} take about ${f(minutesBetween)} min (estimated), longer than the ${f(wait)} min the treatment holds; treat closer to printing.` })];
  }
  return [];
}

/** Looked up once: the last cure, the next print pass after each step, each step's start minute. */
function indexSteps(steps: readonly RecipeStep[]) {
  const lastCure = steps.findLastIndex((s) => s.kind === 'cure');
  const nextPrint = new Array<number>(steps.length).fill(-1);
  for (let i = steps.length - 2, next = -1; i >= 0; i -= 1) {
    if ((steps[i + 1] as RecipeStep).kind === 'print-pass') next = i + 1;
    nextPrint[i] = next;
  }
  const startMinutes = [0];
  steps.forEach((s, i) => startMinutes.push((startMinutes[i] as number) + stepDurationMinutes(s)));
  return { lastCure, nextPrint, startMinutes };
}

function visit(ctx: RecipeContext, walk: Walk, lookup: ReturnType<typeof indexSteps>, step: RecipeStep, i: number): ProcessCheck[] {
  switch (step.kind) {
    case 'print-pass': {
      const ink = ctx.inkById.get(step.params.inkId);
      const found = printChecks(ctx, walk, i, step, ink);
      walk.wet = { index: i, step };
      if (ink?.function === 'conductor') walk.uncured.set(ink.id, { index: i, step });
      return found;
    }
    case 'dry':
      walk.wet = null;
      return [];
    case 'cure':
      walk.wet = null;
      walk.uncured.clear();
      return [];
    case 'attach-parts':
      walk.partsAttached ??= { index: i, step };
      if (step.params.method !== 'conductive-adhesive' || i < lookup.lastCure) return [];
      return [make({ id: `sequence:${step.id}:adhesive-cure`, stepId: step.id, status: 'blocked', title: 'Conductive adhesive never cured', numbers: '', why: `No cure step follows ${stepLabel(i, step)}; conductive adhesive neither holds nor conducts until cured, so add its cure after this step.` })];
    case 'transfer':
      if (ctx.setup.receivingSubstrateId !== null) return [];
      return [make({ id: `sequence:${step.id}:no-receiver`, stepId: step.id, status: 'blocked', title: 'Transfer with nothing to receive it', numbers: '', why: `${stepLabel(i, step)} transfers the print, but the setup names no receiving substrate; pick it in the setup.` })];
    case 'surface-treatment': {
      const next = lookup.nextPrint[i] as number;
      const between = next === -1 ? 0 : (lookup.startMinutes[next] as number) - (lookup.startMinutes[i + 1] as number);
      return treatmentChecks(ctx, i, step, next, between);
    }
    default:
      return [];
  }
}

/**
 * The order of steps: no print over a wet layer (Blocked), no dielectric or other conductor over an
 * uncured conductor (Warning), no print after parts are attached (Blocked), a cure after every
 * conductive-adhesive attach (Blocked), a receiving substrate for every transfer (Blocked), a
 * print pass after every surface treatment and soon enough for it (Warning). One Pass when all
 * is in order.
 *
 * @example
 * // print silver, print silver again with no dry between
 * sequenceChecks(ctx) // → [{ id: 'sequence:print-2:wet-on-wet', status: 'blocked', … }]
 */
export function sequenceChecks(ctx: RecipeContext): ProcessCheck[] {
  if (ctx.steps.length === 0) return [];
  const lookup = indexSteps(ctx.steps);
  const walk: Walk = { wet: null, uncured: new Map(), partsAttached: null };
  const out = ctx.steps.flatMap((step, i) => visit(ctx, walk, lookup, step, i));
  if (out.length === 0) {
    out.push(make({ id: 'sequence:order', stepId: null, status: 'pass', title: 'Step order', numbers: `${ctx.steps.length} steps`, why: 'Every layer dries before the next, parts go on last, and every treatment, transfer and adhesive has what it needs.' }));
  }
  return out;
}
