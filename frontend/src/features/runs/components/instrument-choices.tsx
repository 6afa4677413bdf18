import { useFormContext } from 'react-hook-form';

import type { ChoiceIssue, InstrumentView } from '@tracewright/shared';

import type { PlanFormValues } from '../utils/plan-form-values';
import { CalibrationBadge } from './calibration-badge';
import { ReasonForChoice } from './reason-for-choice';

type InstrumentChoicesProps = { instruments: InstrumentView[]; issues: ChoiceIssue[][]; askedReasons: ReadonlySet<string> };

export function InstrumentChoices({ instruments, issues, askedReasons }: InstrumentChoicesProps) {
  const {
    register,
    setValue,
    formState: { errors },
  } = useFormContext<PlanFormValues>();
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="text-xl font-bold">Instruments</legend>
      <p className="text-sm text-graphite-600">
        Tick the meters the bench will take readings with. Leave all unticked if this run takes no readings.
      </p>
      {instruments.length === 0 ? <p>No instruments are recorded.</p> : null}
      {instruments.map((instrument, index) => (
        <div key={instrument.id} className="flex flex-col gap-2">
          <div className="flex flex-wrap items-center gap-3">
            <label className="flex min-h-11 cursor-pointer items-center gap-3 font-bold">
              <input
                type="checkbox"
                className="size-5 accent-copper-600"
                {...register(`instruments.${index}.chosen`, { onChange: () => setValue(`instruments.${index}.reason`, '') })}
              />
              {instrument.name}
            </label>
            <CalibrationBadge state={instrument.status.state} />
          </div>
          <ReasonForChoice
            issues={issues[index] ?? []}
            isAsked={askedReasons.has(`instruments.${index}.reason`)}
            noun="instrument"
            error={errors.instruments?.[index]?.reason?.message}
            registration={register(`instruments.${index}.reason`)}
          />
        </div>
      ))}
    </fieldset>
  );
}
