import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';

import { DEFAULT_JETTING_WINDOW, JETTING_WINDOWS, type JettingWindowId } from '@tracewright/shared';

import { inkPrintabilityQueryOptions } from '../api/get-ink-printability';
import { DetailSection } from './detail-section';
import { PrinterJettingCard } from './printer-jetting-card';
import { WindowPicker } from './window-picker';

/** The ink through every printer in use, judged against the printable window the engineer picks. */
export function InkJetting({ inkId }: { inkId: number }) {
  const { data } = useSuspenseQuery(inkPrintabilityQueryOptions(inkId));
  const [windowId, setWindowId] = useState<JettingWindowId>(DEFAULT_JETTING_WINDOW);
  const jettable = data.printers.filter((p) => p.windows.find((w) => w.windowId === windowId)?.result.verdict === 'jettable').length;

  return (
    <DetailSection title="Jetting through each printer">
      {data.printers.length === 0 ? (
        <p className="text-graphite-700">No printers in use. Add one under Equipment to see how this ink jets.</p>
      ) : (
        <div className="flex flex-col gap-5">
          <WindowPicker value={windowId} defaultId={DEFAULT_JETTING_WINDOW} onChange={setWindowId} />
          <p role="status" className="font-bold">
            With {JETTING_WINDOWS[windowId].label}: jettable through {jettable} of {data.printers.length}{' '}
            {data.printers.length === 1 ? 'printer' : 'printers'}.
          </p>
          <ul className="flex flex-col gap-5">
            {data.printers.map((fit) => (
              <PrinterJettingCard key={fit.printerId} fit={fit} windowId={windowId} inkName={data.inkName} />
            ))}
          </ul>
        </div>
      )}
      <p className="mt-4 max-w-prose text-sm text-graphite-600">{data.solidsVolumeFractionNote}</p>
    </DetailSection>
  );
}
