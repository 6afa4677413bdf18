import { screen, waitFor, within } from '@testing-library/react';
import { http } from 'msw';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';

import { apiError } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { setBenchStore } from '../storage/bench-store-instance';
import { createMemoryBenchStore } from '../storage/memory-bench-store';
import { fakeRunApi } from '../testing/fake-run-api';
import { findStepHeading, SLOW } from '../testing/find-step-heading';
import { aRun, aStepRecord, CURE_STEP_ID } from '../testing/run-fixtures';

beforeEach(() => {
  setBenchStore(createMemoryBenchStore({ isDurable: true }));
  localStorage.clear();
});
afterEach(() => setBenchStore(null));

describe('run page: safety card', () => {
  it('when the step has cautions, then "Start step" stays disabled until they are acknowledged (and the acknowledgement is recorded)', async () => {
    const api = fakeRunApi(() => (api.recorded.length > 0 ? aRun({ steps: [aStepRecord(CURE_STEP_ID, { safetyAcknowledgedAt: '2026-12-02T10:00:01.000Z', safetyAcknowledgedBy: { id: 1, name: 'Robin Vale' } })] }) : aRun()));
    server.use(...api.handlers);
    const { user } = renderApp('/run/7');

    expect(await findStepHeading('Cure the silver heater trace')).toBeInTheDocument();
    const safety = screen.getByRole('region', { name: 'Safety first' });
    expect(within(safety).getByText(/Hot surface at 150 °C/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Start step' })).toBeDisabled();
    expect(screen.getByText('Acknowledge the cautions above first.')).toBeInTheDocument();

    await user.click(within(safety).getByRole('button', { name: 'I have read these cautions' }));

    expect(await within(safety).findByText(/Acknowledged by Robin Vale/, {}, SLOW)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Start step' })).toBeEnabled();
    await waitFor(() => expect(api.recorded.map((w) => w.path)).toEqual([`/api/runs/7/steps/${CURE_STEP_ID}/acknowledge-safety`]), SLOW);
    expect(api.recorded[0]?.body).toMatchObject({ noteCodes: ['hot-surface'], madeOffline: false });
  });

  it('when the run opens, then its step shows at once; when the operator moves on, then the next card slides in', async () => {
    const api = fakeRunApi(() => aRun());
    server.use(...api.handlers);
    const { user } = renderApp('/run/7');

    const first = (await findStepHeading('Cure the silver heater trace')).closest('article');
    // An entrance on the first card would only hold back the first useful paint.
    expect(first?.className).not.toMatch(/starting:opacity-0/);
    await user.click(screen.getByRole('button', { name: 'Next step' }));
    await waitFor(() => expect(screen.getByRole('article').className).toMatch(/starting:opacity-0/), SLOW);
    expect(screen.getByRole('article')).not.toBe(first);
  });

  it('when the person is not signed in, then the run page sends them to sign in and back to this run', async () => {
    server.use(http.get('/api/auth/session', () => apiError(401, 'UNAUTHENTICATED', 'Sign in to go on.')));
    const { router } = renderApp('/run/7');

    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'), SLOW);
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent('/run/7')}`);
  });
});
