import { DISPOSITION_LABELS, type DeviationDetail } from '@tracewright/shared';

import { DetailSection } from './detail-section';
import { SignatureManifest } from '../../../components/signatures/signature-manifest';

type DispositionRecordsProps = { deviation: DeviationDetail };

/** Each signed disposition: what was decided, for which pieces, why, and the corrective action. */
export function DispositionRecords({ deviation }: DispositionRecordsProps) {
  if (deviation.dispositions.length === 0) return null;
  const codeOf = (id: number) => deviation.pieces.find((p) => p.id === id)?.code ?? `#${id}`;
  return (
    <DetailSection title="Dispositions">
      <ul className="flex flex-col gap-4">
        {deviation.dispositions.map((d) => (
          <li key={d.id} className="flex flex-col gap-2 rounded-md border-2 border-graphite-300 bg-white p-4">
            <p className="text-lg font-bold">{DISPOSITION_LABELS[d.disposition]}</p>
            <p>
              <span className="font-bold">Pieces: </span>
              {d.pieceIds.length > 0 ? d.pieceIds.map(codeOf).join(', ') : 'every piece the deviation names'}
            </p>
            {d.reworkRunId ? <p>Rework run #{d.reworkRunId}</p> : null}
            <p className="whitespace-pre-wrap">
              <span className="font-bold">Rationale: </span>
              {d.rationale}
            </p>
            {d.correctiveAction ? (
              <p>
                <span className="font-bold">Corrective action: </span>
                {d.correctiveAction.note} — owner {d.correctiveAction.owner?.name ?? 'not named'}, due {d.correctiveAction.dueOn}
                {d.correctiveAction.verifiedAt ? ', verified' : ', not verified yet'}
              </p>
            ) : null}
            <SignatureManifest signature={d.signature} />
          </li>
        ))}
      </ul>
    </DetailSection>
  );
}
