import type { ReadingEvaluation } from '@tracewright/shared';
import { numberText } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';

/** The live verdict under a reading: the corrected value (large) and in or out of limits, in words. */
export function EvaluationLine({ evaluation, unit }: { evaluation: ReadingEvaluation; unit: string }) {
  const isOut = evaluation.outOfLimits;
  return (
    <div role="status" className={`flex flex-col gap-1 rounded-lg border-2 p-3 ${isOut ? 'border-oxide-700 bg-oxide-50 text-oxide-800' : 'border-verdigris-700 bg-verdigris-50 text-verdigris-800'}`}>
      {evaluation.correctedValue !== null ? (
        <p className="flex items-baseline gap-2">
          <span className="text-base font-bold">At {evaluation.correctedTo} °C:</span>
          <span className="text-[2.25rem] font-bold leading-tight tabular">{numberText(evaluation.correctedValue)}</span>
          <span className="text-[1.25rem]">{unit}</span>
        </p>
      ) : null}
      <p className="flex items-start gap-2 font-bold">
        <Icon name={isOut ? 'warning' : 'check'} className="mt-0.5 size-6" />
        {isOut ? 'Out of limits' : 'Within limits'}
      </p>
      <p className="text-base text-graphite-900">{evaluation.message}</p>
    </div>
  );
}
