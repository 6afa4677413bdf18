import { solidsVolumeFraction } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { fieldText, formatResult } from '../utils/format-result';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const INITIAL = { solidsWtPercent: '', solidsDensityKgPerM3: '', carrierDensityKgPerM3: '' };

/** Works out the solids volume fraction from a data sheet's wt % and densities, and hands it to the film form. */
export function VolumeFractionHelper({ onUse }: { onUse: (fraction: string) => void }) {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) =>
    solidsVolumeFraction({
      solidsWtPercent: read.number('solidsWtPercent'),
      solidsDensityKgPerM3: read.number('solidsDensityKgPerM3'),
      carrierDensityKgPerM3: read.number('carrierDensityKgPerM3'),
    }),
  );
  const errors = outcome.fieldErrors;
  const fraction = outcome.result;

  return (
    <details className="rounded-md border border-graphite-300 p-3">
      <summary className="min-h-11 cursor-pointer content-center font-bold text-copper-700 underline underline-offset-4">
        Work out the volume fraction from wt % and densities
      </summary>
      <div className="mt-3 flex flex-col gap-4">
        <NumberField label="Solids content" unit="wt %" error={errors.solidsWtPercent} {...bind('solidsWtPercent')} />
        <NumberField label="Solids density" unit="kg/m³" error={errors.solidsDensityKgPerM3} {...bind('solidsDensityKgPerM3')} />
        <NumberField label="Carrier density" unit="kg/m³" error={errors.carrierDensityKgPerM3} {...bind('carrierDensityKgPerM3')} />
        <ResultsPanel label="Volume fraction results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Solids volume fraction" value={fraction} />
          </ResultList>
        </ResultsPanel>
        {fraction !== null ? (
          <Button variant="secondary" className="self-start" onClick={() => onUse(fieldText(fraction))}>
            Use {formatResult(fraction)} as the volume fraction
          </Button>
        ) : null}
      </div>
    </details>
  );
}
