import { dropSpacingUm } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

export function DropSpacingCard() {
  const { values, bind } = useCalcFields({ dpi: '' });
  const outcome = computeOutcome(values, (read) => dropSpacingUm(read.number('dpi')));

  return (
    <CalcCard
      title="Drop spacing"
      description="Distance between drop centres at a printing resolution."
      source="Source: definition, 1 inch = 25 400 µm."
      fields={<NumberField label="Resolution" unit="dpi" error={outcome.fieldErrors.dpi} {...bind('dpi')} />}
      results={
        <ResultsPanel label="Drop spacing results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Drop spacing" value={outcome.result} unit="µm" />
          </ResultList>
        </ResultsPanel>
      }
    />
  );
}
