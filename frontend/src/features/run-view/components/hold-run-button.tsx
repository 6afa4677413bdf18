import { useState } from 'react';

import { useBench } from '../hooks/bench-context';
import { writeDrafts } from '../utils/write-drafts';
import { benchButton } from './bench-button-styles';
import { ReasonDialog } from './reason-dialog';

/** Stops work on the run with a reason (machine down, material missing); resuming is the action bar's. */
export function HoldRunButton() {
  const { run, record } = useBench();
  const [isAsking, setIsAsking] = useState(false);
  if (run.state !== 'in-progress') return null;
  return (
    <>
      <button type="button" className={benchButton('secondary')} onClick={() => setIsAsking(true)}>
        Put the run on hold
      </button>
      {isAsking ? (
        <ReasonDialog
          title="Put the run on hold"
          label="Why must work stop?"
          submitLabel="Put on hold"
          onClose={() => setIsAsking(false)}
          onSubmit={(reason) => {
            setIsAsking(false);
            void record(writeDrafts.holdRun(run.id, reason));
          }}
        />
      ) : null}
    </>
  );
}
