import { checkMaker, stepLabel } from './check-helpers';
import type { ProcessCheck } from './process-check';
import type { RecipeContext } from './recipe-context';

const make = checkMaker('references');

interface Referenced {
  id: string;
  stepId: string | null;
  /** e.g. "Ink #12", the words for a record that could not be found. */
  what: string;
  /** Where it is referenced, e.g. "in step 3 “Print silver”" or "in the setup". */
  where: string;
  record: { name: string; archived: boolean } | null | undefined;
}

function judge({ id, stepId, what, where, record }: Referenced): ProcessCheck | null {
  if (!record) {
    return make({ id, stepId, status: 'blocked', title: `${what} not found`, numbers: '', why: `${what} ${where} is not in the lab's records (deleted, or not loaded); pick another.` });
  }
  if (record.archived) {
    return make({ id, stepId, status: 'warning', title: `${record.name} is archived`, numbers: '', why: `“${record.name}” ${where} is archived, so the lab may no longer stock it; pick a current record or restore it.` });
  }
  return null;
}

function setupReferences(ctx: RecipeContext): (ProcessCheck | null)[] {
  const { setup, steps } = ctx;
  const hasPrint = steps.some((s) => s.kind === 'print-pass');
  const needsSubstrate = hasPrint || steps.some((s) => s.kind === 'cure' || s.kind === 'transfer' || s.kind === 'dry');
  const found: (ProcessCheck | null)[] = [];
  if (setup.substrateId === null && needsSubstrate) {
    found.push(make({ id: 'references:substrate', stepId: null, status: 'blocked', title: 'No print substrate chosen', numbers: '', why: 'Pick the print substrate in the setup: wetting, line and heat checks need it.' }));
  } else if (setup.substrateId !== null) {
    found.push(judge({ id: 'references:substrate', stepId: null, what: `Substrate #${setup.substrateId}`, where: 'in the setup', record: ctx.substrate }));
  }
  if (setup.receivingSubstrateId !== null) {
    found.push(judge({ id: 'references:receiving-substrate', stepId: null, what: `Substrate #${setup.receivingSubstrateId}`, where: 'as the receiving substrate', record: ctx.receiving }));
  }
  if (setup.printerId === null && hasPrint) {
    found.push(make({ id: 'references:printer', stepId: null, status: 'blocked', title: 'No printer chosen', numbers: '', why: 'Pick the printer in the setup: jetting, channel and line checks need it.' }));
  } else if (setup.printerId !== null) {
    found.push(judge({ id: 'references:printer', stepId: null, what: `Printer #${setup.printerId}`, where: 'in the setup', record: ctx.printer }));
  }
  for (const entry of setup.channelPlan) {
    found.push(judge({ id: `references:channel-plan:${entry.channel}`, stepId: null, what: `Ink #${entry.inkId}`, where: `on channel ${entry.channel} of the channel plan`, record: ctx.inkById.get(entry.inkId) }));
  }
  for (const heatSourceId of setup.heatSourceIds) {
    found.push(judge({ id: `references:heat-source-${heatSourceId}`, stepId: null, what: `Heat source #${heatSourceId}`, where: 'in the setup', record: ctx.heatSourceById.get(heatSourceId) }));
  }
  return found;
}

function stepReferences(ctx: RecipeContext): (ProcessCheck | null)[] {
  return ctx.steps.flatMap((step, i) => {
    const where = `in ${stepLabel(i, step)}`;
    const found: (ProcessCheck | null)[] = [];
    if (step.kind === 'print-pass') {
      found.push(judge({ id: `references:${step.id}:ink`, stepId: step.id, what: `Ink #${step.params.inkId}`, where, record: ctx.inkById.get(step.params.inkId) }));
    }
    const heatSourceId = 'heatSourceId' in step.params ? step.params.heatSourceId : null;
    if (heatSourceId !== null) {
      found.push(judge({ id: `references:${step.id}:heat-source`, stepId: step.id, what: `Heat source #${heatSourceId}`, where, record: ctx.heatSourceById.get(heatSourceId) }));
    }
    return found;
  });
}

/**
 * Every record the version points at must exist: substrates, printer, inks, heat sources. A
 * missing one is Blocked (the other checks cannot run without it); an archived one is a Warning.
 * Also Blocked: no print substrate or printer chosen while steps need one.
 *
 * @example
 * // a print pass naming ink 99, which is not among the inks
 * referenceChecks(ctx) // → [{ id: 'references:print-1:ink', status: 'blocked', title: 'Ink #99 not found', … }]
 */
export function referenceChecks(ctx: RecipeContext): ProcessCheck[] {
  const out = [...setupReferences(ctx), ...stepReferences(ctx)].filter((c): c is ProcessCheck => c !== null);
  if (out.length > 0) return out;
  return [make({ id: 'references:all', stepId: null, status: 'pass', title: 'Every record found', numbers: '', why: 'Every substrate, printer, ink and heat source this version names is on record and in use.' })];
}
