import { traceResistanceOhm } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const INITIAL = { sheetResistanceOhmPerSq: '', lengthMm: '', widthMm: '', passes: '1' };

export function TraceResistanceCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) =>
    traceResistanceOhm({
      sheetResistanceOhmPerSq: read.number('sheetResistanceOhmPerSq'),
      lengthMm: read.number('lengthMm'),
      widthMm: read.number('widthMm'),
      passes: read.number('passes'),
    }),
  );
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      title="Trace resistance"
      description="Resistance of a printed path from the ink’s sheet resistance and the path’s squares."
      source="Source: R = Rs·L/W ÷ passes. Treating passes as identical layers in parallel is common practice, no source."
      fields={
        <>
          <NumberField label="Sheet resistance per pass" unit="Ω/sq" error={errors.sheetResistanceOhmPerSq} {...bind('sheetResistanceOhmPerSq')} />
          <NumberField label="Path length" unit="mm" error={errors.lengthMm} {...bind('lengthMm')} />
          <NumberField label="Path width" unit="mm" error={errors.widthMm} {...bind('widthMm')} />
          <NumberField label="Print passes" unit="whole number" inputMode="numeric" error={errors.passes} {...bind('passes')} />
        </>
      }
      results={
        <ResultsPanel label="Trace resistance results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Resistance" value={outcome.result} unit="Ω" />
          </ResultList>
        </ResultsPanel>
      }
    />
  );
}
