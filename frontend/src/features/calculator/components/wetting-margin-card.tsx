import { DEFAULT_WETTING_MARGIN_MILLI_N_PER_M, wettingMargin } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const INITIAL = {
  inkSurfaceTensionMilliNPerM: '',
  substrateSurfaceEnergyMilliNPerM: '',
  requiredMarginMilliNPerM: String(DEFAULT_WETTING_MARGIN_MILLI_N_PER_M),
};

export function WettingMarginCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) =>
    wettingMargin({
      inkSurfaceTensionMilliNPerM: read.number('inkSurfaceTensionMilliNPerM'),
      substrateSurfaceEnergyMilliNPerM: read.number('substrateSurfaceEnergyMilliNPerM'),
      requiredMarginMilliNPerM: read.number('requiredMarginMilliNPerM'),
    }),
  );
  const r = outcome.result;
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      title="Wetting margin"
      description="How far the substrate’s surface energy exceeds the ink’s surface tension."
      source="Source: the required margin is common practice, no source."
      fields={
        <>
          <NumberField label="Ink surface tension" unit="mN/m" error={errors.inkSurfaceTensionMilliNPerM} {...bind('inkSurfaceTensionMilliNPerM')} />
          <NumberField
            label="Substrate surface energy"
            unit="mN/m"
            error={errors.substrateSurfaceEnergyMilliNPerM}
            {...bind('substrateSurfaceEnergyMilliNPerM')}
          />
          <NumberField
            label="Required margin"
            unit="mN/m"
            help={`Default ${DEFAULT_WETTING_MARGIN_MILLI_N_PER_M} mN/m: common practice, no source.`}
            error={errors.requiredMarginMilliNPerM}
            {...bind('requiredMarginMilliNPerM')}
          />
        </>
      }
      results={
        <ResultsPanel label="Wetting margin results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Margin" value={r?.marginMilliNPerM} unit="mN/m" />
          </ResultList>
          {r ? (
            <p>
              <StatusBadge tone={r.ok ? 'pass' : 'warning'} label={r.ok ? 'Margin met' : 'Margin short: the ink may not wet'} />
            </p>
          ) : null}
        </ResultsPanel>
      }
    />
  );
}
