import { Link } from 'react-router';

import { formatNumber, type InkPrintability } from '@tracewright/shared';

type PrinterFit = InkPrintability['printers'][number];

/** The printer's name (a link to it) and the nozzle and speed the numbers were worked out for. */
export function PrinterHeading({ fit }: { fit: PrinterFit }) {
  return (
    <h3 className="text-lg font-bold">
      <Link to={`/equipment/printers/${fit.printerId}`} className="underline decoration-graphite-400 underline-offset-4 hover:text-copper-700">
        {fit.printerName}
      </Link>
      <span className="tabular ml-2 font-normal text-graphite-700">
        {formatNumber(fit.nozzleDiameterUm)} µm nozzle, {formatNumber(fit.jettingSpeedMetresPerSecond)} m/s
      </span>
    </h3>
  );
}
