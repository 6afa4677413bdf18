import { DetailSection } from './detail-section';

/** Photos from the bench, as thumbnails that open the full picture. */
export function DeviationPhotos({ fileIds, deviationId }: { fileIds: number[]; deviationId: number }) {
  if (fileIds.length === 0) return null;
  return (
    <DetailSection title="Photos">
      <ul className="flex flex-wrap gap-3">
        {fileIds.map((fileId, index) => {
          const alt = `Photo ${index + 1} of ${fileIds.length} from deviation #${deviationId}`;
          return (
            <li key={fileId}>
              <a href={`/api/files/${fileId}`} target="_blank" rel="noreferrer" className="block rounded-md border-2 border-graphite-300 hover:border-copper-600">
                <img src={`/api/files/${fileId}`} alt={alt} loading="lazy" className="size-36 rounded object-cover" />
                <span className="sr-only"> (opens full size in a new tab)</span>
              </a>
            </li>
          );
        })}
      </ul>
    </DetailSection>
  );
}
