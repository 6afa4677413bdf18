import { predictedContactAngleDeg } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const INITIAL = {
  'liquid.dispersiveMilliNPerM': '',
  'liquid.polarMilliNPerM': '',
  'solid.dispersiveMilliNPerM': '',
  'solid.polarMilliNPerM': '',
};

export function ContactAngleCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) =>
    predictedContactAngleDeg({
      liquid: { dispersiveMilliNPerM: read.number('liquid.dispersiveMilliNPerM'), polarMilliNPerM: read.number('liquid.polarMilliNPerM') },
      solid: { dispersiveMilliNPerM: read.number('solid.dispersiveMilliNPerM'), polarMilliNPerM: read.number('solid.polarMilliNPerM') },
    }),
  );
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      title="Predicted contact angle"
      description="The angle an ink should make on a solid, from the dispersive and polar parts of each."
      source="Source: Owens & Wendt 1969 (OWRK geometric mean)."
      fields={
        <>
          <NumberField label="Ink surface tension, dispersive part" unit="mN/m" error={errors['liquid.dispersiveMilliNPerM']} {...bind('liquid.dispersiveMilliNPerM')} />
          <NumberField label="Ink surface tension, polar part" unit="mN/m" error={errors['liquid.polarMilliNPerM']} {...bind('liquid.polarMilliNPerM')} />
          <NumberField label="Solid surface energy, dispersive part" unit="mN/m" error={errors['solid.dispersiveMilliNPerM']} {...bind('solid.dispersiveMilliNPerM')} />
          <NumberField label="Solid surface energy, polar part" unit="mN/m" error={errors['solid.polarMilliNPerM']} {...bind('solid.polarMilliNPerM')} />
        </>
      }
      results={
        <ResultsPanel label="Contact angle results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Contact angle" value={outcome.result} unit="°" />
          </ResultList>
          <p className="text-sm text-graphite-700">0° means the ink spreads; 180° means it does not wet at all.</p>
        </ResultsPanel>
      }
    />
  );
}
