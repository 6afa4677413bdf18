import { gaugeFactorFit } from '@tracewright/shared';

import { useCalcFields } from '../hooks/use-calc-fields';
import { computeOutcome } from '../utils/compute-outcome';
import { parsePairLines } from '../utils/parse-pair-lines';
import { percentToFraction } from '../utils/percent';
import { CalcCard } from './calc-card';
import { PasteField } from './paste-field';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';
import { ResultsPanel } from './results-panel';

const R0_FROM = {
  measured: 'R₀ is the reading at 0 % strain (the mean if there are several).',
  'fit-intercept': 'No reading at 0 % strain: R₀ is where the fitted line meets 0 %.',
} as const;

const parsePoints = (raw: string) => parsePairLines(raw, ['strain %', 'Ω']);

export function GaugeFactorCard() {
  const { values, bind } = useCalcFields({ points: '' });
  const outcome = computeOutcome(values, (read) => {
    const pairs = read.parsed('points', parsePoints, []);
    return gaugeFactorFit(pairs.map(([percent, ohm]) => ({ strain: percentToFraction(percent), ohm })));
  });
  const r = outcome.result;

  return (
    <CalcCard
      title="Gauge factor"
      description="How strongly resistance follows strain, fitted to your readings."
      source="Source: GF = (ΔR/R₀)/ε, least-squares slope of ΔR/R₀ against strain."
      fields={
        <PasteField
          label="Readings (strain %, Ω per line)"
          help="One reading per line, such as “10, 12.1”. Paste straight from a spreadsheet."
          error={outcome.fieldErrors.points}
          {...bind('points')}
        />
      }
      results={
        <ResultsPanel label="Gauge factor results" outcome={outcome}>
          <ResultList>
            <ResultValue label="Gauge factor" value={r?.gaugeFactor} />
            <ResultValue label="R₀" value={r?.unstrainedOhm} unit="Ω" />
          </ResultList>
          {r ? <p className="text-sm text-graphite-700">{R0_FROM[r.unstrainedOhmFrom]}</p> : null}
        </ResultsPanel>
      }
    />
  );
}
