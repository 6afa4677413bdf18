import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';

import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { setBenchStore } from '../storage/bench-store-instance';
import { createMemoryBenchStore } from '../storage/memory-bench-store';
import { fakeRunApi } from '../testing/fake-run-api';
import { findStepHeading } from '../testing/find-step-heading';
import { aRun } from '../testing/run-fixtures';

beforeEach(() => setBenchStore(createMemoryBenchStore({ isDurable: true })));
afterEach(() => setBenchStore(null));

describe('scan page', () => {
  it('when the tablet gives no camera, then typing the run code from the traveller opens the run', async () => {
    let askedCode: string | null = null;
    server.use(
      ...fakeRunApi(() => aRun()).handlers,
      http.get('/api/runs', ({ request }) => {
        askedCode = new URL(request.url).searchParams.get('q');
        return HttpResponse.json({ runs: [aRun()], total: 1 });
      }),
    );
    const { user } = renderApp('/run/scan');

    expect(await screen.findByRole('heading', { name: 'Open a run' }, { timeout: 10_000 })).toBeInTheDocument();
    expect(await screen.findByText(/no camera here/)).toBeInTheDocument();
    await user.type(screen.getByLabelText('Type the run code'), 'r-2026-0007');
    await user.click(screen.getByRole('button', { name: 'Open run' }));

    expect(await findStepHeading('Cure the silver heater trace')).toBeInTheDocument();
    expect(askedCode).toBe('R-2026-0007');
  });

  it('when the code belongs to another site, then it is not followed and the operator is told why', async () => {
    server.use(...fakeRunApi(() => aRun()).handlers);
    const { user, router } = renderApp('/run/scan');

    await user.type(await screen.findByLabelText('Type the run code', {}, { timeout: 10_000 }), 'https://elsewhere.example/login');
    await user.click(screen.getByRole('button', { name: 'Open run' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('is not a run of this lab');
    expect(router.state.location.pathname).toBe('/run/scan');
  });
});
