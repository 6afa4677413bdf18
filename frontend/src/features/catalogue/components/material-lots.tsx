import { useSuspenseQuery } from '@tanstack/react-query';
import { Link } from 'react-router';

import type { LotView } from '@tracewright/shared';

import { recordsQueryOptions } from '../api/get-records';
import { DetailSection } from './detail-section';
import { LotFlags } from './lot-flags';

const HEAD = 'sticky top-0 bg-graphite-100 px-3 py-2 text-left font-bold whitespace-nowrap';
const CELL = 'border-t border-graphite-200 px-3 py-2 tabular';

type MaterialLotsProps = { materialType: LotView['materialType']; materialId: number; materialName: string };

/** The lots in use of one ink or substrate, with their flags as the bench will see them. */
export function MaterialLots({ materialType, materialId, materialName }: MaterialLotsProps) {
  const { data: allLots } = useSuspenseQuery(recordsQueryOptions('lots'));
  const lots = allLots.filter((lot) => lot.materialType === materialType && lot.materialId === materialId && !lot.archived);
  return (
    <DetailSection title="Lots">
      {lots.length === 0 ? (
        <p className="text-graphite-700">No lots of {materialName} in use.</p>
      ) : (
        <div className="overflow-x-auto rounded-md border border-graphite-300">
          <table className="w-full border-collapse">
            <caption className="sr-only">Lots of {materialName} in use, with their flags for today.</caption>
            <thead>
              <tr>
                <th scope="col" className={HEAD}>Lot number</th>
                <th scope="col" className={HEAD}>Received</th>
                <th scope="col" className={HEAD}>Opened</th>
                <th scope="col" className={HEAD}>Expires</th>
                <th scope="col" className={HEAD}>Flags</th>
              </tr>
            </thead>
            <tbody>
              {lots.map((lot) => (
                <tr key={lot.id}>
                  <th scope="row" className={`${CELL} text-left`}>
                    <Link to={`/materials/lots/${lot.id}`} className="font-bold text-copper-700 underline underline-offset-4">
                      {lot.lotNumber}
                    </Link>
                  </th>
                  <td className={`${CELL} tabular whitespace-nowrap`}>{lot.receivedOn}</td>
                  <td className={`${CELL} tabular whitespace-nowrap`}>{lot.openedOn ?? '—'}</td>
                  <td className={`${CELL} tabular whitespace-nowrap`}>{lot.expiresOn ?? '—'}</td>
                  <td className={CELL}>
                    <LotFlags status={lot.status} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </DetailSection>
  );
}
