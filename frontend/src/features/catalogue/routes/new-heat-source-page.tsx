import { PageHeader } from '../../../components/ui/page-header';
import { HeatSourceForm } from '../components/heat-source-form';

export function NewHeatSourcePage() {
  return (
    <>
      <PageHeader title="New heat source" description="A calibration date makes its status show wherever it is used." />
      <HeatSourceForm />
    </>
  );
}
