import { Notice } from '../../../components/ui/notice';
import { formatDateTime } from '../../../lib/format-date';
import { useBench } from '../hooks/bench-context';

/** A run on hold, or a run shown from the tablet's own copy, said in words at the top. */
export function RunBanners({ savedAt }: { savedAt: string }) {
  const { run, isFresh } = useBench();
  return (
    <>
      {run.state === 'on-hold' ? (
        <div className="px-4 pt-3">
          <Notice tone="warning" title="This run is on hold." role="status">
            {run.holdReason ? <p>Reason: {run.holdReason}</p> : null}
          </Notice>
        </div>
      ) : null}
      {!isFresh ? (
        <div className="px-4 pt-3">
          <Notice tone="info" title={`Showing the copy saved on this tablet at ${formatDateTime(savedAt)}.`} role="status">
            <p>What you record is kept here and sent, in order, when the server answers again.</p>
          </Notice>
        </div>
      ) : null}
    </>
  );
}
