import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aRunSummary } from '../testing/run-fixtures';

const RUNS = [
  aRunSummary({ id: 41, code: 'R-2026-0041', state: 'in-progress', doneSteps: 1, totalSteps: 3 }),
  aRunSummary({ id: 42, code: 'R-2026-0042', state: 'on-hold', openDeviations: 2 }),
];

/** The API filters by state; the page must ask for it, not filter what it already has. */
function runsApi(asked: URLSearchParams[]) {
  return http.get('/api/runs', ({ request }) => {
    const params = new URL(request.url).searchParams;
    asked.push(params);
    const runs = RUNS.filter((run) => !params.get('state') || run.state === params.get('state'));
    return HttpResponse.json({ runs, total: runs.length });
  });
}

const rowOf = (code: string) => screen.getByRole('rowheader', { name: code }).closest('tr') as HTMLElement;

describe('runs page', () => {
  it('when a state is chosen, then the list asks the API for that state and shows only those runs', async () => {
    const asked: URLSearchParams[] = [];
    server.use(...signedInAs('engineer'), runsApi(asked));
    const { user, router } = renderApp('/runs');

    expect(await screen.findByRole('link', { name: 'R-2026-0041' })).toBeInTheDocument();
    await user.selectOptions(screen.getByLabelText('State'), 'On hold');

    await waitFor(() => expect(screen.queryByRole('link', { name: 'R-2026-0041' })).not.toBeInTheDocument());
    expect(asked.at(-1)?.get('state')).toBe('on-hold');
    expect(router.state.location.search).toBe('?state=on-hold');
    expect(within(rowOf('R-2026-0042')).getByText('On hold')).toBeInTheDocument();
    expect(within(rowOf('R-2026-0042')).getByText('2 not closed')).toBeInTheDocument();
    expect(screen.getByText('Runs 1–1 of 1')).toBeInTheDocument();
  });

  it('when text is searched, then it goes to the API as q from the first page', async () => {
    const asked: URLSearchParams[] = [];
    server.use(...signedInAs('engineer'), runsApi(asked));
    const { user } = renderApp('/runs?page=3');

    await user.type(await screen.findByLabelText('Run or recipe'), ' TRACE-1 {Enter}');

    await waitFor(() => expect(asked.at(-1)?.get('q')).toBe('TRACE-1'));
    expect(asked.at(-1)?.get('page')).toBe('1');
  });

  it('when an engineer opens the list, then "Plan a run" is offered; an operator is not offered it', async () => {
    server.use(...signedInAs('engineer'), runsApi([]));
    const first = renderApp('/runs');
    expect(await screen.findByRole('link', { name: 'Plan a run' })).toHaveAttribute('href', '/runs/new');
    first.unmount();

    server.use(...signedInAs('operator'));
    renderApp('/runs');
    expect(await screen.findByRole('link', { name: 'R-2026-0041' })).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Plan a run' })).not.toBeInTheDocument();
  });
});
