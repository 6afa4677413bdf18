import { onlineManager } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';

import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { setBenchStore } from '../storage/bench-store-instance';
import { createMemoryBenchStore } from '../storage/memory-bench-store';
import { fakeRunApi } from '../testing/fake-run-api';
import { findStepHeading, SLOW } from '../testing/find-step-heading';
import { restoreBrowserOnline, setBrowserOnline } from '../testing/network';
import { aRun, CURE_STEP_ID } from '../testing/run-fixtures';

const store = () => createMemoryBenchStore({ isDurable: true });

beforeEach(() => localStorage.clear());
afterEach(() => {
  setBenchStore(null);
  restoreBrowserOnline();
  onlineManager.setOnline(true);
});

describe('run page: lost Wi-Fi', () => {
  it('when the tablet goes offline, then writes show at once, wait in the outbox, survive a reload and go out once when back online', async () => {
    // One store for both page loads: it stands in for IndexedDB, which outlives a reload.
    setBenchStore(store());
    const api = fakeRunApi(() => aRun());
    server.use(...api.handlers);
    const first = renderApp('/run/7');
    expect(await findStepHeading('Cure the silver heater trace')).toBeInTheDocument();

    api.state.isOffline = true;
    setBrowserOnline(false);
    await first.user.click(screen.getByRole('button', { name: 'I have read these cautions' }));
    await first.user.click(screen.getByRole('button', { name: 'Start step' }));

    expect(await screen.findByRole('button', { name: '2 writes waiting' }, SLOW)).toBeInTheDocument();
    expect(screen.getByText('Offline')).toBeInTheDocument();
    expect(screen.getByText('In progress')).toBeInTheDocument();

    // Reload while still offline: the run comes from the tablet's copy, the writes from the outbox.
    first.unmount();
    // A reloaded page starts with TanStack Query's network state fresh (online until told).
    onlineManager.setOnline(true);
    const second = renderApp('/run/7');
    expect(await findStepHeading('Cure the silver heater trace')).toBeInTheDocument();
    expect(screen.getByText(/Showing the copy saved on this tablet/)).toBeInTheDocument();
    // The page waits for the outbox, so the kept writes are on screen from the first frame.
    expect(screen.getByRole('button', { name: '2 writes waiting' })).toBeInTheDocument();
    expect(within(screen.getByRole('region', { name: 'Safety first' })).getByText(/Acknowledged by Robin Vale/)).toBeInTheDocument();
    expect(api.seen).toHaveLength(0);

    api.state.isOffline = false;
    setBrowserOnline(true);

    await waitFor(() => expect(api.recorded.map((w) => w.path)).toEqual([`/api/runs/7/steps/${CURE_STEP_ID}/acknowledge-safety`, `/api/runs/7/steps/${CURE_STEP_ID}/start`]), SLOW);
    expect(new Set(api.seen.map((w) => w.key)).size).toBe(2);
    expect(api.recorded.every((w) => (w.body as { madeOffline: boolean }).madeOffline)).toBe(true);
    expect(await screen.findByRole('button', { name: 'All saved' }, SLOW)).toBeInTheDocument();
    second.unmount();
  });
});
