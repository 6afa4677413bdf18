import { PageHeader } from '../../../components/ui/page-header';
import { LotForm } from '../components/lot-form';
import { useRecord } from './use-record';

export function EditLotPage() {
  const lot = useRecord('lots');
  return (
    <>
      <PageHeader title={`Edit lot ${lot.lotNumber}`} description={`${lot.materialName}. Saved changes reach everyone at once.`} />
      <LotForm key={lot.version} lot={lot} />
    </>
  );
}
