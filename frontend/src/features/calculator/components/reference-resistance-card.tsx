import { resistanceAtReferenceOhm } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const INITIAL = { measuredOhm: '', measuredTempC: '', referenceTempC: '20', tcrPerK: '' };

export function ReferenceResistanceCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) =>
    resistanceAtReferenceOhm({
      measuredOhm: read.number('measuredOhm'),
      measuredTempC: read.number('measuredTempC'),
      referenceTempC: read.number('referenceTempC'),
      tcrPerK: read.number('tcrPerK'),
    }),
  );
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      title="Resistance at a reference temperature"
      description="A reading taken warm or cold, corrected so readings compare."
      source="Source: linear model R = R_ref·(1 + α(T − T_ref)); α must be stated at the reference temperature."
      fields={
        <>
          <NumberField label="Measured resistance" unit="Ω" error={errors.measuredOhm} {...bind('measuredOhm')} />
          <NumberField label="Measured at" unit="°C" isSigned error={errors.measuredTempC} {...bind('measuredTempC')} />
          <NumberField label="Reference temperature" unit="°C" isSigned help="Default 20 °C, where tables quote α." error={errors.referenceTempC} {...bind('referenceTempC')} />
          <NumberField
            label="Temperature coefficient α"
            unit="1/K"
            isSigned
            help="Such as 0.0039; negative for carbon and PEDOT:PSS."
            error={errors.tcrPerK}
            {...bind('tcrPerK')}
          />
        </>
      }
      results={
        <ResultsPanel label="Reference resistance results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Resistance at reference" value={outcome.result} unit="Ω" />
          </ResultList>
        </ResultsPanel>
      }
    />
  );
}
