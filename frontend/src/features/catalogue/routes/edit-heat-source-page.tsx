import { PageHeader } from '../../../components/ui/page-header';
import { HeatSourceForm } from '../components/heat-source-form';
import { useRecord } from './use-record';

export function EditHeatSourcePage() {
  const source = useRecord('heatSources');
  return (
    <>
      <PageHeader title={`Edit ${source.name}`} description="Saved changes reach everyone at once; the audit log keeps the values they replace." />
      <HeatSourceForm key={source.version} source={source} />
    </>
  );
}
