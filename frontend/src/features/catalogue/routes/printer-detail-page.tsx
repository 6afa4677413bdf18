import { PrinterChannels } from '../components/printer-channels';
import { RecordDetailView } from '../components/record-detail-view';
import { formatValue } from '../utils/format-value';
import { useRecord } from './use-record';

export function PrinterDetailPage() {
  const printer = useRecord('printers');
  return (
    <RecordDetailView
      kind="printers"
      record={printer}
      title={printer.name}
      subtitle={printer.model ? `Inkjet printer, ${printer.model}` : 'Inkjet printer'}
      basePath="/equipment/printers"
      items={[
        { label: 'Nozzle diameter', value: formatValue(printer.nozzleDiameterUm), unit: 'µm' },
        { label: 'Drop volume', value: formatValue(printer.dropVolumePl), unit: 'pL' },
        { label: 'Typical jetting speed', value: formatValue(printer.jettingSpeedMetresPerSecond), unit: 'm/s' },
        { label: 'Native resolution', value: formatValue(printer.nativeDpi), unit: 'dpi' },
      ]}
    >
      <PrinterChannels printer={printer} />
    </RecordDetailView>
  );
}
