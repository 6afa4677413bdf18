import type { RunDetail } from '@tracewright/shared';

import { QrCodeImage } from './qr-code-image';

type TravellerHeadProps = { run: RunDetail; labName: string };

/** Title block with the run's QR at the top right: it encodes only the run's tablet address. */
export function TravellerHead({ run, labName }: TravellerHeadProps) {
  return (
    <div className="flex items-start justify-between gap-6 border-b-2 border-graphite-900 pb-4">
      <div className="flex flex-col gap-1">
        <p className="text-sm text-graphite-700">{labName} · Traveller</p>
        <h1 id="traveller-title" className="tabular text-4xl font-bold">
          Run {run.code}
        </h1>
        <p className="text-xl">
          <span className="font-bold">{run.recipeCode}</span> {run.recipeName}, version {run.versionNumber}
        </p>
      </div>
      <figure className="flex w-40 shrink-0 flex-col items-center gap-1 text-center">
        <QrCodeImage text={run.travellerUrl} alt={`QR code: opens run ${run.code} on a tablet`} className="size-36" />
        <figcaption className="text-xs text-graphite-700">
          Scan to open this run on a tablet
          <span className="mt-1 block break-all font-mono">{run.travellerUrl}</span>
        </figcaption>
      </figure>
    </div>
  );
}
