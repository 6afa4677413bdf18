import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import type { RunDetail } from '@tracewright/shared';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aSignOffView, runPagesApi, signOffApi } from '../testing/run-api';
import { aReading, aRunDetail, MIKA } from '../testing/run-fixtures';

const DONE_INSPECTION = {
  stepId: 'inspect-trace',
  state: 'done' as const,
  safetyAcknowledgedAt: null,
  safetyAcknowledgedBy: null,
  startedAt: '2026-12-02T10:58:00Z',
  startedBy: MIKA,
  completedAt: '2026-12-02T11:10:00Z',
  completedBy: MIKA,
  notDoneReason: null,
  note: '',
  confirmedLotIds: [],
  nozzleCheck: null,
  hasDeviceTime: false,
};

describe('run record page', () => {
  it('when a reading was corrected, then the original value is struck through beside the corrected one, with the reason', async () => {
    const run = aRunDetail({
      state: 'in-progress',
      steps: [DONE_INSPECTION],
      readings: [
        aReading({ id: 1, value: 14.2, outOfLimits: true, supersededById: 2, recordedAt: '2026-12-02T11:00:00Z' }),
        aReading({ id: 2, value: 10.4, correctionReason: 'Probe slipped off the pad; measured again.', recordedAt: '2026-12-02T11:05:00Z' }),
        aReading({ id: 3, pieceId: 502, value: 9.8, recordedAt: '2026-12-02T11:02:00Z' }),
      ],
    });
    server.use(...signedInAs('quality'), ...runPagesApi({ run }));
    renderApp('/runs/42');

    const table = await screen.findByRole('table', { name: 'Readings, step 3' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    const corrected = rows[0] as HTMLElement;
    expect(within(corrected).getByRole('deletion')).toHaveTextContent('14.2 Ω');
    expect(corrected).toHaveTextContent('R-2026-0042-01');
    expect(corrected).toHaveTextContent('first recorded as 14.2 Ω, corrected to 10.4 Ω');
    expect(corrected).toHaveTextContent('Correction: Probe slipped off the pad; measured again.');
    expect(within(corrected).getByText('In limits')).toBeInTheDocument();
    expect(within(rows[1] as HTMLElement).queryByRole('deletion')).not.toBeInTheDocument();
  });

  it('when quality puts a running run on hold, then the reason is sent and the record shows the run on hold', async () => {
    let run: RunDetail = aRunDetail({ state: 'in-progress' });
    let sent: unknown;
    server.use(
      ...signedInAs('quality'),
      http.get('/api/runs/42', () => HttpResponse.json(run)),
      signOffApi(run),
      http.post('/api/runs/42/hold', async ({ request }) => {
        sent = await request.json();
        run = { ...run, state: 'on-hold', holdReason: 'Oven A reads 12 °C high; waiting for the service.' };
        return HttpResponse.json(run);
      }),
    );
    const { user } = renderApp('/runs/42');

    await user.click(await screen.findByRole('button', { name: 'Put on hold' }));
    await user.type(screen.getByLabelText('Reason'), 'Oven A reads 12 °C high; waiting for the service.');
    await user.click(screen.getByRole('button', { name: 'Put the run on hold' }));

    expect(await screen.findByText('Run R-2026-0042 is on hold.')).toBeInTheDocument();
    expect(sent).toEqual({ reason: 'Oven A reads 12 °C high; waiting for the service.' });
    expect(await screen.findByText('Reason: Oven A reads 12 °C high; waiting for the service.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Resume' })).toBeInTheDocument();
  });

  it('when an operator reads the record, then no state change is offered, and the tablet and CSV links point at this run', async () => {
    server.use(...signedInAs('operator'), ...runPagesApi({ run: aRunDetail({ state: 'in-progress' }) }));
    renderApp('/runs/42');

    expect(await screen.findByRole('link', { name: 'Open on tablet' })).toHaveAttribute('href', '/run/42');
    expect(screen.getByRole('link', { name: 'Readings (CSV)' })).toHaveAttribute('href', '/api/runs/42/readings.csv');
    expect(screen.queryByRole('region', { name: 'Change the run’s state' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Put on hold' })).not.toBeInTheDocument();
  });

  it.each(['closed', 'cancelled'] as const)('when the run is %s, then the tablet link says the view is read only', async (state) => {
    server.use(...signedInAs('operator'), ...runPagesApi({ run: aRunDetail({ state }) }));
    renderApp('/runs/42');

    expect(await screen.findByRole('link', { name: 'Tablet view (read only)' })).toHaveAttribute('href', '/run/42');
    expect(screen.queryByRole('link', { name: 'Open on tablet' })).not.toBeInTheDocument();
  });

  it('when quality signs off a completed run with the password, then the hash read is sent and the record shows who signed, when, and what it means', async () => {
    let run: RunDetail = aRunDetail({ state: 'completed' });
    let view = aSignOffView(run);
    let sent: unknown;
    server.use(
      ...signedInAs('quality'),
      http.get('/api/runs/42', () => HttpResponse.json(run)),
      http.get('/api/runs/42/sign-off', () => HttpResponse.json(view)),
      http.post('/api/runs/42/sign-off', async ({ request }) => {
        sent = await request.json();
        run = { ...run, state: 'closed' };
        view = { ...view, runState: 'closed', canSignOff: false, refusal: 'Run R-2026-0042 is already signed off.', signature: { signedBy: 'Ilse Moreau', meaning: 'run record approved', signedAt: '2026-12-02T14:05:00Z', contentHash: view.contentHash } };
        return HttpResponse.json(view);
      }),
    );
    const { user } = renderApp('/runs/42');

    await user.click(await screen.findByRole('button', { name: 'Sign off run…' }));
    const dialog = screen.getByRole('dialog', { name: 'Sign off run R-2026-0042' });
    await user.type(within(dialog).getByLabelText('Your password'), 'a-good-password');
    await user.click(within(dialog).getByRole('button', { name: 'Sign off run' }));

    const section = await screen.findByRole('region', { name: 'Quality sign-off' });
    expect(await within(section).findByText('Ilse Moreau')).toBeInTheDocument();
    expect(within(section).getByText('run record approved')).toBeInTheDocument();
    expect(within(section).getByText(/^2026-12-02 \d\d:05/)).toBeInTheDocument();
    expect(sent).toEqual({ password: 'a-good-password', contentHash: 'c0ffee'.padEnd(64, '0') });
  });

  it('when a run still has a deviation without a disposition, then no sign-off is offered and the deviation is named with a link', async () => {
    const run = aRunDetail({ state: 'completed' });
    const view = aSignOffView(run, { canSignOff: false, refusal: 'Run R-2026-0042 cannot be signed off: 1 deviation has no disposition yet.', undecided: [{ id: 9, title: 'Smudge on key 2', state: 'open' }] });
    server.use(...signedInAs('quality'), http.get('/api/runs/42', () => HttpResponse.json(run)), signOffApi(run, view), http.get('/api/heat-sources', () => HttpResponse.json({ heatSources: [] })));
    renderApp('/runs/42');

    const section = await screen.findByRole('region', { name: 'Quality sign-off' });
    expect(within(section).getByText(/1 deviation has no disposition yet/)).toBeInTheDocument();
    expect(within(section).getByRole('link', { name: '#9 Smudge on key 2' })).toHaveAttribute('href', '/deviations/9');
    expect(within(section).queryByRole('button', { name: 'Sign off run…' })).not.toBeInTheDocument();
  });
});
