import { useState } from 'react';

import type { ReadingSpec } from '@tracewright/shared';
import { numberText } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { formatDateTime } from '../../../lib/format-date';
import { useBench } from '../hooks/bench-context';
import type { BenchReading } from '../utils/bench-run';
import { benchButton } from './bench-button-styles';
import { CorrectReadingDialog } from './correct-reading-dialog';

type ReadingRowProps = { reading: BenchReading; spec: ReadingSpec; tcrPerK: number | null };

/** One recorded value: current ones with their verdict and a correct button, replaced ones struck through. */
export function ReadingRow({ reading, spec, tcrPerK }: ReadingRowProps) {
  const { isWorkable } = useBench();
  const [isCorrecting, setIsCorrecting] = useState(false);
  const isReplaced = reading.supersededById !== null;
  const value = `${numberText(reading.value)} ${reading.unit || spec.unit}`;
  return (
    <li className="flex flex-wrap items-center gap-3 py-2">
      {isReplaced ? (
        <span>
          <del className="text-[1.5rem] text-graphite-600 tabular">{value}</del>
          <span className="sr-only"> (replaced by a correction)</span>
        </span>
      ) : (
        <span className="text-[1.75rem] font-bold tabular">{value}</span>
      )}
      {reading.correctedValue !== null ? <span className="tabular">= {numberText(reading.correctedValue)} {reading.unit || spec.unit} at 20 °C</span> : null}
      {!isReplaced ? (
        <span className={`inline-flex items-center gap-1 font-bold ${reading.outOfLimits ? 'text-oxide-700' : 'text-verdigris-800'}`}>
          <Icon name={reading.outOfLimits ? 'warning' : 'check'} className="size-5" />
          {reading.outOfLimits ? 'Out of limits' : 'Within limits'}
        </span>
      ) : null}
      <span className="text-base text-graphite-700">
        {reading.recordedBy?.name ?? 'Someone'}, {formatDateTime(reading.recordedAt)}
        {reading.correctionReason ? ` · corrected: ${reading.correctionReason}` : ''}
        {reading.isPending ? ' · waiting to send' : ''}
        {reading.isPending && reading.outOfLimits ? ' · a deviation is raised when it is sent' : ''}
      </span>
      {!isReplaced && isWorkable ? (
        <button type="button" className={benchButton('quiet')} onClick={() => setIsCorrecting(true)}>
          Correct
        </button>
      ) : null}
      {isCorrecting ? <CorrectReadingDialog reading={reading} spec={spec} tcrPerK={tcrPerK} onClose={() => setIsCorrecting(false)} /> : null}
    </li>
  );
}
