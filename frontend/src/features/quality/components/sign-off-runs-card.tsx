import { useState } from 'react';

import type { QualityDashboard } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { StatusBadge } from '../../../components/ui/status-badge';
import { TextLink } from '../../../components/ui/text-link';
import { formatDateTime } from '../../../lib/format-date';
import { DashboardCard } from './dashboard-card';
import { SignOffDialog } from './sign-off-dialog';

type Run = QualityDashboard['runsAwaitingSignOff'][number];
const HEAD = 'border-b border-graphite-500 px-2 py-1';
const CELL = 'whitespace-nowrap border-b border-graphite-200 px-2 py-2 align-middle';

/** Finished runs whose record waits for a quality signature. */
export function SignOffRunsCard({ runs, canSign }: { runs: Run[]; canSign: boolean }) {
  const [signing, setSigning] = useState<Run | null>(null);
  return (
    <DashboardCard title="Runs awaiting sign-off" className="lg:col-span-2">
      {runs.length === 0 ? (
        <p className="text-graphite-700">No run is waiting for sign-off.</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full border-collapse text-left">
            <thead>
              <tr>
                <th scope="col" className={HEAD}>Run</th>
                <th scope="col" className={HEAD}>Recipe</th>
                <th scope="col" className={HEAD}>Completed</th>
                <th scope="col" className={HEAD}>Deviations</th>
                {canSign ? <th scope="col" className={HEAD}><span className="sr-only">Action</span></th> : null}
              </tr>
            </thead>
            <tbody>
              {runs.map((run) => (
                <tr key={run.id}>
                  <th scope="row" className={CELL}>
                    <TextLink to={`/runs/${run.id}`}>{run.code}</TextLink>
                  </th>
                  <td className={CELL}>{run.recipeCode}</td>
                  <td className={`${CELL} tabular`}>{run.completedAt ? formatDateTime(run.completedAt) : '—'}</td>
                  <td className={CELL}>{run.openDeviations > 0 ? <StatusBadge tone="warning" label={`${run.openDeviations} undecided`} /> : <StatusBadge tone="pass" label="All decided" />}</td>
                  {canSign ? (
                    <td className={CELL}>
                      <Button variant="secondary" onClick={() => setSigning(run)} aria-label={`Sign off run ${run.code}`}>
                        Sign off run
                      </Button>
                    </td>
                  ) : null}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {signing ? <SignOffDialog run={signing} onClose={() => setSigning(null)} /> : null}
    </DashboardCard>
  );
}
