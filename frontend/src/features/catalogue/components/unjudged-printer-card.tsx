import type { InkPrintability } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { PrinterHeading } from './printer-heading';

type PrinterFit = InkPrintability['printers'][number];

/** A printer the server could not judge this ink against (a stored value is not physical). */
export function UnjudgedPrinterCard({ fit }: { fit: PrinterFit }) {
  return (
    <li className="flex flex-col gap-3 rounded-md border border-graphite-300 bg-white p-5">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <PrinterHeading fit={fit} />
        <StatusBadge tone="blocked" label="Cannot judge" />
      </div>
      <p>{fit.problem ?? 'No printable window could be judged for this printer.'}</p>
    </li>
  );
}
