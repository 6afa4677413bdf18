import { PageHeader } from '../../../components/ui/page-header';
import { PrinterForm } from '../components/printer-form';

export function NewPrinterPage() {
  return (
    <>
      <PageHeader title="New printer" description="Units are shown with each field." />
      <PrinterForm />
    </>
  );
}
