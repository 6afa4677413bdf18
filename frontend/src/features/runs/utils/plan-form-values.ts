import { materialsUsed, type DraftContent, type PlanRunInput } from '@tracewright/shared';

export type MaterialType = 'ink' | 'substrate';
export type MachineKind = 'printer' | 'heat-source' | 'surface-treater';

/** One material the version uses and the lot picked for it (`lotId` '' until picked). */
export type LotSlot = { materialType: MaterialType; materialId: number; lotId: string; reason: string };
/** One machine the version names and the one picked in its place (the same one by default). */
export type MachineSlot = { kind: MachineKind; versionMachineId: number; id: string; reason: string };
export type InstrumentSlot = { id: number; chosen: boolean; reason: string };

export type PlanFormValues = {
  quantity: string;
  dueOn: string;
  notes: string;
  lots: LotSlot[];
  machines: MachineSlot[];
  instruments: InstrumentSlot[];
};


/**
 * The inks (channel plan first, then any a print pass names) and substrates a version uses, in
 * the order a person sets them out: one lot is picked for each.
 */
export function lotSlotsOf(content: DraftContent): LotSlot[] {
  const { inkIds, substrateIds } = materialsUsed(content);
  return [
    ...inkIds.map((materialId): LotSlot => ({ materialType: 'ink', materialId, lotId: '', reason: '' })),
    ...substrateIds.map((materialId): LotSlot => ({ materialType: 'substrate', materialId, lotId: '', reason: '' })),
  ];
}

/** The version's printer, heat sources and treaters, each defaulting to itself. */
export function machineSlotsOf(content: DraftContent): MachineSlot[] {
  const slot = (kind: MachineKind, id: number): MachineSlot => ({ kind, versionMachineId: id, id: String(id), reason: '' });
  return [
    ...(content.printerId === null ? [] : [slot('printer', content.printerId)]),
    ...content.heatSourceIds.map((id) => slot('heat-source', id)),
    ...content.treaterIds.map((id) => slot('surface-treater', id)),
  ];
}

export function planDefaults(content: DraftContent, instrumentIds: readonly number[]): PlanFormValues {
  return {
    quantity: '',
    dueOn: '',
    notes: '',
    lots: lotSlotsOf(content),
    machines: machineSlotsOf(content),
    instruments: instrumentIds.map((id) => ({ id, chosen: false, reason: '' })),
  };
}

/** Where each lot and machine of the request sits in the form, so the API's answers land there. */
export type ChoicePaths = { lots: string[]; equipment: string[] };

const reasonOf = (text: string) => text.trim() || null;

/** The lot and machine choices as the API takes them, with the form path of each. */
export function planChoices(values: Pick<PlanFormValues, 'lots' | 'machines' | 'instruments'>) {
  const lots: PlanRunInput['lots'] = [];
  const equipment: PlanRunInput['equipment'] = [];
  const paths: ChoicePaths = { lots: [], equipment: [] };
  values.lots.forEach((slot, i) => {
    if (slot.lotId === '') return;
    lots.push({ lotId: Number(slot.lotId), reason: reasonOf(slot.reason) });
    paths.lots.push(`lots.${i}`);
  });
  values.machines.forEach((slot, i) => {
    if (slot.id === '') return;
    equipment.push({ kind: slot.kind, id: Number(slot.id), reason: reasonOf(slot.reason) });
    paths.equipment.push(`machines.${i}`);
  });
  values.instruments.forEach((slot, i) => {
    if (!slot.chosen) return;
    equipment.push({ kind: 'instrument', id: slot.id, reason: reasonOf(slot.reason) });
    paths.equipment.push(`instruments.${i}`);
  });
  return { lots, equipment, paths };
}
