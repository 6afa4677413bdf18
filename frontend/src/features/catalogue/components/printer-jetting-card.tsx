import { formatNumber, JETTING_WINDOWS, MIN_EJECTION_WEBER, type InkPrintability, type JettingWindowId } from '@tracewright/shared';

import { JettingWindowChart } from '../../../components/charts/jetting-window-chart';
import { StatusBadge } from '../../../components/ui/status-badge';
import { VERDICT_WORDS } from '../utils/verdict-words';
import { JettingNumbers } from './jetting-numbers';
import { PrinterHeading } from './printer-heading';
import { UnjudgedPrinterCard } from './unjudged-printer-card';

type PrinterFit = InkPrintability['printers'][number];
type PrinterJettingCardProps = { fit: PrinterFit; windowId: JettingWindowId; inkName: string };

/** One printer: the verdict in words, its reasons, the numbers and the ink's point on the Z–We plane. */
export function PrinterJettingCard({ fit, windowId, inkName }: PrinterJettingCardProps) {
  const judged = fit.windows.find((w) => w.windowId === windowId) ?? fit.windows[0];
  if (!judged) return <UnjudgedPrinterCard fit={fit} />;
  const { result } = judged;
  const window = JETTING_WINDOWS[judged.windowId];
  const verdict = VERDICT_WORDS[result.verdict];
  const where =
    result.weber === null
      ? `Z = ${formatNumber(result.z)}; no jetting speed, so no We.`
      : `The point is at Z = ${formatNumber(result.z)}, We = ${formatNumber(result.weber)}.`;
  const description =
    `${where} The shaded band is the printable window ${window.label}; below the dashed line at We = ${MIN_EJECTION_WEBER} ` +
    `drops do not leave the nozzle. Verdict: ${verdict.label}.`;

  return (
    <li className="flex flex-col gap-4 rounded-md border border-graphite-300 bg-white p-5">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <PrinterHeading fit={fit} />
        <StatusBadge tone={verdict.tone} label={verdict.label} />
      </div>
      <div className="grid gap-6 lg:grid-cols-[1fr_auto]">
        <div className="flex flex-col gap-4">
          <JettingNumbers result={result} printerName={fit.printerName} />
          <div>
            <h4 className="font-bold">Why</h4>
            <ul className="mt-1 list-disc space-y-1 pl-5">
              {result.reasons.map((reason) => (
                <li key={reason}>{reason}</li>
              ))}
            </ul>
          </div>
        </div>
        <JettingWindowChart
          title={`${inkName} through ${fit.printerName}: Z–We plane`}
          point={{ z: result.z, we: result.weber }}
          window={{ zMin: window.zMin, zMax: window.zMax, label: window.label }}
          ejectionWeber={MIN_EJECTION_WEBER}
          description={description}
        />
      </div>
    </li>
  );
}
