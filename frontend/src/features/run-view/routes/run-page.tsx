import { useSyncExternalStore } from 'react';
import { useLoaderData, useParams } from 'react-router';

import { LoadingState } from '../../../components/ui/loading-state';
import { useSession } from '../../../lib/session';
import { OutboxContext } from '../hooks/outbox-context';
import { useBenchOutbox } from '../hooks/use-bench-outbox';
import type { RunLoaderData } from './run-loader';
import { RunScreen } from './run-screen';

/** /run/:runId — the tablet view of a run, full screen, outside the desk shell. */
export function RunPage() {
  const runId = Number(useParams().runId);
  const { user } = useSession();
  const loaded = useLoaderData<RunLoaderData | null>();
  const outbox = useBenchOutbox(user, loaded?.writes ?? null);
  const isLoaded = useSyncExternalStore(outbox.subscribe, () => outbox.getState().isLoaded);
  return (
    <OutboxContext.Provider value={outbox}>
      {/* Never show the run without the writes kept on this tablet: it would look as if they were lost. */}
      {isLoaded ? <RunScreen runId={runId} /> : <LoadingState label="Opening what is saved on this tablet…" />}
    </OutboxContext.Provider>
  );
}
