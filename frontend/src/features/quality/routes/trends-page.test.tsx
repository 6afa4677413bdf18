import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import type { Trend } from '@tracewright/shared';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aTrend, TREND_SPECS } from '../testing/trend-fixtures';

function trendsApi(trend: Trend, asked: URLSearchParams[] = []) {
  return [
    http.get('/api/trends/specs', () => HttpResponse.json(TREND_SPECS)),
    http.get('/api/trends', ({ request }) => {
      asked.push(new URL(request.url).searchParams);
      return HttpResponse.json(trend);
    }),
  ];
}

const capabilityValue = (label: string) => within(screen.getByRole('region', { name: 'Capability' })).getByText(label).nextElementSibling;

describe('trends page', () => {
  it('when a spec is picked, then the API is asked for it and its capability, "provisional" and charts are shown', async () => {
    const asked: URLSearchParams[] = [];
    server.use(...signedInAs('engineer'), ...trendsApi(aTrend(), asked));
    const { user, router } = renderApp('/trends');

    await user.selectOptions(await screen.findByLabelText('Reading spec'), 'Trace resistance (Ω) · 12 points');

    expect(await screen.findByRole('heading', { name: 'LENS-HEAT-2: Trace resistance' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?recipeId=12&specId=trace-r-01');
    expect(asked.at(-1)?.get('specId')).toBe('trace-r-01');
    expect(capabilityValue('Cp')).toHaveTextContent('1.21');
    expect(capabilityValue('Cpk')).toHaveTextContent('0.98');
    expect(capabilityValue('Pp')).toHaveTextContent('1.17');
    expect(capabilityValue('Ppk')).toHaveTextContent('0.95');
    expect(capabilityValue('Points')).toHaveTextContent('12');
    expect(screen.getByText('Provisional: below 20 points')).toBeInTheDocument();

    for (const name of ['Individuals: Trace resistance (Ω)', 'Moving range (Ω)', 'Spread against the spec limits']) {
      expect(screen.getByRole('figure', { name }).querySelector('svg.recharts-surface')).not.toBeNull();
    }
    expect(screen.getByRole('figure', { name: 'Individuals: Trace resistance (Ω)' })).toHaveAccessibleDescription(/12 readings in time order.*1 rule break/);
    expect(document.querySelectorAll('.control-chart-signal')).toHaveLength(1);
    expect(screen.getByText(/2 of 3 points beyond 2σ on one side/)).toHaveTextContent('Point 11 (R-2026-0043, P-03)');
  });

  it('when the address names a spec the list does not have, then the page says so and offers the list, without asking for its trend', async () => {
    const asked: URLSearchParams[] = [];
    server.use(...signedInAs('quality'), ...trendsApi(aTrend(), asked));
    renderApp('/trends?recipeId=12&specId=gone-01');

    expect(await screen.findByText('That reading spec has no trend here.')).toBeInTheDocument();
    expect(screen.getByLabelText('Reading spec')).toBeInTheDocument();
    expect(screen.queryByRole('heading', { name: /Trace resistance/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Print' })).not.toBeInTheDocument();
    // The loader asks early, before the list is in; the page never asks again or shows the answer.
    expect(asked.length).toBeLessThanOrEqual(1);
  });

  it('when the spec has only an upper limit, then Cp and Pp read "—" and enough points drop "provisional"', async () => {
    const oneSided = aTrend({
      spec: { id: 'trace-r-01', name: 'Trace resistance', unit: 'Ω', target: null, lowerLimit: null, upperLimit: 12 },
      capability: { n: 24, mean: 10.4, sigmaWithin: 0.5, sigmaOverall: 0.6, cp: null, cpk: 1.07, pp: null, ppk: 0.89 },
      isProvisional: false,
    });
    server.use(...signedInAs('quality'), ...trendsApi(oneSided));
    renderApp('/trends?recipeId=12&specId=trace-r-01');

    expect(await screen.findByRole('heading', { name: 'LENS-HEAT-2: Trace resistance' })).toBeInTheDocument();
    expect(capabilityValue('Cp')).toHaveTextContent('—');
    expect(capabilityValue('Pp')).toHaveTextContent('—');
    expect(capabilityValue('Cpk')).toHaveTextContent('1.07');
    expect(screen.queryByText('Provisional: below 20 points')).not.toBeInTheDocument();
  });

  it('when a point is excluded, then a reason is required and the request carries it', async () => {
    const bodies: unknown[] = [];
    server.use(
      ...signedInAs('quality'),
      ...trendsApi(aTrend()),
      http.post('/api/trends/points', async ({ request }) => {
        bodies.push(await request.json());
        return HttpResponse.json({});
      }),
    );
    const { user } = renderApp('/trends?recipeId=12&specId=trace-r-01');

    await user.click(await screen.findByRole('button', { name: 'Exclude point 11' }));
    const dialog = within(screen.getByRole('dialog', { name: 'Exclude point 11' }));
    await user.click(dialog.getByRole('button', { name: 'Exclude point' }));
    expect(await dialog.findByText('Reason needs at least 3 characters.')).toBeInTheDocument();
    expect(bodies).toHaveLength(0);

    await user.type(dialog.getByLabelText('Reason'), 'Meter lead was loose; re-measured later.');
    await user.click(dialog.getByRole('button', { name: 'Exclude point' }));

    await waitFor(() => expect(bodies).toEqual([{ readingId: 710, excluded: true, reason: 'Meter lead was loose; re-measured later.' }]));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
  });
});
