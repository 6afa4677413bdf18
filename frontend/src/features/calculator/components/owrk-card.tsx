import { DIIODOMETHANE_PROBE, owrkSurfaceEnergy, WATER_PROBE, type ProbeLiquid } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { CalcCard } from './calc-card';
import { NumberField } from './number-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const INITIAL = { waterAngleDeg: '', diiodomethaneAngleDeg: '' };

const probeText = (p: ProbeLiquid) => `${p.name} ${p.totalMilliNPerM} mN/m (${p.dispersiveMilliNPerM} dispersive + ${p.polarMilliNPerM} polar)`;

export function OwrkCard() {
  const { values, bind } = useCalcFields(INITIAL);
  const outcome = computeOutcome(values, (read) =>
    owrkSurfaceEnergy({ waterAngleDeg: read.number('waterAngleDeg'), diiodomethaneAngleDeg: read.number('diiodomethaneAngleDeg') }),
  );
  const r = outcome.result;
  const errors = outcome.fieldErrors;

  return (
    <CalcCard
      title="Surface energy of a solid"
      description="From the contact angles of water and diiodomethane measured on it."
      source={`Source: Owens & Wendt 1969 (OWRK). Probe liquids as the library states them: ${probeText(WATER_PROBE)}; ${probeText(DIIODOMETHANE_PROBE)}; ${WATER_PROBE.source}.`}
      fields={
        <>
          <NumberField label="Water contact angle" unit="°" error={errors.waterAngleDeg} {...bind('waterAngleDeg')} />
          <NumberField label="Diiodomethane contact angle" unit="°" error={errors.diiodomethaneAngleDeg} {...bind('diiodomethaneAngleDeg')} />
        </>
      }
      results={
        <ResultsPanel label="Surface energy results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Dispersive" value={r?.dispersiveMilliNPerM} unit="mN/m" />
            <ResultValue label="Polar" value={r?.polarMilliNPerM} unit="mN/m" />
            <ResultValue label="Total" value={r?.totalMilliNPerM} unit="mN/m" />
          </ResultList>
          <p className="text-sm text-graphite-700">A polar part of 0 can mean water beads more than the dispersive part explains.</p>
        </ResultsPanel>
      }
    />
  );
}
