import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';

import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { setBenchStore } from '../storage/bench-store-instance';
import { createMemoryBenchStore } from '../storage/memory-bench-store';
import { fakeRunApi } from '../testing/fake-run-api';
import { findStepHeading, SLOW } from '../testing/find-step-heading';
import { aRun, CURE_STEP_ID } from '../testing/run-fixtures';

beforeEach(() => setBenchStore(createMemoryBenchStore({ isDurable: true })));
afterEach(() => setBenchStore(null));

describe('run page: report a problem', () => {
  it('when a problem is reported with a camera photo, then the photo goes up first and the report names it, its pieces and severity', async () => {
    const api = fakeRunApi(() => aRun(), (write) => (write.path === '/api/files/photos' ? { id: 900 } : { id: 31 }));
    server.use(...api.handlers);
    const { user } = renderApp('/run/7');
    await findStepHeading('Cure the silver heater trace');

    await user.click(screen.getByRole('button', { name: 'Report a problem' }));
    const dialog = screen.getByRole('dialog', { name: 'Report a problem' });
    await user.type(within(dialog).getByLabelText('What happened?'), 'Trace lifted at the left bend');
    await user.click(within(dialog).getByRole('radio', { name: /Major/ }));
    await user.click(within(dialog).getByRole('checkbox', { name: 'R-2026-0007-02' }));
    await user.upload(within(dialog).getByLabelText('Take a photo'), new File(['jpeg'], 'bend.jpg', { type: 'image/jpeg' }));
    await user.click(within(dialog).getByRole('button', { name: 'Report the problem' }));

    await waitFor(() => expect(api.recorded.map((w) => w.path)).toEqual(['/api/files/photos', '/api/runs/7/problems']), SLOW);
    expect(api.recorded[1]?.body).toMatchObject({ stepId: CURE_STEP_ID, description: 'Trace lifted at the left bend', severity: 'major', pieceIds: [102], photoFileIds: [900] });
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
  });

  it('when the description is too short, then the form says so and nothing is kept', async () => {
    const api = fakeRunApi(() => aRun());
    server.use(...api.handlers);
    const { user } = renderApp('/run/7');
    await findStepHeading('Cure the silver heater trace');

    await user.click(screen.getByRole('button', { name: 'Report a problem' }));
    await user.click(screen.getByRole('button', { name: 'Report the problem' }));

    expect(await screen.findByText('Description needs at least 3 characters.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'All saved' })).toBeInTheDocument();
    expect(api.seen).toHaveLength(0);
  });
});
