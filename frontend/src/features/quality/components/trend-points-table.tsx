import { useState } from 'react';

import type { Trend } from '@tracewright/shared';

import { signalPositions } from '../utils/trend-series';
import { DetailSection } from './detail-section';
import { PointNoteDialog, type PointNoteMode } from './point-note-dialog';
import { TrendPointRow } from './trend-point-row';

const HEAD = 'sticky top-0 bg-graphite-100 px-2 py-1 font-bold';

/** The chart's points as a table: its text alternative, and where points are excluded or noted. */
export function TrendPointsTable({ trend, canEdit }: { trend: Trend; canEdit: boolean }) {
  const [editing, setEditing] = useState<{ index: number; mode: PointNoteMode } | null>(null);
  const signals = signalPositions(trend);
  const point = editing ? trend.points[editing.index] : undefined;

  return (
    <DetailSection title="Points">
      <div className="max-h-[60vh] overflow-auto rounded-md border border-graphite-300 bg-white print:max-h-none" tabIndex={0} role="region" aria-label="Points table">
        <table className="w-full border-collapse text-left">
          <caption className="sr-only">Every reading of the chart in time order, numbered as on the chart.</caption>
          <thead>
            <tr>
              <th scope="col" className={`${HEAD} text-right`}>Point</th>
              <th scope="col" className={HEAD}>Run</th>
              <th scope="col" className={HEAD}>Piece</th>
              <th scope="col" className={`${HEAD} text-right`}>Value ({trend.spec.unit})</th>
              <th scope="col" className={HEAD}>Recorded</th>
              <th scope="col" className={HEAD}>Status</th>
              <th scope="col" className={HEAD}>Note</th>
              {canEdit ? <th scope="col" className={`${HEAD} print:hidden`}>Change</th> : null}
            </tr>
          </thead>
          <tbody>
            {trend.points.map((p, i) => (
              <TrendPointRow key={p.readingId} point={p} position={i + 1} rules={signals.get(i)} canEdit={canEdit} onNote={(mode) => setEditing({ index: i, mode })} />
            ))}
          </tbody>
        </table>
      </div>
      {editing && point ? <PointNoteDialog point={point} position={editing.index + 1} unit={trend.spec.unit} mode={editing.mode} onClose={() => setEditing(null)} /> : null}
    </DetailSection>
  );
}
