import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import { auditEventsQueryOptions } from '../api/get-audit-events';
import { parseAuditSearch } from '../utils/audit-search';

export const auditLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const query = parseAuditSearch(new URL(request.url).searchParams);
    await queryClient.ensureQueryData(auditEventsQueryOptions(query));
    return null;
  };
