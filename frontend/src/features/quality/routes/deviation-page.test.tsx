import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aClosedDeviation, aDeviation, HASH } from '../testing/deviation-fixtures';
import { deviationApi, pickerLists } from '../testing/quality-api';

describe('deviation detail', () => {
  it('when a deviation is closed, then quality sees its signatures and no form, field or action to change it', async () => {
    server.use(...signedInAs('quality'), ...pickerLists(), deviationApi(aClosedDeviation()));
    renderApp('/deviations/31');

    expect(await screen.findByRole('heading', { name: /Deviation #31/ })).toBeInTheDocument();
    expect(screen.getByText('Closed: this record is read-only')).toBeInTheDocument();
    const closure = within(screen.getByRole('region', { name: 'Closure' }));
    expect(closure.getByText('Verified and closed')).toBeInTheDocument();
    expect(closure.getByText('Robin Vale')).toBeInTheDocument();
    expect(closure.getByText(/2026-12-09 \d\d:05:00/)).toBeInTheDocument();
    expect(within(screen.getByRole('region', { name: 'Dispositions' })).getByText('Scrap')).toBeInTheDocument();

    const main = within(screen.getByRole('main'));
    expect(main.queryByRole('textbox')).not.toBeInTheDocument();
    expect(main.queryByRole('combobox')).not.toBeInTheDocument();
    expect(main.queryByRole('radio')).not.toBeInTheDocument();
    expect(main.queryByRole('button')).not.toBeInTheDocument();
  });

  it('when an open deviation is shown, then expected and actual stand side by side with the step, lots, readings and photos', async () => {
    server.use(...signedInAs('engineer'), ...pickerLists(), deviationApi(aDeviation({ photoFileIds: [88] })));
    renderApp('/deviations/31');

    expect(await screen.findByText('Trace resistance 8.0–12.0 Ω')).toBeInTheDocument();
    expect(screen.getByText('14.6 Ω on piece R-2026-0041-02')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'AG-2611-04' })).toHaveAttribute('href', '/materials/lots/7');
    expect(screen.getByText('Out of limits')).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Photo 1 of 1 from deviation #31' })).toHaveAttribute('src', '/api/files/88');
    // Engineers read deviations; only quality decides them.
    expect(screen.queryByRole('button', { name: 'Sign disposition…' })).not.toBeInTheDocument();
    expect(screen.queryByLabelText('Comment')).not.toBeInTheDocument();
  });

  it('when a reading was corrected to 20 °C and the run is still going, then the value reads without float noise and the run state in words', async () => {
    const deviation = aDeviation();
    const corrected = { ...deviation.readings[0]!, value: 12.543554007123 };
    server.use(...signedInAs('engineer'), ...pickerLists(), deviationApi(aDeviation({ readings: [corrected], run: { ...deviation.run, state: 'in-progress' } })));
    renderApp('/deviations/31');

    const readings = within(await screen.findByRole('region', { name: 'Readings' }));
    expect(readings.getByText('12.5436')).toBeInTheDocument();
    expect(screen.queryByText(/12\.54355/)).not.toBeInTheDocument();
    expect(screen.getByText('(in progress)')).toBeInTheDocument();
  });

  it('when quality closes a dispositioned deviation, then it is signed with the verification note, password and hash', async () => {
    const bodies: unknown[] = [];
    server.use(
      ...signedInAs('quality'),
      ...pickerLists(),
      deviationApi(aDeviation({ state: 'dispositioned' })),
      http.post('/api/deviations/31/close', async ({ request }) => {
        bodies.push(await request.json());
        return HttpResponse.json({});
      }),
    );
    const { user } = renderApp('/deviations/31');

    await user.type(await screen.findByLabelText('Verification'), 'Oven probe re-checked: within 0.5 °C.');
    await user.click(screen.getByRole('button', { name: 'Sign and close…' }));
    const dialog = within(screen.getByRole('dialog', { name: 'Close deviation #31' }));
    expect(dialog.getByText(/Verified and closed/)).toBeInTheDocument();
    await user.type(dialog.getByLabelText('Your password'), 'bench-copper-7');
    await user.click(dialog.getByRole('button', { name: 'Sign and close' }));

    await waitFor(() => expect(bodies).toEqual([{ password: 'bench-copper-7', contentHash: HASH, verificationNote: 'Oven probe re-checked: within 0.5 °C.' }]));
    expect(screen.queryByRole('button', { name: 'Sign disposition…' })).not.toBeInTheDocument();
  });
});
