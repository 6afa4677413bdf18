import type { ChoiceIssue } from '@tracewright/shared';

import { lotsOfMaterial, materialNameOf } from '../utils/choice-options';
import type { LotSlot } from '../utils/plan-form-values';
import type { PlanSources } from '../utils/plan-issues';
import { LotChoice } from './lot-choice';

type PlanLotsFieldsetProps = { slots: LotSlot[]; sources: PlanSources; issues: ChoiceIssue[][]; askedReasons: ReadonlySet<string> };

export function PlanLotsFieldset({ slots, sources, issues, askedReasons }: PlanLotsFieldsetProps) {
  return (
    <fieldset className="flex flex-col gap-5">
      <legend className="text-xl font-bold">Lots</legend>
      <p className="text-sm text-graphite-600">
        One lot for each ink and substrate the version uses. An expired lot, or an ink past its pot life, needs a reason and raises a deviation.
      </p>
      {slots.length === 0 ? <p>This version names no inks or substrates.</p> : null}
      {slots.map((slot, index) => (
        <LotChoice
          key={`${slot.materialType}-${slot.materialId}`}
          index={index}
          materialName={materialNameOf(slot, sources)}
          lots={lotsOfMaterial(sources.lots, slot)}
          issues={issues[index] ?? []}
          isReasonAsked={askedReasons.has(`lots.${index}.reason`)}
        />
      ))}
    </fieldset>
  );
}
