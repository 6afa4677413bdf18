import { equilibriumFootprintUm } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const INITIAL = { dropVolumePl: '', contactAngleDeg: '' };

export function FootprintCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) =>
    equilibriumFootprintUm({ dropVolumePl: read.number('dropVolumePl'), contactAngleDeg: read.number('contactAngleDeg') }),
  );
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      title="Drop footprint at rest"
      description="Diameter one drop covers once it settles as a spherical cap."
      source="Source: spherical-cap volume conservation, as used by Stringer & Derby."
      fields={
        <>
          <NumberField label="Drop volume" unit="pL" error={errors.dropVolumePl} {...bind('dropVolumePl')} />
          <NumberField label="Contact angle" unit="°" error={errors.contactAngleDeg} {...bind('contactAngleDeg')} />
        </>
      }
      results={
        <ResultsPanel label="Footprint results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Footprint diameter" value={outcome.result} unit="µm" />
          </ResultList>
        </ResultsPanel>
      }
    />
  );
}
