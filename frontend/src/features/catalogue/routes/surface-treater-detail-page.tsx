import { CalibrationStatus } from '../components/calibration-status';
import { RecordDetailView } from '../components/record-detail-view';
import { TREATMENT_METHOD_LABELS } from '../utils/catalogue-labels';
import { useRecord } from './use-record';

export function SurfaceTreaterDetailPage() {
  const treater = useRecord('surfaceTreaters');
  return (
    <RecordDetailView
      kind="surfaceTreaters"
      record={treater}
      title={treater.name}
      subtitle={`Surface treatment: ${TREATMENT_METHOD_LABELS[treater.method]}`}
      basePath="/equipment/surface-treaters"
      status={<CalibrationStatus status={treater.status} />}
      items={[
        { label: 'Method', value: TREATMENT_METHOD_LABELS[treater.method] },
        { label: 'Calibration due', value: treater.calibrationDueOn ?? 'Not tracked' },
      ]}
    />
  );
}
