import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import { tokenPreviewQueryOptions } from '../api/get-token-preview';

export const setPasswordLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(tokenPreviewQueryOptions(params.token ?? ''));
    return null;
  };
