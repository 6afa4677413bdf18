import { TextLink } from '../../../components/ui/text-link';
import { Notice } from '../../../components/ui/notice';
import { DetailSection } from '../components/detail-section';
import { LotFlags } from '../components/lot-flags';
import { RecordDetailView } from '../components/record-detail-view';
import { useRecord } from './use-record';

export function LotDetailPage() {
  const lot = useRecord('lots');
  const materialPath = `/materials/${lot.materialType === 'ink' ? 'inks' : 'substrates'}/${lot.materialId}`;
  return (
    <RecordDetailView
      kind="lots"
      record={lot}
      title={`Lot ${lot.lotNumber}`}
      subtitle={`${lot.materialType === 'ink' ? 'Ink' : 'Substrate'}: ${lot.materialName}`}
      basePath="/materials/lots"
      status={
        <DetailSection title="Flags today">
          <div className="flex flex-col gap-3">
            <LotFlags status={lot.status} />
            {lot.status.messages.length > 0 ? (
              <Notice tone="warning" title="This lot is flagged.">
                <ul className="list-disc pl-5">
                  {lot.status.messages.map((m) => (
                    <li key={m}>{m}</li>
                  ))}
                </ul>
              </Notice>
            ) : null}
          </div>
        </DetailSection>
      }
      items={[
        { label: 'Material', value: <TextLink to={materialPath}>{lot.materialName}</TextLink> },
        { label: 'Received', value: lot.receivedOn },
        { label: 'Opened', value: lot.openedOn ?? 'Not yet' },
        { label: 'Expires', value: lot.expiresOn ?? 'No expiry date recorded' },
      ]}
    />
  );
}
