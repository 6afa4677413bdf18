import { useState } from 'react';

import type { StepRecordView } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { useBench } from '../hooks/bench-context';
import { matchLot } from '../utils/lot-match';
import { writeDrafts } from '../utils/write-drafts';
import { BenchIcon } from './bench-icon';
import { benchButton } from './bench-button-styles';
import { QrScanner } from './qr-scanner';

type LotConfirmPanelProps = { stepId: string; inkId: number; inkName: string; record: StepRecordView; canRecord: boolean };

const FLAG_WORDS: Record<string, string> = { expired: 'Expired', 'past-pot-life': 'Past pot life' };

/** The ink lot in the cartridge, confirmed at the point of use: picked from the run's lots or scanned from its label. */
export function LotConfirmPanel({ stepId, inkId, inkName, record, canRecord }: LotConfirmPanelProps) {
  const { run, record: keep, isWorkable } = useBench();
  const [isScanning, setIsScanning] = useState(false);
  const [scanProblem, setScanProblem] = useState<string | null>(null);
  const lots = run.lots.filter((lot) => lot.materialType === 'ink' && lot.materialId === inkId);
  const canConfirm = isWorkable && canRecord;

  const confirm = (lotId: number) => void keep(writeDrafts.confirmLot(run.id, stepId, lotId));
  const onScan = (text: string) => {
    setIsScanning(false);
    const lot = matchLot(text, lots);
    if (!lot) return setScanProblem(`The label says “${text}”, which is not a lot of ${inkName} planned for this run. Check the cartridge, or pick the lot below.`);
    setScanProblem(null);
    if (!record.confirmedLotIds.includes(lot.lotId)) confirm(lot.lotId);
  };

  return (
    <section aria-labelledby={`lot-${stepId}`} className="flex flex-col gap-3 rounded-xl border-2 border-graphite-300 bg-white p-4">
      <h2 id={`lot-${stepId}`} className="text-[1.5rem] font-bold">
        Ink lot: {inkName}
      </h2>
      {lots.length === 0 ? <p>No lot of {inkName} was planned for this run. Report a problem if you are using one.</p> : null}
      <ul className="flex flex-col gap-2">
        {lots.map((lot) => {
          const isConfirmed = record.confirmedLotIds.includes(lot.lotId);
          return (
            <li key={lot.lotId} className="flex flex-wrap items-center gap-3">
              <span className="text-[1.5rem] font-bold tabular">{lot.lotNumber}</span>
              {lot.flags.map((flag) => (
                <span key={flag} className="inline-flex items-center gap-1 font-bold text-oxide-700">
                  <Icon name="warning" className="size-5" />
                  {FLAG_WORDS[flag] ?? flag}
                </span>
              ))}
              {isConfirmed ? (
                <span className="inline-flex items-center gap-1 font-bold text-verdigris-800">
                  <Icon name="check" className="size-5" />
                  Confirmed
                </span>
              ) : canConfirm ? (
                <button type="button" className={benchButton('secondary')} onClick={() => confirm(lot.lotId)} aria-label={`Confirm lot ${lot.lotNumber}`}>
                  This lot is in use
                </button>
              ) : null}
            </li>
          );
        })}
      </ul>
      {canConfirm && lots.length > 0 ? (
        <button type="button" className={benchButton('secondary', 'self-start')} onClick={() => setIsScanning((v) => !v)} aria-expanded={isScanning}>
          <BenchIcon name="qr" />
          {isScanning ? 'Stop scanning' : 'Scan the lot label'}
        </button>
      ) : null}
      {isScanning ? <QrScanner label="Camera picture for the lot label" onResult={onScan} /> : null}
      {scanProblem ? <p role="alert" className="font-bold text-oxide-700">{scanProblem}</p> : null}
    </section>
  );
}
