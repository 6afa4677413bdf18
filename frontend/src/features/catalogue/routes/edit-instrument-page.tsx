import { PageHeader } from '../../../components/ui/page-header';
import { InstrumentForm } from '../components/instrument-form';
import { useRecord } from './use-record';

export function EditInstrumentPage() {
  const instrument = useRecord('instruments');
  return (
    <>
      <PageHeader title={`Edit ${instrument.name}`} description="Saved changes reach everyone at once; the audit log keeps the values they replace." />
      <InstrumentForm key={instrument.version} instrument={instrument} />
    </>
  );
}
