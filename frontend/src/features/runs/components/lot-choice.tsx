import { useFormContext } from 'react-hook-form';

import type { ChoiceIssue, LotView } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { lotOptionText } from '../utils/choice-options';
import type { PlanFormValues } from '../utils/plan-form-values';
import { ReasonForChoice } from './reason-for-choice';

type LotChoiceProps = { index: number; materialName: string; lots: LotView[]; issues: ChoiceIssue[]; isReasonAsked: boolean };

export function LotChoice({ index, materialName, lots, issues, isReasonAsked }: LotChoiceProps) {
  const {
    register,
    setValue,
    formState: { errors },
  } = useFormContext<PlanFormValues>();
  const error = errors.lots?.[index];
  return (
    <div className="flex flex-col gap-3 border-l-2 border-graphite-300 pl-4">
      <SelectField
        label={`Lot of ${materialName}`}
        help={lots.length === 0 ? `No lot of ${materialName} is recorded. Record one under Materials, then come back.` : undefined}
        error={error?.lotId?.message}
        // A reason belongs to the lot it was written for; a new pick starts without one.
        {...register(`lots.${index}.lotId`, { onChange: () => setValue(`lots.${index}.reason`, '') })}
      >
        <option value="">Choose a lot…</option>
        {lots.map((lot) => (
          <option key={lot.id} value={lot.id}>
            {lotOptionText(lot)}
          </option>
        ))}
      </SelectField>
      <ReasonForChoice
        issues={issues}
        isAsked={isReasonAsked}
        noun="lot"
        error={error?.reason?.message}
        registration={register(`lots.${index}.reason`)}
      />
    </div>
  );
}
