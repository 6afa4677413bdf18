import { useIsFetching, useSuspenseQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';

import { labSettingsQueryOptions } from '../api/get-lab-settings';
import { runQueryOptions } from '../api/get-run';
import { runKeys } from '../api/run-keys';
import { PieceLabel } from '../components/piece-label';
import { PrintButton } from '../components/print-button';
import { PrintStyles } from '../components/print-styles';
import { RunPageToolbar } from '../components/run-page-toolbar';
import { runIdParam } from '../utils/run-id-param';

/** A sheet of small labels, one per piece: its code and a QR that opens the run at that piece. */
export function PieceLabelsPage() {
  const runId = runIdParam(useParams());
  const { data: run } = useSuspenseQuery(runQueryOptions(runId));
  const { data: settings } = useSuspenseQuery(labSettingsQueryOptions());
  const drawing = useIsFetching({ queryKey: runKeys.qrAll() });

  return (
    <>
      <title>{`Piece labels ${run.code} · Tracewright`}</title>
      <PrintStyles paperSize={settings.paperSize} />
      <RunPageToolbar back={{ to: `/runs/${run.id}/traveller`, label: `Traveller ${run.code}` }}>
        <PrintButton label="Print labels" isWaiting={drawing > 0} />
      </RunPageToolbar>
      <article data-print-root aria-labelledby="labels-title" className="flex flex-col gap-4">
        <h1 id="labels-title" className="text-2xl font-bold print:text-base">
          Piece labels, run {run.code}
        </h1>
        <ol aria-label="Labels, one per piece" className="grid grid-cols-2 gap-2 sm:grid-cols-3 print:grid-cols-3">
          {run.pieces.map((piece) => (
            <PieceLabel key={piece.id} run={run} pieceCode={piece.code} />
          ))}
        </ol>
      </article>
    </>
  );
}
