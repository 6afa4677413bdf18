import { Link } from 'react-router';

import { formatNumber, type SubstrateWetting } from '@tracewright/shared';

import { DetailSection } from './detail-section';
import { WettingVerdict } from './wetting-verdict';

const HEAD = 'sticky top-0 bg-graphite-100 px-3 py-2 align-bottom font-bold';
const CELL = 'border-t border-graphite-200 px-3 py-2 align-top';
const num = (v: number | null) => (v === null ? '—' : formatNumber(v));

/** Every ink in use on this substrate, the widest margin first; an unknown margin goes last. */
export function SubstrateWettingTable({ wetting }: { wetting: SubstrateWetting }) {
  const inks = [...wetting.inks].sort((a, b) => (b.margin?.marginMilliNPerM ?? -Infinity) - (a.margin?.marginMilliNPerM ?? -Infinity));
  return (
    <DetailSection title="Inks on this surface">
      <p className="mb-3 max-w-prose text-graphite-700">
        Margin = surface energy − the ink’s surface tension. Wetting asks for at least {formatNumber(wetting.requiredMarginMilliNPerM)} mN/m (common
        practice, no published source).
      </p>
      {inks.length === 0 ? (
        <p className="text-graphite-700">No inks in use yet.</p>
      ) : (
        <div className="max-h-[70vh] overflow-auto rounded-md border border-graphite-300" tabIndex={0} role="region" aria-label="Inks on this surface, table">
          <table className="w-full border-collapse text-left">
            <caption className="sr-only">Inks on {wetting.substrateName}, sorted by wetting margin, widest first.</caption>
            <thead>
              <tr>
                <th scope="col" className={HEAD}>Ink</th>
                <th scope="col" className={`${HEAD} text-right`}>Surface tension (mN/m)</th>
                <th scope="col" className={`${HEAD} text-right`}>Margin (mN/m)</th>
                <th scope="col" className={`${HEAD} text-right`}>Predicted angle (°)</th>
                <th scope="col" className={HEAD}>Result</th>
                <th scope="col" className={HEAD}>Why</th>
              </tr>
            </thead>
            <tbody>
              {inks.map((ink) => (
                <tr key={ink.inkId}>
                  <th scope="row" className={`${CELL} min-w-44 font-bold`}>
                    <Link to={`/materials/inks/${ink.inkId}`} className="text-copper-700 underline underline-offset-4">
                      {ink.inkName}
                    </Link>
                  </th>
                  <td className={`${CELL} tabular text-right`}>{num(ink.inkSurfaceTensionMilliNPerM)}</td>
                  <td className={`${CELL} tabular text-right font-bold`}>{num(ink.margin?.marginMilliNPerM ?? null)}</td>
                  <td className={`${CELL} tabular text-right`}>{num(ink.predictedContactAngleDeg)}</td>
                  <td className={`${CELL} whitespace-nowrap`}>
                    <WettingVerdict margin={ink.margin} />
                  </td>
                  <td className={`${CELL} min-w-64 text-sm`}>{ink.reasons.join(' ')}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </DetailSection>
  );
}
