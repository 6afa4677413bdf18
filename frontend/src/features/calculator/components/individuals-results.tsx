import type { IndividualsChart } from '@tracewright/shared';

import { signalText } from '../utils/signal-text';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';

/** Control-chart numbers for individuals and moving ranges, then each run-rule signal in words. */
export function IndividualsResults({ chart, unit }: { chart: IndividualsChart | null; unit?: string }) {
  return (
    <div className="flex flex-col gap-3">
      <h4 className="font-bold text-graphite-900">Individuals and moving range</h4>
      <ResultList>
        <ResultValue label="Mean" value={chart?.mean} unit={unit} />
        <ResultValue label="MR̄ (mean moving range)" value={chart?.movingRangeMean} unit={unit} />
        <ResultValue label="σ̂ = MR̄ ÷ 1.128" value={chart?.sigma} unit={unit} />
        <ResultValue label="UCL" value={chart?.ucl} unit={unit} />
        <ResultValue label="LCL" value={chart?.lcl} unit={unit} />
        <ResultValue label="MR UCL" value={chart?.movingRangeUcl} unit={unit} />
      </ResultList>
      {chart ? <Signals chart={chart} /> : null}
    </div>
  );
}

function Signals({ chart }: { chart: IndividualsChart }) {
  if (chart.signals.length === 0) return <p className="text-graphite-800">Run rules: no signals.</p>;
  return (
    <div>
      <p className="font-bold text-graphite-900">Run-rule signals</p>
      <ul aria-label="Run-rule signals" className="list-disc pl-5 text-graphite-800">
        {chart.signals.map((signal) => (
          <li key={`${signal.index}-${signal.rule}`}>{signalText(signal)}</li>
        ))}
      </ul>
    </div>
  );
}
