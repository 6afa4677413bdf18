import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import type { ProcessCheck } from '@tracewright/shared';

import { apiError, signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aHeatSource, aLot, anInstrument } from '../testing/catalogue-records';
import { GOOD_INK_LOT, PET_LOT, planApi, runPagesApi } from '../testing/run-api';
import { aRunDetail } from '../testing/run-fixtures';

const EXPIRED_INK_LOT = aLot({
  id: 8,
  lotNumber: 'AN9-2001',
  expiresOn: '2020-01-31',
  status: { flags: ['expired'], usable: false, messages: ['Expired on 2020-01-31.'] },
});
const REASON = 'Only lot on the shelf; jetted a test line this morning.';

function capturePlan(answer: () => Response) {
  const sent: unknown[] = [];
  server.use(
    http.post('/api/runs', async ({ request }) => {
      sent.push(await request.json());
      return answer();
    }),
  );
  return sent;
}

async function fillBasics(user: ReturnType<typeof renderApp>['user'], inkLot: string) {
  await user.type(await screen.findByLabelText('Quantity (pieces)'), '2');
  await user.selectOptions(screen.getByLabelText('Lot of Argent nano A9'), inkLot);
  await user.selectOptions(screen.getByLabelText('Lot of Clear PET 125'), 'PET-0042 · expires 2099-05-01');
}

describe('plan a run page', () => {
  it('when an expired lot is picked, then a reason is required before planning and is sent with that lot', async () => {
    server.use(...signedInAs('engineer'), ...planApi({ lots: [GOOD_INK_LOT, EXPIRED_INK_LOT, PET_LOT] }), ...runPagesApi());
    const sent = capturePlan(() => HttpResponse.json(aRunDetail(), { status: 201 }));
    const { user } = renderApp('/runs/new?version=11');

    await fillBasics(user, 'AN9-2001 · expires 2020-01-31 · Expired');
    expect(screen.getByText('Lot AN9-2001 of Argent nano A9 expired on 2020-01-31.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Plan the run' }));

    const reason = await screen.findByLabelText('Reason for using this lot');
    expect(reason).toHaveAccessibleDescription(expect.stringContaining('raises a deviation, which quality reviews. Give a reason to use it anyway'));
    expect(sent).toEqual([]);

    await user.type(reason, REASON);
    await user.click(screen.getByRole('button', { name: 'Plan the run' }));

    expect(await screen.findByText('Run R-2026-0042 is planned. Print its traveller for the bench.')).toBeInTheDocument();
    expect(sent).toEqual([
      {
        versionId: 11,
        quantity: 2,
        dueOn: null,
        lots: [
          { lotId: 8, reason: REASON },
          { lotId: 9, reason: null },
        ],
        equipment: [
          { kind: 'printer', id: 1, reason: null },
          { kind: 'heat-source', id: 1, reason: null },
        ],
        notes: '',
      },
    ]);
  });

  it('when another oven makes the version’s checks block (422), then the blocking checks are listed and the pass is not', async () => {
    const blocked: ProcessCheck = {
      id: 'heat:cure-silver:print-substrate',
      family: 'heat',
      stepId: 'cure-silver',
      status: 'blocked',
      title: 'Cure in Oven B is above what Clear PET 125 survives',
      numbers: '150 °C set, Oven B overshoots to 185 °C; PET limit 180 °C',
      why: 'The film would shrink. Use an oven that holds 150 °C, or lower the cure.',
    };
    const passed: ProcessCheck = { ...blocked, id: 'jetting:print-silver', family: 'jettability', status: 'pass', title: 'Argent nano A9 jets from Bench jetter' };
    server.use(...signedInAs('quality'), ...planApi({ lots: [GOOD_INK_LOT, PET_LOT], heatSources: [aHeatSource(), aHeatSource({ id: 2, name: 'Oven B' })] }));
    const sent = capturePlan(() => apiError(422, 'UNPROCESSABLE', 'With Oven B, 1 check blocks this version.', { checks: [blocked, passed] }));
    const { user } = renderApp('/runs/new?version=11');

    await fillBasics(user, 'AN9-2611 · expires 2099-05-01');
    await user.selectOptions(screen.getByLabelText('Oven'), 'Oven B');
    expect(screen.getByText('Another oven than the version names')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Plan the run' }));

    const list = await screen.findByRole('region', { name: 'Checks that block this plan' });
    expect(within(list).getByText('Cure in Oven B is above what Clear PET 125 survives')).toBeInTheDocument();
    expect(within(list).getByText('150 °C set, Oven B overshoots to 185 °C; PET limit 180 °C')).toBeInTheDocument();
    expect(within(list).queryByText('Argent nano A9 jets from Bench jetter')).not.toBeInTheDocument();
    expect(screen.getByRole('alert')).toHaveTextContent('With Oven B, 1 check blocks this version.');
    expect(sent).toMatchObject([{ equipment: [{ kind: 'printer', id: 1 }, { kind: 'heat-source', id: 2 }] }]);
  });

  it('when the API names a lot that needs a reason (400), then its message lands at that lot’s reason field', async () => {
    server.use(...signedInAs('engineer'), ...planApi());
    const message = 'Lot AN9-2611 of Argent nano A9 is past its pot life: opened 2026-11-01, usable for 72 h after opening.';
    // The shape run-planning.service sends: field errors by request index, and the issues themselves.
    const details = {
      formErrors: [],
      fieldErrors: { 'lots.0.reason': [`${message} Say why it is used anyway.`] },
      issues: [{ kind: 'lot', id: 7, rule: 'lot-past-pot-life', message }],
    };
    capturePlan(() => apiError(400, 'VALIDATION_FAILED', `A reason is needed for each flagged choice. ${message}`, details));
    const { user } = renderApp('/runs/new?version=11');

    await fillBasics(user, 'AN9-2611 · expires 2099-05-01');
    await user.click(screen.getByRole('button', { name: 'Plan the run' }));

    expect(await screen.findByLabelText('Reason for using this lot')).toHaveAccessibleDescription(expect.stringContaining(`${message} Say why it is used anyway.`));
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('when an instrument past its calibration date is ticked, then it asks for a reason for that instrument', async () => {
    const overdue = { state: 'overdue' as const, message: 'Calibration was due on 2020-03-01.' };
    server.use(...signedInAs('engineer'), ...planApi({ instruments: [anInstrument({ calibrationDueOn: '2020-03-01', status: overdue })] }));
    const { user } = renderApp('/runs/new?version=11');

    await user.click(await screen.findByRole('checkbox', { name: 'Bench meter 1' }));

    expect(screen.getByText('Bench meter 1 (instrument) was due for calibration on 2020-03-01.')).toBeInTheDocument();
    expect(screen.getByLabelText('Reason for using this instrument')).toBeInTheDocument();
  });

  it('when an operator opens the plan page, then it says the page is not for their role and shows no form', async () => {
    server.use(...signedInAs('operator'));
    renderApp('/runs/new');

    expect(await screen.findByRole('heading', { name: 'This page is not for your role' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Plan the run' })).not.toBeInTheDocument();
  });
});
