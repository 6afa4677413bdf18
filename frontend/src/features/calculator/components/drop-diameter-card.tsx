import { dropDiameterUm } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

export function DropDiameterCard() {
  const { values, bind } = useCalcFields({ dropVolumePl: '' });
  const outcome = computeOutcome(values, (read) => dropDiameterUm(read.number('dropVolumePl')));

  return (
    <CalcCard
      title="Drop diameter"
      description="Diameter of a drop in flight, taken as a sphere."
      source="Source: sphere volume V = πd³/6, with 1 pL = 1000 µm³."
      fields={<NumberField label="Drop volume" unit="pL" error={outcome.fieldErrors.dropVolumePl} {...bind('dropVolumePl')} />}
      results={
        <ResultsPanel label="Drop diameter results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Drop diameter" value={outcome.result} unit="µm" />
          </ResultList>
        </ResultsPanel>
      }
    />
  );
}
