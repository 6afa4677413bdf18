import type { Trend } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { runRuleWords } from '../utils/run-rule-words';
import { signalPositions } from '../utils/trend-series';

/** Every rule break in words, by point number, run and piece, as marked on the chart. */
export function SignalList({ trend }: { trend: Trend }) {
  const signals = [...signalPositions(trend).entries()].sort(([a], [b]) => a - b);
  return (
    <div className="break-inside-avoid">
      <h3 className="mb-2 font-bold">Rule breaks</h3>
      {signals.length === 0 ? (
        <p className="text-graphite-700">No run rule is broken by the included points.</p>
      ) : (
        <ul className="flex flex-col gap-1">
          {signals.map(([position, rules]) => {
            const point = trend.points[position];
            return (
              <li key={position} className="flex items-start gap-2">
                <Icon name="warning" className="mt-0.5 size-5 text-oxide-700" />
                <span>
                  <span className="font-bold">Point {position + 1}</span> ({point?.runCode}
                  {point?.pieceCode ? `, ${point.pieceCode}` : ''}): {rules.map(runRuleWords).join('; ')}
                </span>
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
