import { useState } from 'react';

import type { ReadingSpec } from '@tracewright/shared';

import { useBench } from '../hooks/bench-context';
import type { BenchReading } from '../utils/bench-run';
import { benchButton } from './bench-button-styles';
import { ReadingEntryForm } from './reading-entry-form';
import { ReadingRow } from './reading-row';

type ReadingTargetProps = { stepId: string; spec: ReadingSpec; piece: { id: number; code: string } | null; readings: BenchReading[]; tcrPerK: number | null; canRecord: boolean };

/** The readings of one spec for one piece (or the whole run), and the button to record one. */
export function ReadingTarget({ stepId, spec, piece, readings, tcrPerK, canRecord }: ReadingTargetProps) {
  const { isWorkable } = useBench();
  const [isEntering, setIsEntering] = useState(false);
  const hasCurrent = readings.some((r) => r.supersededById === null);
  return (
    <div className="flex flex-col gap-2 border-t border-graphite-200 pt-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        {piece ? <span className="font-bold">Piece {piece.code}</span> : null}
        {!hasCurrent ? <span className="text-graphite-700">Not recorded yet</span> : null}
        {!isEntering && isWorkable && canRecord ? (
          <button type="button" className={benchButton('secondary')} onClick={() => setIsEntering(true)} aria-label={`Record reading: ${spec.name}${piece ? `, piece ${piece.code}` : ''}`}>
            Record reading
          </button>
        ) : null}
      </div>
      {readings.length > 0 ? (
        <ul aria-label={`${spec.name}${piece ? ` for piece ${piece.code}` : ''}`}>
          {readings.map((r) => (
            <ReadingRow key={r.localRef ?? r.id} reading={r} spec={spec} tcrPerK={tcrPerK} />
          ))}
        </ul>
      ) : null}
      {isEntering ? <ReadingEntryForm stepId={stepId} spec={spec} piece={piece} tcrPerK={tcrPerK} onDone={() => setIsEntering(false)} /> : null}
    </div>
  );
}
