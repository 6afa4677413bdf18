import { useEffect, useMemo } from 'react';

/** Preview addresses for picked photos, released when the photos change or the view goes. */
export function useObjectUrls(files: readonly Blob[]): (string | null)[] {
  const urls = useMemo(() => files.map((file) => (typeof URL.createObjectURL === 'function' ? URL.createObjectURL(file) : null)), [files]);
  useEffect(
    () => () => {
      for (const url of urls) if (url) URL.revokeObjectURL(url);
    },
    [urls],
  );
  return urls;
}
