import type { HeatSource, Printer } from '../../schemas/equipment.schema';
import type { Ink, Substrate } from '../../schemas/material.schema';
import type { RecipeStep } from '../../schemas/recipe-step.schema';
import type { VersionSetup } from '../../schemas/recipe.schema';

/** What the checks read: the version's setup and steps, and the records they point at (by id). */
export interface RecipeCheckInput {
  setup: VersionSetup;
  steps: readonly RecipeStep[];
  inks: readonly Ink[];
  substrates: readonly Substrate[];
  printers: readonly Printer[];
  heatSources: readonly HeatSource[];
}

export type SubstrateRole = 'print-substrate' | 'receiving-substrate';

/** Lookups resolved once per run of the checks, so each family stays linear in the steps. */
export interface RecipeContext {
  readonly setup: VersionSetup;
  readonly steps: readonly RecipeStep[];
  readonly inkById: ReadonlyMap<number, Ink>;
  readonly heatSourceById: ReadonlyMap<number, HeatSource>;
  readonly printer: Printer | null;
  readonly substrate: Substrate | null;
  readonly receiving: Substrate | null;
  /** Index of the first transfer step, or -1. From there on the work sits on the receiving substrate. */
  readonly firstTransferIndex: number;
}

/**
 * Resolves the setup's records and indexes inks and heat sources by id.
 *
 * @example
 * buildRecipeContext({ setup: { substrateId: 3, printerId: 1, … }, steps, inks, substrates, printers, heatSources })
 * // → { substrate: <substrate 3>, printer: <printer 1>, receiving: null, firstTransferIndex: -1, … }
 */
export function buildRecipeContext(input: RecipeCheckInput): RecipeContext {
  const byId = <T extends { id: number }>(records: readonly T[]) => new Map(records.map((r) => [r.id, r]));
  const substrateById = byId(input.substrates);
  const printerById = byId(input.printers);
  const pick = <T>(map: Map<number, T>, id: number | null) => (id === null ? null : (map.get(id) ?? null));
  return {
    setup: input.setup,
    steps: input.steps,
    inkById: byId(input.inks),
    heatSourceById: byId(input.heatSources),
    printer: pick(printerById, input.setup.printerId),
    substrate: pick(substrateById, input.setup.substrateId),
    receiving: pick(substrateById, input.setup.receivingSubstrateId),
    firstTransferIndex: input.steps.findIndex((s) => s.kind === 'transfer'),
  };
}

/**
 * The substrate the work sits on at a step: the print substrate until the first transfer, the
 * receiving substrate after it. The transfer itself heats both.
 *
 * @example
 * // steps: print, cure, transfer, attach → at index 3 → [{ role: 'receiving-substrate', substrate: <receiving> }]
 * substratesAt(ctx, 3)
 */
export function substratesAt(ctx: RecipeContext, index: number): { role: SubstrateRole; substrate: Substrate }[] {
  const out: { role: SubstrateRole; substrate: Substrate }[] = [];
  const t = ctx.firstTransferIndex;
  if ((t === -1 || index <= t) && ctx.substrate) out.push({ role: 'print-substrate', substrate: ctx.substrate });
  if (t !== -1 && index >= t && ctx.receiving) out.push({ role: 'receiving-substrate', substrate: ctx.receiving });
  return out;
}
