import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

import type { Guard } from '../../lib/route-guard';

/**
 * The free-entry process calculator. Open to everyone signed in (the shell checks the session),
 * so no role guard; it needs no data. Loaded lazily so its code is a chunk of its own.
 */
export function calculatorRoutes(_queryClient: QueryClient, _guarded: Guard): RouteObject[] {
  return [
    {
      path: 'calculator',
      lazy: async () => {
        const { CalculatorPage } = await import('./routes/calculator-page');
        return { Component: CalculatorPage };
      },
    },
  ];
}
