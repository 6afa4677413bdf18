import { cureDoseMinutes } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { parsePairLines } from '../utils/parse-pair-lines';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { PasteField } from './paste-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const INITIAL = { samples: '', referenceTempC: '', activationEnergyKJPerMol: '', minEffectiveTempC: '' };

const parseLog = (raw: string) => parsePairLines(raw, ['minute', '°C']);

export function CureDoseCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) => {
    const samples = read.parsed('samples', parseLog, []).map(([minute, tempC]) => ({ minute, tempC }));
    return cureDoseMinutes({
      samples,
      referenceTempC: read.number('referenceTempC'),
      activationEnergyKJPerMol: read.number('activationEnergyKJPerMol'),
      minEffectiveTempC: read.optionalNumber('minEffectiveTempC'),
    });
  });
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      title="Cure dose from a temperature log"
      description="A logged oven or hot-plate profile as minutes at the reference temperature."
      source="Source: Arrhenius rate law integrated over the log by the trapezoidal rule."
      fields={
        <>
          <PasteField
            label="Temperature log (minute, °C per line)"
            help="One sample per line, in time order, such as “0, 25”. Paste straight from the logger export."
            error={errors.samples}
            {...bind('samples')}
          />
          <NumberField label="Reference temperature" unit="°C" isSigned error={errors.referenceTempC} {...bind('referenceTempC')} />
          <NumberField label="Activation energy Ea" unit="kJ/mol" error={errors.activationEnergyKJPerMol} {...bind('activationEnergyKJPerMol')} />
          <NumberField
            label="Minimum effective temperature"
            unit="°C"
            isOptional
            isSigned
            help="Time below it counts nothing."
            error={errors.minEffectiveTempC}
            {...bind('minEffectiveTempC')}
          />
        </>
      }
      results={
        <ResultsPanel label="Cure dose results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Cure dose at reference" value={outcome.result} unit="min" />
          </ResultList>
          <p className="text-sm text-graphite-700">During ramps the trapezoids count slightly high; a denser log narrows that.</p>
        </ResultsPanel>
      }
    />
  );
}
