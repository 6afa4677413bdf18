import type { RunDetail } from '@tracewright/shared';

import { pieceUrl } from '../utils/piece-url';
import { QrCodeImage } from './qr-code-image';

export function PieceLabel({ run, pieceCode }: { run: RunDetail; pieceCode: string }) {
  return (
    <li className="flex items-center gap-2 border border-graphite-900 bg-white p-2 break-inside-avoid">
      <QrCodeImage text={pieceUrl(run.travellerUrl, pieceCode)} alt={`QR code: opens piece ${pieceCode} on a tablet`} className="size-24 shrink-0" />
      <div className="min-w-0 text-sm">
        <p className="font-mono font-bold break-all">{pieceCode}</p>
        <p>
          {run.recipeCode} v{run.versionNumber}
        </p>
      </div>
    </li>
  );
}
