import type { QueryClient } from '@tanstack/react-query';

import { capturedMailsQueryOptions } from '../api/get-captured-mails';

export const outgoingMailLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(capturedMailsQueryOptions());
  return null;
};
