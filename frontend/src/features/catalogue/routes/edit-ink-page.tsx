import { PageHeader } from '../../../components/ui/page-header';
import { InkForm } from '../components/ink-form';
import { useRecord } from './use-record';

export function EditInkPage() {
  const ink = useRecord('inks');
  return (
    <>
      <PageHeader title={`Edit ${ink.name}`} description="Saved changes reach everyone at once; the audit log keeps the values they replace." />
      <InkForm key={ink.version} ink={ink} />
    </>
  );
}
