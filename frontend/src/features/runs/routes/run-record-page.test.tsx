import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import type { RunDetail } from '@tracewright/shared';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { runPagesApi } from '../testing/run-api';
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
});
