import { PageHeader } from '../../../components/ui/page-header';
import { SurfaceTreaterForm } from '../components/surface-treater-form';

export function NewSurfaceTreaterPage() {
  return (
    <>
      <PageHeader title="New surface treater" description="A calibration date makes its status show wherever it is used." />
      <SurfaceTreaterForm />
    </>
  );
}
