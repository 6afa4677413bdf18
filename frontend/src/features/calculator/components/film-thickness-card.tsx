import { filmThicknessUm } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { readSpacingUm } from '../utils/read-spacing';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';
import { SpacingFields } from './spacing-fields';
import { VolumeFractionHelper } from './volume-fraction-helper';

const INITIAL = { dropVolumePl: '', spacingMode: 'dpi', dpi: '', dropSpacingUm: '', solidsVolumeFraction: '' };

export function FilmThicknessCard() {
  const { values, bind, set } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) => {
    const dropVolumePl = read.number('dropVolumePl');
    const solidsVolumeFraction = read.number('solidsVolumeFraction');
    return filmThicknessUm({ dropVolumePl, solidsVolumeFraction, dropSpacingUm: readSpacingUm(read, values.spacingMode) });
  });
  const r = outcome.result;
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      title="Film thickness"
      description="Wet and dry thickness of an area fill printed on a square drop grid."
      source="Source: volume conservation, wet = V/p², dry = wet × solids volume fraction."
      fields={
        <>
          <NumberField label="Drop volume" unit="pL" error={errors.dropVolumePl} {...bind('dropVolumePl')} />
          <SpacingFields mode={bind('spacingMode')} dpi={bind('dpi')} spacing={bind('dropSpacingUm')} errors={errors} />
          <NumberField label="Solids volume fraction" unit="0 to 1" error={errors.solidsVolumeFraction} {...bind('solidsVolumeFraction')} />
          <VolumeFractionHelper onUse={(fraction) => set('solidsVolumeFraction', fraction)} />
        </>
      }
      results={
        <ResultsPanel label="Film thickness results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Wet thickness" value={r?.wetUm} unit="µm" />
            <ResultValue label="Dry thickness" value={r?.dryUm} unit="µm" />
          </ResultList>
          <p className="text-sm text-graphite-700">Dry is the dense-equivalent thickness; a porous film is thicker by 1 ÷ its packing fraction.</p>
        </ResultsPanel>
      }
    />
  );
}
