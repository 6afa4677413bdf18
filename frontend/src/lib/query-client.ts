import { QueryClient, type DefaultOptions } from '@tanstack/react-query';

import { isApiError } from './api-error';

const DEFAULT_OPTIONS: DefaultOptions = {
  queries: {
    staleTime: 30_000,
    // A 4xx will answer the same again; only network trouble and 5xx deserve another try.
    retry: (failureCount, error) => failureCount < 2 && !(isApiError(error) && error.status >= 400 && error.status < 500),
  },
};

export function createQueryClient(overrides: DefaultOptions = {}): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { ...DEFAULT_OPTIONS.queries, ...overrides.queries },
      mutations: { ...DEFAULT_OPTIONS.mutations, ...overrides.mutations },
    },
  });
}
