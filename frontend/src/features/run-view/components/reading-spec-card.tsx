import { readingLimitsText, type ReadingSpec } from '@tracewright/shared';
import { numberText } from '@tracewright/shared';

import { useBench } from '../hooks/bench-context';
import { ReadingTarget } from './reading-target';

type ReadingSpecCardProps = { stepId: string; spec: ReadingSpec; tcrPerK: number | null; canRecord: boolean };

/** One reading the recipe asks for: its unit, limits and target, then an entry per piece when it is per piece. */
export function ReadingSpecCard({ stepId, spec, tcrPerK, canRecord }: ReadingSpecCardProps) {
  const { run } = useBench();
  const readings = run.readings.filter((r) => r.stepId === stepId && r.specId === spec.id);
  const targets = spec.perPiece ? run.pieces.map((p) => ({ id: p.id, code: p.code })) : [null];
  return (
    <section aria-label={`Reading: ${spec.name}`} className="flex flex-col gap-2 rounded-xl border-2 border-graphite-300 bg-white p-4">
      <h3 className="text-[1.5rem] font-bold">
        {spec.name} <span className="font-normal text-graphite-700">({spec.unit})</span>
      </h3>
      <p>
        Limits: <span className="font-bold tabular">{readingLimitsText(spec)}</span>
        {spec.target !== null ? (
          <>
            {' '}
            · target <span className="font-bold tabular">{numberText(spec.target)} {spec.unit}</span>
          </>
        ) : null}
        {spec.required ? ' · required' : ' · optional'}
        {spec.perPiece ? ' · for every piece' : ''}
      </p>
      {targets.map((piece) => (
        <ReadingTarget
          key={piece?.id ?? 'run'}
          stepId={stepId}
          spec={spec}
          piece={piece}
          readings={readings.filter((r) => r.pieceId === (piece?.id ?? null))}
          tcrPerK={tcrPerK}
          canRecord={canRecord}
        />
      ))}
    </section>
  );
}
