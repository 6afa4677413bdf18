import { PageHeader } from '../../../components/ui/page-header';
import { SurfaceTreaterForm } from '../components/surface-treater-form';
import { useRecord } from './use-record';

export function EditSurfaceTreaterPage() {
  const treater = useRecord('surfaceTreaters');
  return (
    <>
      <PageHeader title={`Edit ${treater.name}`} description="Saved changes reach everyone at once; the audit log keeps the values they replace." />
      <SurfaceTreaterForm key={treater.version} treater={treater} />
    </>
  );
}
