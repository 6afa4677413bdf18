import { Op, type Transaction } from 'sequelize';

import type { DraftContent, PlanRunInput } from '@tracewright/shared';
import { versionMachines } from '@tracewright/shared';

import { fieldProblem } from '../errors/app-error';
import { HeatSourceModel } from '../models/heat-source.model';
import { InstrumentModel } from '../models/instrument.model';
import { PrinterModel } from '../models/printer.model';
import type { EquipmentKind } from '../models/run-equipment.model';
import { SurfaceTreaterModel } from '../models/surface-treater.model';

/** A machine the run uses: the version's own, one standing in for one of them, or an extra. */
export interface RunMachine {
  kind: EquipmentKind;
  id: number;
  name: string;
  calibrationDueOn: string | null;
  /** The version's machine of the same kind this one replaces. */
  replacesId: number | null;
  reason: string | null;
}

interface MachineInfo {
  name: string;
  calibrationDueOn: string | null;
  /** Oven, hot plate … for heat sources; the method for treaters: what a substitute must match. */
  sort: string;
}

async function machineInfo(wanted: { kind: EquipmentKind; id: number }[], transaction: Transaction): Promise<Map<string, MachineInfo>> {
  const ids = (kind: EquipmentKind) => ({ where: { id: { [Op.in]: wanted.filter((w) => w.kind === kind).map((w) => w.id) } }, transaction });
  const [printers, heat, treaters, instruments] = await Promise.all([
    PrinterModel.findAll(ids('printer')),
    HeatSourceModel.findAll(ids('heat-source')),
    SurfaceTreaterModel.findAll(ids('surface-treater')),
    InstrumentModel.findAll(ids('instrument')),
  ]);
  return new Map<string, MachineInfo>([
    ...printers.map((p) => [`printer:${p.id}`, { name: p.name, calibrationDueOn: null, sort: 'printer' }] as const),
    ...heat.map((h) => [`heat-source:${h.id}`, { name: h.name, calibrationDueOn: h.calibrationDueOn, sort: h.kind }] as const),
    ...treaters.map((t) => [`surface-treater:${t.id}`, { name: t.name, calibrationDueOn: t.calibrationDueOn, sort: t.method }] as const),
    ...instruments.map((i) => [`instrument:${i.id}`, { name: i.name, calibrationDueOn: i.calibrationDueOn, sort: 'instrument' }] as const),
  ]);
}

/**
 * The machines a run uses. Without choices, the version's own. A chosen machine the version
 * names keeps its place (with the reason given); another one replaces the version's machine of
 * the same sort (the printer; an oven for an oven, a plasma treater for a plasma treater) that
 * no earlier choice replaced; one with nothing to replace (an instrument, a second oven) is an
 * extra. Unknown or repeated choices: 422 naming the field.
 */
export async function resolveEquipment(content: DraftContent, input: PlanRunInput, transaction: Transaction): Promise<RunMachine[]> {
  const own = versionMachines(content);
  const info = await machineInfo([...own, ...input.equipment], transaction);
  const key = (m: { kind: EquipmentKind; id: number }) => `${m.kind}:${m.id}`;
  const chosenKeys = input.equipment.map(key);
  const replaced = new Set<string>();
  const added: RunMachine[] = [];
  input.equipment.forEach((choice, i) => {
    const found = info.get(key(choice));
    if (!found) throw fieldProblem(`equipment.${i}.id`, `There is no ${choice.kind.replace('-', ' ')} with id ${choice.id}. Pick one from the list.`);
    if (chosenKeys.indexOf(key(choice)) !== i) throw fieldProblem(`equipment.${i}.id`, `${found.name} is listed twice; list each machine once.`);
    if (own.some((m) => key(m) === key(choice))) return;
    const target = own.find((m) => m.kind === choice.kind && !replaced.has(key(m)) && !chosenKeys.includes(key(m)) && info.get(key(m))?.sort === found.sort);
    if (target) replaced.add(key(target));
    added.push({ kind: choice.kind, id: choice.id, name: found.name, calibrationDueOn: found.calibrationDueOn, replacesId: target?.id ?? null, reason: choice.reason });
  });
  const kept = own
    .filter((m) => !replaced.has(key(m)))
    .map((m): RunMachine => {
      const found = info.get(key(m));
      const reason = input.equipment.find((c) => key(c) === key(m))?.reason ?? null;
      return { kind: m.kind, id: m.id, name: found?.name ?? `${m.kind} #${m.id}`, calibrationDueOn: found?.calibrationDueOn ?? null, replacesId: null, reason };
    });
  return [...kept, ...added];
}
