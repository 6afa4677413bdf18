import { stretchedResistanceOhm } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { percentToFraction } from '../utils/percent';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const INITIAL = { unstrainedOhm: '', strainPercent: '' };

export function StretchedResistanceCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(
    values,
    (read) => {
      const unstrainedOhm = read.number('unstrainedOhm');
      const strain = percentToFraction(read.number('strainPercent'));
      // R/R₀ from the library too: the same formula with R₀ = 1 Ω.
      return { ohm: stretchedResistanceOhm({ unstrainedOhm, strain }), ratio: stretchedResistanceOhm({ unstrainedOhm: 1, strain }) };
    },
    { strain: 'strainPercent' },
  );
  const r = outcome.result;
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      title="Stretched resistance"
      description="Resistance of a conductor stretched without changing its volume or resistivity."
      source="Source: R = R₀(1 + ε)² for an incompressible conductor with constant resistivity."
      fields={
        <>
          <NumberField label="Unstretched resistance R₀" unit="Ω" error={errors.unstrainedOhm} {...bind('unstrainedOhm')} />
          <NumberField label="Strain" unit="%" isSigned help="30 % stretches 100 mm to 130 mm." error={errors.strainPercent} {...bind('strainPercent')} />
        </>
      }
      results={
        <ResultsPanel label="Stretched resistance results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Stretched resistance" value={r?.ohm} unit="Ω" />
            <ResultValue label="R/R₀" value={r?.ratio} />
          </ResultList>
        </ResultsPanel>
      }
    />
  );
}
