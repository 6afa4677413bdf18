import { useFormContext } from 'react-hook-form';

import type { ChoiceIssue } from '@tracewright/shared';

import { Notice } from '../../../components/ui/notice';
import { SelectField } from '../../../components/ui/select-field';
import type { MachineOption } from '../utils/choice-options';
import type { MachineSlot, PlanFormValues } from '../utils/plan-form-values';
import { ReasonForChoice } from './reason-for-choice';

const CALIBRATION_WORDS = { ok: '', 'due-soon': ' · calibration due soon', overdue: ' · calibration overdue', 'not-tracked': '' } as const;

type MachineChoiceProps = {
  index: number;
  slot: MachineSlot;
  label: string;
  versionMachineName: string;
  options: MachineOption[];
  issues: ChoiceIssue[];
  isReasonAsked: boolean;
};

export function MachineChoice({ index, slot, label, versionMachineName, options, issues, isReasonAsked }: MachineChoiceProps) {
  const {
    register,
    setValue,
    formState: { errors },
  } = useFormContext<PlanFormValues>();
  const error = errors.machines?.[index];
  const isSwapped = slot.id !== '' && slot.id !== String(slot.versionMachineId);
  return (
    <div className="flex flex-col gap-3 border-l-2 border-graphite-300 pl-4">
      <SelectField
        label={label}
        help={`The version names ${versionMachineName}.`}
        error={error?.id?.message}
        {...register(`machines.${index}.id`, { onChange: () => setValue(`machines.${index}.reason`, '') })}
      >
        {options.map((option) => (
          <option key={option.id} value={option.id}>
            {option.name}
            {option.id === slot.versionMachineId ? ' (named by the version)' : ''}
            {option.calibration ? CALIBRATION_WORDS[option.calibration] : ''}
          </option>
        ))}
      </SelectField>
      {isSwapped ? (
        <Notice tone="warning" title={`Another ${label.toLowerCase()} than the version names`}>
          <p>The version’s process checks run again with this machine when you plan. If one of them blocks, the plan is refused and the blocking checks are listed at the top of this form.</p>
        </Notice>
      ) : null}
      <ReasonForChoice
        issues={issues}
        isAsked={isReasonAsked}
        noun="machine"
        error={error?.reason?.message}
        registration={register(`machines.${index}.reason`)}
      />
    </div>
  );
}
