import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { apiError, signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aDashboard } from '../testing/dashboard-fixtures';

const dashboardApi = () => http.get('/api/quality/dashboard', () => HttpResponse.json(aDashboard()));

describe('quality overview', () => {
  it('when the overview loads, then it lists runs awaiting sign-off, versions to review and weak capability, each linked', async () => {
    server.use(...signedInAs('quality'), dashboardApi());
    renderApp('/quality');

    const runs = within(await screen.findByRole('region', { name: 'Runs awaiting sign-off' }));
    expect(runs.getByRole('link', { name: 'R-2026-0041' })).toHaveAttribute('href', '/runs/41');
    expect(runs.getByRole('link', { name: 'R-2026-0044' })).toHaveAttribute('href', '/runs/44');
    expect(runs.getByText('1 undecided')).toBeInTheDocument();
    expect(runs.getByRole('button', { name: 'Sign off run R-2026-0044' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'TOUCH-4K version 5' })).toHaveAttribute('href', '/recipes/14/versions/61');
    expect(screen.getByRole('link', { name: 'LENS-HEAT-2: Trace resistance' })).toHaveAttribute('href', '/trends?recipeId=12&specId=trace-r-01');
    expect(screen.getByRole('link', { name: /1\s*Critical/ })).toHaveAttribute('href', '/deviations?state=open%2Cin-review%2Cdispositioned&severity=critical');
  });

  it('when sign-off is refused (409), then the dialog shows the refusal and why', async () => {
    const bodies: unknown[] = [];
    server.use(
      ...signedInAs('quality'),
      dashboardApi(),
      http.post('/api/runs/41/sign-off', async ({ request }) => {
        bodies.push(await request.json());
        return apiError(409, 'CONFLICT', 'Run R-2026-0041 cannot be signed off: deviation #31 has no disposition yet.');
      }),
    );
    const { user } = renderApp('/quality');

    await user.click(await screen.findByRole('button', { name: 'Sign off run R-2026-0041' }));
    const dialog = within(screen.getByRole('dialog', { name: 'Sign off run R-2026-0041' }));
    expect(dialog.getByText(/Run record reviewed and accepted/)).toBeInTheDocument();
    await user.type(dialog.getByLabelText('Your password'), 'bench-copper-7');
    await user.click(dialog.getByRole('button', { name: 'Sign off run' }));

    expect(await dialog.findByRole('alert')).toHaveTextContent('deviation #31 has no disposition yet');
    await waitFor(() => expect(bodies).toEqual([{ password: 'bench-copper-7' }]));
    expect(screen.getByRole('dialog')).toBeInTheDocument();
  });

  it('when an engineer opens the overview, then the lists show but no sign-off is offered', async () => {
    server.use(...signedInAs('engineer'), dashboardApi());
    renderApp('/quality');

    expect(await screen.findByRole('link', { name: 'R-2026-0041' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Sign off run/ })).not.toBeInTheDocument();
  });
});
