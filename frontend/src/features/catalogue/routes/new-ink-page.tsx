import { PageHeader } from '../../../components/ui/page-header';
import { InkForm } from '../components/ink-form';

export function NewInkPage() {
  return (
    <>
      <PageHeader title="New ink" description="Units are shown with each field; fields that say optional may stay empty." />
      <InkForm />
    </>
  );
}
