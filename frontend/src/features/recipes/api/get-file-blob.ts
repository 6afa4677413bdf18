import { queryOptions, useQuery } from '@tanstack/react-query';

import { recipeKeys } from './recipe-keys';

/** A stored file's bytes with the type the server sends (artwork thumbnails need both). */
export async function getFileBlob(id: number, signal?: AbortSignal): Promise<Blob> {
  const response = await fetch(new URL(`/api/files/${id}`, window.location.origin), { credentials: 'same-origin', signal });
  if (!response.ok) throw new Error(`File ${id} could not be loaded (${response.status}).`);
  return response.blob();
}

// Stored files never change under their id, so the blob can stay cached for the session.
export const fileBlobQueryOptions = (id: number) =>
  queryOptions({ queryKey: recipeKeys.file(id), queryFn: ({ signal }) => getFileBlob(id, signal), staleTime: Infinity });

export const useFileBlob = (id: number | null) => useQuery({ ...fileBlobQueryOptions(id ?? 0), enabled: id !== null });
