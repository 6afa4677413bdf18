import { DEFAULT_JETTING_WINDOW, jettability, type JettingWindowId } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { CalcCard } from './calc-card';
import { JettingVerdict } from './jetting-verdict';
import { JettingWindowField } from './jetting-window-field';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const INITIAL = {
  viscosityMilliPaS: '',
  surfaceTensionMilliNPerM: '',
  densityKgPerM3: '',
  nozzleDiameterUm: '',
  dropVelocityMetresPerSecond: '',
  window: DEFAULT_JETTING_WINDOW as string,
};

export function JettabilityCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) =>
    jettability({
      viscosityMilliPaS: read.number('viscosityMilliPaS'),
      surfaceTensionMilliNPerM: read.number('surfaceTensionMilliNPerM'),
      densityKgPerM3: read.number('densityKgPerM3'),
      nozzleDiameterUm: read.number('nozzleDiameterUm'),
      dropVelocityMetresPerSecond: read.optionalNumber('dropVelocityMetresPerSecond') ?? null,
      window: values.window as JettingWindowId,
    }),
  );
  const r = outcome.result;
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      isWide
      title="Ink through a nozzle"
      description="Will this ink form clean drops through this nozzle? Fluid values at the printing temperature."
      source="Source: Reis & Derby 2000 and Jang, Kim & Moon 2009 (windows); Duineveld et al. 2002 (We > 4) and Stow & Hadfield 1981 (splashing), both as cited by Derby 2010."
      fields={
        <>
          <NumberField label="Viscosity" unit="mPa·s" error={errors.viscosityMilliPaS} {...bind('viscosityMilliPaS')} />
          <NumberField label="Surface tension" unit="mN/m" error={errors.surfaceTensionMilliNPerM} {...bind('surfaceTensionMilliNPerM')} />
          <NumberField label="Density" unit="kg/m³" error={errors.densityKgPerM3} {...bind('densityKgPerM3')} />
          <NumberField label="Nozzle diameter" unit="µm" error={errors.nozzleDiameterUm} {...bind('nozzleDiameterUm')} />
          <NumberField
            label="Jetting speed"
            unit="m/s"
            isOptional
            help="Leave empty to judge Z alone; Re, We and splashing need it."
            error={errors.dropVelocityMetresPerSecond}
            {...bind('dropVelocityMetresPerSecond')}
          />
          <JettingWindowField error={errors.window} {...bind('window')} />
        </>
      }
      results={
        <ResultsPanel label="Jettability results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Oh" value={r?.ohnesorge} />
            <ResultValue label="Z" value={r?.z} />
            <ResultValue label="Re" value={r?.reynolds} />
            <ResultValue label="We" value={r?.weber} />
            <ResultValue
              label={
                <>
                  We<sup>½</sup>·Re<sup>¼</sup>
                </>
              }
              value={r?.splashParameter}
            />
          </ResultList>
          <JettingVerdict result={r} />
        </ResultsPanel>
      }
    />
  );
}
