import { screen, within } from '@testing-library/react';
import { http } from 'msw';
import { describe, expect, it } from 'vitest';

import { apiError, signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { homeApis, quietWaiting } from '../../../../test/home-api';
import { aRunSummary } from '../../../../test/run-summary';

// Two runs in progress of an invented 8-step recipe.
const IN_PROGRESS = { state: 'in-progress', recipeCode: 'GRID-9', recipeName: 'Heater grid on TPU', totalSteps: 8 } as const;

describe('home page', () => {
  it('when an operator signs in, then the runs in progress are listed with their progress and the tablet is explained', async () => {
    const seen: string[] = [];
    server.use(
      ...signedInAs('operator'),
      ...homeApis(
        {
          'in-progress': { runs: [aRunSummary({ ...IN_PROGRESS, id: 7, code: 'R-2026-0007', doneSteps: 3 }), aRunSummary({ ...IN_PROGRESS, id: 9, code: 'R-2026-0009', doneSteps: 0, openDeviations: 2 })], total: 2 },
          'on-hold': { runs: [aRunSummary({ id: 5, state: 'on-hold' })], total: 1 },
        },
        quietWaiting(),
        seen,
      ),
    );
    renderApp('/');

    const floor = within(await screen.findByRole('region', { name: 'Runs on the floor' }));
    const list = within(await floor.findByRole('list', { name: 'Runs in progress' }));
    expect(list.getByRole('link', { name: 'R-2026-0007' })).toHaveAttribute('href', '/runs/7');
    expect(list.getByText('3 of 8 steps done')).toBeInTheDocument();
    expect(list.getByText('0 of 8 steps done · 2 open deviations')).toBeInTheDocument();
    expect(floor.getByRole('link', { name: '2 runs in progress' })).toHaveAttribute('href', '/runs?state=in-progress');
    expect(floor.getByRole('link', { name: '1 run on hold' })).toHaveAttribute('href', '/runs?state=on-hold');
    // Nothing planned: said, not linked.
    expect(floor.getByText('0 runs planned')).toBeInTheDocument();
    expect(floor.queryByRole('link', { name: /planned/ })).not.toBeInTheDocument();
    expect(floor.getByText(/scan the QR code on a run’s traveller/)).toBeInTheDocument();
    // Operators do not read the quality overview: it is neither shown nor asked for.
    expect(screen.queryByRole('region', { name: 'Waiting for a decision' })).not.toBeInTheDocument();
    // Five runs in progress are listed; on hold and planned are only counted.
    expect(seen.sort()).toEqual(['in-progress:5', 'on-hold:1', 'planned:1']);
  });

  it('when quality staff sign in, then what waits for their decision comes first, counted and linked', async () => {
    server.use(
      ...signedInAs('quality'),
      ...homeApis(
        {},
        quietWaiting({ deviationsNotClosed: 4, runsAwaitingSignOff: 1 }),
      ),
    );
    renderApp('/');

    const waiting = within(await screen.findByRole('region', { name: 'Waiting for a decision' }));
    expect(await waiting.findByRole('link', { name: '4 deviations not yet closed' })).toHaveAttribute('href', '/deviations?state=open%2Cin-review%2Cdispositioned');
    expect(waiting.getByRole('link', { name: '1 run awaiting sign-off' })).toHaveAttribute('href', '/quality');
    expect(waiting.getByText('0 recipe versions awaiting review')).toBeInTheDocument();
    const regions = screen.getAllByRole('region').map((r) => r.getAttribute('aria-labelledby') && document.getElementById(r.getAttribute('aria-labelledby') ?? '')?.textContent);
    expect(regions.slice(0, 2)).toEqual(['Waiting for a decision', 'Runs on the floor']);
    expect(await screen.findByText('No run is in progress.')).toBeInTheDocument();
  });

  it('when the page loads, then it lists exactly the pages the navigation offers the role, and nothing "to come"', async () => {
    server.use(...signedInAs('engineer'), ...homeApis());
    renderApp('/');

    const places = within(await screen.findByRole('region', { name: 'Where to find things' }));
    const nav = within(screen.getByRole('navigation', { name: 'Main' }));
    const navPages = nav.getAllByRole('link').map((link) => link.textContent).filter((name) => name !== 'Home');
    expect(places.getAllByRole('link').map((link) => link.textContent)).toEqual(navPages);
    expect(places.getByRole('link', { name: 'Calculator' })).toHaveAttribute('href', '/calculator');
    expect(places.queryByRole('link', { name: 'People' })).not.toBeInTheDocument();
    expect(screen.queryByText(/later release|still to come/i)).not.toBeInTheDocument();
  });

  it('when the runs cannot be read, then the page says so and still offers everything else', async () => {
    // The first handler for a path answers: the failing runs list goes before the defaults.
    server.use(...signedInAs('engineer'), http.get('/api/runs', () => apiError(503, 'SERVICE_UNAVAILABLE', 'The database is not answering.')), ...homeApis());
    renderApp('/');

    const floor = within(await screen.findByRole('region', { name: 'Runs on the floor' }));
    expect(await floor.findByText(/could not be loaded just now/)).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Where to find things' })).toBeInTheDocument();
  });
});
