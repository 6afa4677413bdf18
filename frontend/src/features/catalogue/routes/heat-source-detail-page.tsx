import { CalibrationStatus } from '../components/calibration-status';
import { RecordDetailView } from '../components/record-detail-view';
import { HEAT_SOURCE_KIND_LABELS } from '../utils/catalogue-labels';
import { formatValue } from '../utils/format-value';
import { useRecord } from './use-record';

export function HeatSourceDetailPage() {
  const source = useRecord('heatSources');
  return (
    <RecordDetailView
      kind="heatSources"
      record={source}
      title={source.name}
      subtitle={HEAT_SOURCE_KIND_LABELS[source.kind]}
      basePath="/equipment/heat-sources"
      status={<CalibrationStatus status={source.status} />}
      items={[
        { label: 'Kind', value: HEAT_SOURCE_KIND_LABELS[source.kind] },
        { label: 'Maximum temperature', value: formatValue(source.maxTempC), unit: '°C' },
        { label: 'Calibration due', value: source.calibrationDueOn ?? 'Not tracked' },
      ]}
    />
  );
}
