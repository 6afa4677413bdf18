import { useMutation } from '@tanstack/react-query';

import { ApiErrorBodySchema, StoredFileSchema, type StoredFile } from '@tracewright/shared';

import { CSRF_COOKIE, CSRF_HEADER } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import { readCookie } from '../../../lib/cookies';

// apiClient sends JSON only; a file goes as multipart form data, with the same CSRF header.
export async function uploadArtwork(file: File): Promise<StoredFile> {
  const body = new FormData();
  body.append('file', file);
  const headers: Record<string, string> = { Accept: 'application/json' };
  const csrf = readCookie(CSRF_COOKIE);
  if (csrf) headers[CSRF_HEADER] = csrf;
  let response: Response;
  try {
    response = await fetch(new URL('/api/files/artwork', window.location.origin), { method: 'POST', headers, body, credentials: 'same-origin' });
  } catch {
    throw new ApiError(0, 'SERVICE_UNAVAILABLE', "Can't reach the server. Check the network connection and try again.");
  }
  const json: unknown = await response.json().catch(() => undefined);
  if (response.ok) return StoredFileSchema.parse(json);
  const parsed = ApiErrorBodySchema.safeParse(json);
  if (parsed.success) throw new ApiError(response.status, parsed.data.error.code, parsed.data.error.message, parsed.data.error.details);
  throw new ApiError(response.status, 'INTERNAL', `The upload failed (the server answered ${response.status}). Try again.`);
}

export function useUploadArtwork() {
  return useMutation({ mutationFn: uploadArtwork });
}
