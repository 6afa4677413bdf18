import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';

import { ToastProvider } from '../components/ui/toast-provider';

type AppProviderProps = { queryClient: QueryClient; children: ReactNode };

/** App-wide context. The query client comes in from outside so tests can give each test its own. */
export function AppProvider({ queryClient, children }: AppProviderProps) {
  return (
    <QueryClientProvider client={queryClient}>
      <ToastProvider>{children}</ToastProvider>
    </QueryClientProvider>
  );
}
