import type { DraftContent } from '../../schemas/recipe.schema';
import type { RecipeStep } from '../../schemas/recipe-step.schema';
import type { EQUIPMENT_KINDS } from '../../schemas/run.schema';

type EquipmentKind = (typeof EQUIPMENT_KINDS)[number];

/** A machine kind a version names (instruments are picked per reading, never by the version). */
export type VersionMachineKind = Exclude<EquipmentKind, 'instrument'>;

export interface MachineRef {
  kind: VersionMachineKind;
  id: number;
}

/** The run uses machine `toId` where the version names `fromId`. */
export interface Substitution extends MachineRef {
  fromId: number;
}

/**
 * The machines a version names, once each: its printer, and the heat sources and surface treaters
 * of its setup and of its steps.
 */
export function versionMachines(content: DraftContent): MachineRef[] {
  const found = new Map<string, MachineRef>();
  const add = (kind: VersionMachineKind, id: number | null) => {
    if (id !== null) found.set(`${kind}:${id}`, { kind, id });
  };
  add('printer', content.printerId);
  content.heatSourceIds.forEach((id) => add('heat-source', id));
  content.treaterIds.forEach((id) => add('surface-treater', id));
  for (const step of content.steps) {
    if (step.kind === 'surface-treatment') add('surface-treater', step.params.treaterId);
    if (step.kind === 'dry' || step.kind === 'cure' || step.kind === 'transfer') add('heat-source', step.params.heatSourceId);
  }
  return [...found.values()];
}

/**
 * The version's content as this run makes it: every substituted machine's id in place of the
 * version's, in the setup and in the steps. The checks then judge the substituted content.
 */
export function substitutedContent(content: DraftContent, substitutions: readonly Substitution[]): DraftContent {
  if (substitutions.length === 0) return content;
  const swap = (kind: VersionMachineKind, id: number | null) =>
    id === null ? null : (substitutions.find((s) => s.kind === kind && s.fromId === id)?.id ?? id);
  const swapAll = (kind: VersionMachineKind, ids: readonly number[]) => [...new Set(ids.map((id) => swap(kind, id) as number))];
  const steps = content.steps.map((step): RecipeStep => {
    if (step.kind === 'surface-treatment') return { ...step, params: { ...step.params, treaterId: swap('surface-treater', step.params.treaterId) } };
    if (step.kind === 'dry') return { ...step, params: { ...step.params, heatSourceId: swap('heat-source', step.params.heatSourceId) } };
    if (step.kind === 'cure') return { ...step, params: { ...step.params, heatSourceId: swap('heat-source', step.params.heatSourceId) } };
    if (step.kind === 'transfer') return { ...step, params: { ...step.params, heatSourceId: swap('heat-source', step.params.heatSourceId) } };
    return step;
  });
  return {
    ...content,
    printerId: swap('printer', content.printerId),
    heatSourceIds: swapAll('heat-source', content.heatSourceIds),
    treaterIds: swapAll('surface-treater', content.treaterIds),
    steps,
  };
}
