import { PageHeader } from '../../../components/ui/page-header';
import { PrinterForm } from '../components/printer-form';
import { useRecord } from './use-record';

export function EditPrinterPage() {
  const printer = useRecord('printers');
  return (
    <>
      <PageHeader title={`Edit ${printer.name}`} description="Saved changes reach everyone at once; the audit log keeps the values they replace." />
      <PrinterForm key={printer.version} printer={printer} />
    </>
  );
}
