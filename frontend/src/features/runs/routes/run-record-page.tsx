import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';

import { Notice } from '../../../components/ui/notice';
import { labSettingsQueryOptions } from '../api/get-lab-settings';
import { runQueryOptions } from '../api/get-run';
import { PieceCodesList } from '../components/piece-codes-list';
import { PrintButton } from '../components/print-button';
import { PrintStyles } from '../components/print-styles';
import { RecordDeviationsTable } from '../components/record-deviations-table';
import { RecordFacts } from '../components/record-facts';
import { RecordLinks } from '../components/record-links';
import { RecordStep } from '../components/record-step';
import { RunMaterialsTables } from '../components/run-materials-tables';
import { RunPageToolbar } from '../components/run-page-toolbar';
import { RunSignOffSection } from '../components/run-sign-off-section';
import { RunStateActions } from '../components/run-state-actions';
import { RunStateBadge } from '../components/run-state-badge';
import { runIdParam } from '../utils/run-id-param';

export function RunRecordPage() {
  const runId = runIdParam(useParams());
  const { data: run } = useSuspenseQuery(runQueryOptions(runId));
  const { data: settings } = useSuspenseQuery(labSettingsQueryOptions());
  const steps = run.content.steps;
  const stepTitleOf = (stepId: string | null) => {
    const index = steps.findIndex((s) => s.id === stepId);
    return index === -1 ? 'Whole run' : `${index + 1}. ${steps[index]?.title ?? ''}`;
  };

  return (
    <>
      <title>{`Run ${run.code} · Tracewright`}</title>
      <PrintStyles paperSize={settings.paperSize} />
      <RunPageToolbar back={{ to: '/runs', label: 'All runs' }}>
        <RecordLinks runId={run.id} state={run.state} />
        <PrintButton label="Print record" variant="secondary" />
      </RunPageToolbar>
      <article data-print-root aria-labelledby="record-title" className="flex flex-col gap-6">
        <div className="flex flex-col gap-2 border-b-2 border-graphite-900 pb-4">
          <p className="text-sm text-graphite-700">{settings.labName} · Run record</p>
          <div className="flex flex-wrap items-center gap-3">
            <h1 id="record-title" className="tabular text-3xl font-bold">
              Run {run.code}
            </h1>
            <RunStateBadge state={run.state} />
          </div>
          <p className="text-lg">
            <span className="font-bold">{run.recipeCode}</span> {run.recipeName}, version {run.versionNumber}
          </p>
        </div>
        {run.state === 'on-hold' && run.holdReason ? (
          <Notice tone="warning" title="This run is on hold.">
            <p>Reason: {run.holdReason}</p>
          </Notice>
        ) : null}
        <RecordFacts run={run} />
        <RunSignOffSection run={run} />
        <RunStateActions run={run} />
        {run.notes ? <p className="whitespace-pre-line">Notes: {run.notes}</p> : null}
        <RunMaterialsTables run={run} />
        <PieceCodesList pieces={run.pieces} />
        {run.deviations.length > 0 ? <RecordDeviationsTable caption="All deviations of this run" deviations={run.deviations} stepTitleOf={stepTitleOf} /> : null}
        <section aria-labelledby="record-steps-title" className="flex flex-col gap-6">
          <h2 id="record-steps-title" className="text-2xl font-bold">
            Steps, in order
          </h2>
          {steps.map((step, index) => (
            <RecordStep key={step.id} step={step} number={index + 1} run={run} />
          ))}
        </section>
      </article>
    </>
  );
}
