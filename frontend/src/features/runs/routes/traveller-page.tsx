import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useParams } from 'react-router';

import { travellerSteps } from '@tracewright/shared';

import { buttonClasses } from '../../../components/ui/button-styles';
import { heatSourcesQueryOptions } from '../api/get-heat-sources';
import { labSettingsQueryOptions } from '../api/get-lab-settings';
import { qrCodeQueryOptions } from '../api/get-qr-code';
import { runQueryOptions } from '../api/get-run';
import { KeyCautions } from '../components/key-cautions';
import { PieceCodesList } from '../components/piece-codes-list';
import { PrintButton } from '../components/print-button';
import { PrintStyles } from '../components/print-styles';
import { RunMaterialsTables } from '../components/run-materials-tables';
import { RunPageToolbar } from '../components/run-page-toolbar';
import { SignOffTable } from '../components/sign-off-table';
import { TravellerFacts } from '../components/traveller-facts';
import { TravellerHead } from '../components/traveller-head';
import { TravellerStepCard } from '../components/traveller-step-card';
import { runIdParam } from '../utils/run-id-param';

export function TravellerPage() {
  const runId = runIdParam(useParams());
  const { data: run } = useSuspenseQuery(runQueryOptions(runId));
  const { data: settings } = useSuspenseQuery(labSettingsQueryOptions());
  const { data: heatSources } = useSuspenseQuery(heatSourcesQueryOptions(true));
  const qr = useQuery(qrCodeQueryOptions(run.travellerUrl));
  const [printedAt] = useState(() => new Date());
  const steps = travellerSteps(run.content.steps, { inks: run.inks, heatSources });

  return (
    <>
      <title>{`Traveller ${run.code} · Tracewright`}</title>
      <PrintStyles paperSize={settings.paperSize} />
      <RunPageToolbar back={{ to: `/runs/${run.id}`, label: `Run record ${run.code}` }}>
        <Link to={`/runs/${run.id}/labels`} className={buttonClasses('secondary')}>
          Piece labels
        </Link>
        <PrintButton label="Print traveller" isWaiting={qr.isPending} />
      </RunPageToolbar>
      <article data-print-root aria-labelledby="traveller-title" className="flex flex-col gap-6 rounded-md border border-graphite-300 bg-white p-6 print:border-0 print:p-0">
        <TravellerHead run={run} labName={settings.labName} />
        <TravellerFacts run={run} printedAt={printedAt} />
        <RunMaterialsTables run={run} />
        <PieceCodesList pieces={run.pieces} />
        {run.notes ? (
          <section aria-labelledby="traveller-notes-title">
            <h2 id="traveller-notes-title" className="text-lg font-bold">Notes</h2>
            <p className="whitespace-pre-line">{run.notes}</p>
          </section>
        ) : null}
        <KeyCautions steps={steps} />
        <section aria-labelledby="traveller-steps-title" className="flex flex-col gap-6">
          <h2 id="traveller-steps-title" className="text-2xl font-bold">Steps</h2>
          {steps.map((step) => (
            <TravellerStepCard key={step.stepId} step={step} pieces={run.pieces} />
          ))}
        </section>
        <section aria-labelledby="traveller-end-title" className="break-inside-avoid border-t-2 border-graphite-900 pt-3">
          <h2 id="traveller-end-title" className="mb-2 text-lg font-bold">Run finished</h2>
          <SignOffTable caption="Sign-off, whole run" rows={['All steps done']} />
        </section>
      </article>
    </>
  );
}
