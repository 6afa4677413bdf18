import { beadWidthUm, dropDiameterUm } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { readSpacingUm } from '../utils/read-spacing';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';
import { SpacingFields } from './spacing-fields';

const INITIAL = { dropVolumePl: '', spacingMode: 'dpi', dpi: '', dropSpacingUm: '', contactAngleDeg: '' };

export function BeadWidthCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) => {
    // Every field is read before the library runs, so each typo is reported, not just the first.
    const dropVolumePl = read.number('dropVolumePl');
    const contactAngleDeg = read.number('contactAngleDeg');
    const spacingUm = readSpacingUm(read, values.spacingMode);
    return { spacingUm, dropDiameterUm: dropDiameterUm(dropVolumePl), widthUm: beadWidthUm({ dropVolumePl, dropSpacingUm: spacingUm, contactAngleDeg }) };
  });
  const r = outcome.result;
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      title="Bead width"
      description="Width of a stable printed line, from drop volume, drop spacing and contact angle."
      source="Source: Stringer & Derby, J. Eur. Ceram. Soc. 2009; Langmuir 2010."
      fields={
        <>
          <NumberField label="Drop volume" unit="pL" error={errors.dropVolumePl} {...bind('dropVolumePl')} />
          <SpacingFields mode={bind('spacingMode')} dpi={bind('dpi')} spacing={bind('dropSpacingUm')} errors={errors} />
          <NumberField label="Contact angle" unit="°" error={errors.contactAngleDeg} {...bind('contactAngleDeg')} />
        </>
      }
      results={
        <ResultsPanel label="Bead width results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Bead width" value={r?.widthUm} unit="µm" />
            <ResultValue label="Drop diameter" value={r?.dropDiameterUm} unit="µm" />
            <ResultValue label="Drop spacing" value={r?.spacingUm} unit="µm" />
          </ResultList>
          <p className="text-sm text-graphite-700">
            Holds only where a stable bead forms: drops must overlap, and spacing must stay above the bulging limit. The formula does not check that.
          </p>
        </ResultsPanel>
      }
    />
  );
}
