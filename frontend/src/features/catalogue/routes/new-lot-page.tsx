import { PageHeader } from '../../../components/ui/page-header';
import { LotForm } from '../components/lot-form';

export function NewLotPage() {
  return (
    <>
      <PageHeader title="New lot" description="Record a lot when it arrives; add the opening date when it is first opened." />
      <LotForm />
    </>
  );
}
