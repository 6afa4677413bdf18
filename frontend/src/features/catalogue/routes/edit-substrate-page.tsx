import { PageHeader } from '../../../components/ui/page-header';
import { SubstrateForm } from '../components/substrate-form';
import { useRecord } from './use-record';

export function EditSubstratePage() {
  const substrate = useRecord('substrates');
  return (
    <>
      <PageHeader title={`Edit ${substrate.name}`} description="Saved changes reach everyone at once; the audit log keeps the values they replace." />
      <SubstrateForm key={substrate.version} substrate={substrate} />
    </>
  );
}
