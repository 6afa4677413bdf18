import { arrheniusAccelerationFactor, arrheniusEquivalentMinutes } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const INITIAL = { minutes: '', atTempC: '', referenceTempC: '', activationEnergyKJPerMol: '' };

export function ArrheniusCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) => {
    const conditions = { referenceTempC: read.number('referenceTempC'), activationEnergyKJPerMol: read.number('activationEnergyKJPerMol') };
    const minutes = read.number('minutes');
    const atTempC = read.number('atTempC');
    return {
      equivalentMinutes: arrheniusEquivalentMinutes({ ...conditions, minutes, atTempC }),
      factor: arrheniusAccelerationFactor({ ...conditions, tempC: atTempC }),
    };
  });
  const r = outcome.result;
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      title="Equivalent time"
      description="A hold at one temperature as minutes at the reference temperature."
      source="Source: Arrhenius rate law, one activation energy for the whole cure; equivalent time built like the equivalent age of ASTM C1074."
      fields={
        <>
          <NumberField label="Hold time" unit="min" error={errors.minutes} {...bind('minutes')} />
          <NumberField label="Hold temperature" unit="°C" isSigned error={errors.atTempC} {...bind('atTempC')} />
          <NumberField label="Reference temperature" unit="°C" isSigned error={errors.referenceTempC} {...bind('referenceTempC')} />
          <NumberField label="Activation energy Ea" unit="kJ/mol" error={errors.activationEnergyKJPerMol} {...bind('activationEnergyKJPerMol')} />
        </>
      }
      results={
        <ResultsPanel label="Equivalent time results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Equivalent time at reference" value={r?.equivalentMinutes} unit="min" />
            <ResultValue label="Rate factor k(T)/k(ref)" value={r?.factor} />
          </ResultList>
        </ResultsPanel>
      }
    />
  );
}
