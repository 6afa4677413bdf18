import type { ChoiceIssue } from '@tracewright/shared';

import { machineLabelOf, machineOptionsOf, versionMachineNameOf } from '../utils/choice-options';
import type { MachineSlot } from '../utils/plan-form-values';
import type { PlanSources } from '../utils/plan-issues';
import { MachineChoice } from './machine-choice';

type PlanMachinesFieldsetProps = { slots: MachineSlot[]; sources: PlanSources; issues: ChoiceIssue[][]; askedReasons: ReadonlySet<string> };

export function PlanMachinesFieldset({ slots, sources, issues, askedReasons }: PlanMachinesFieldsetProps) {
  const labels = slots.map((slot) => machineLabelOf(slot, sources));
  // Two ovens in one version get "Oven" and "Oven 2", so every field keeps its own name.
  const labelOf = (index: number) => {
    const label = labels[index] ?? '';
    const count = labels.slice(0, index).filter((l) => l === label).length;
    return count === 0 ? label : `${label} ${count + 1}`;
  };
  return (
    <fieldset className="flex flex-col gap-5">
      <legend className="text-xl font-bold">Machines</legend>
      <p className="text-sm text-graphite-600">
        The version’s own machines are picked already. A machine past its calibration date needs a reason and raises a deviation.
      </p>
      {slots.length === 0 ? <p>This version names no machines.</p> : null}
      {slots.map((slot, index) => (
        <MachineChoice
          key={`${slot.kind}-${slot.versionMachineId}-${index}`}
          index={index}
          slot={slot}
          label={labelOf(index)}
          versionMachineName={versionMachineNameOf(slot, sources)}
          options={machineOptionsOf(slot, sources)}
          issues={issues[index] ?? []}
          isReasonAsked={askedReasons.has(`machines.${index}.reason`)}
        />
      ))}
    </fieldset>
  );
}
