import { PageHeader } from '../../../components/ui/page-header';
import { SubstrateForm } from '../components/substrate-form';

export function NewSubstratePage() {
  return (
    <>
      <PageHeader title="New substrate" description="Units are shown with each field; fields that say optional may stay empty." />
      <SubstrateForm />
    </>
  );
}
