import {
  equipmentChoiceIssues,
  lotChoiceIssues,
  missingReasons,
  ReasonSchema,
  type ChoiceIssue,
  type HeatSourceView,
  type Ink,
  type InstrumentView,
  type LotView,
  type Printer,
  type Substrate,
  type SurfaceTreaterView,
} from '@tracewright/shared';

import { planChoices, type MachineKind, type PlanFormValues } from './plan-form-values';

/** The catalogue records a plan is made from. */
export type PlanSources = {
  lots: LotView[];
  inks: Ink[];
  substrates: Substrate[];
  printers: Printer[];
  heatSources: HeatSourceView[];
  treaters: SurfaceTreaterView[];
  instruments: InstrumentView[];
};

/** "Today" in the lab's calendar and the moment the form opened, for expiry, pot life and calibration. */
export type PlanClock = { today: string; now: Date };

type ChoiceValues = Pick<PlanFormValues, 'lots' | 'machines' | 'instruments'>;
/** The issues of each slot, in the order of the form's slots. */
export type SlotIssues = { lots: ChoiceIssue[][]; machines: ChoiceIssue[][]; instruments: ChoiceIssue[][] };

export type PlanMachine = Printer | HeatSourceView | SurfaceTreaterView;

export function machinesOfKind(sources: PlanSources, kind: MachineKind): PlanMachine[] {
  if (kind === 'printer') return sources.printers;
  return kind === 'heat-source' ? sources.heatSources : sources.treaters;
}

/** What the run rules say about each chosen lot and machine (the rules live in shared/). */
export function planIssues(values: ChoiceValues, sources: PlanSources, clock: PlanClock): SlotIssues {
  const lots = values.lots.map((slot) => {
    const lot = sources.lots.find((l) => String(l.id) === slot.lotId);
    if (!lot) return [];
    const ink = lot.materialType === 'ink' ? sources.inks.find((i) => i.id === lot.materialId) : undefined;
    return lotChoiceIssues([{ lot, potLifeHours: ink?.potLifeHours ?? null }], clock);
  });
  const machines = values.machines.map((slot) => {
    const machine = machinesOfKind(sources, slot.kind).find((m) => String(m.id) === slot.id);
    if (!machine) return [];
    const calibrationDueOn = 'calibrationDueOn' in machine ? machine.calibrationDueOn : null;
    return equipmentChoiceIssues([{ kind: slot.kind, id: machine.id, name: machine.name, calibrationDueOn }], clock.today);
  });
  const instruments = values.instruments.map((slot) => {
    const instrument = sources.instruments.find((i) => i.id === slot.id);
    if (!slot.chosen || !instrument) return [];
    return equipmentChoiceIssues([{ kind: 'instrument', id: instrument.id, name: instrument.name, calibrationDueOn: instrument.calibrationDueOn }], clock.today);
  });
  return { lots, machines, instruments };
}

const NEEDS_REASON = 'Give a reason to use it anyway.';

/**
 * The reason fields that still need text: empty where the run rules ask for a reason
 * (`missingReasons`), or too short for a reason the API would accept.
 */
export function reasonProblems(values: ChoiceValues, issues: SlotIssues): { path: [keyof ChoiceValues, number, 'reason']; message: string }[] {
  const { lots, equipment } = planChoices(values);
  const missing = new Set(missingReasons([...issues.lots, ...issues.machines, ...issues.instruments].flat(), { lots, equipment }));
  const groups = ['lots', 'machines', 'instruments'] as const;
  return groups.flatMap((group) =>
    issues[group].flatMap((slotIssues, index) => {
      if (slotIssues.length === 0) return [];
      const path: [keyof ChoiceValues, number, 'reason'] = [group, index, 'reason'];
      if (slotIssues.some((issue) => missing.has(issue))) return [{ path, message: NEEDS_REASON }];
      const reason = ReasonSchema.safeParse(values[group][index]?.reason ?? '');
      return reason.success ? [] : [{ path, message: reason.error.issues[0]?.message ?? NEEDS_REASON }];
    }),
  );
}
