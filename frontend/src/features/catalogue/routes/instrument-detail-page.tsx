import { CalibrationStatus } from '../components/calibration-status';
import { RecordDetailView } from '../components/record-detail-view';
import { INSTRUMENT_KIND_LABELS } from '../utils/catalogue-labels';
import { useRecord } from './use-record';

export function InstrumentDetailPage() {
  const instrument = useRecord('instruments');
  return (
    <RecordDetailView
      kind="instruments"
      record={instrument}
      title={instrument.name}
      subtitle={INSTRUMENT_KIND_LABELS[instrument.kind]}
      basePath="/equipment/instruments"
      status={<CalibrationStatus status={instrument.status} />}
      items={[
        { label: 'Kind', value: INSTRUMENT_KIND_LABELS[instrument.kind] },
        { label: 'Serial number', value: instrument.serialNumber || '—' },
        { label: 'Calibration due', value: instrument.calibrationDueOn ?? 'Not tracked' },
      ]}
    />
  );
}
