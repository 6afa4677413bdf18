import { PageHeader } from '../../../components/ui/page-header';
import { InstrumentForm } from '../components/instrument-form';

export function NewInstrumentPage() {
  return (
    <>
      <PageHeader title="New instrument" description="A calibration date makes its status show wherever it is used." />
      <InstrumentForm />
    </>
  );
}
