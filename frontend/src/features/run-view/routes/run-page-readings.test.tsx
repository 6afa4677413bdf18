import { screen, waitFor, within } from '@testing-library/react';
import { HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';

import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { setBenchStore } from '../storage/bench-store-instance';
import { createMemoryBenchStore } from '../storage/memory-bench-store';
import { fakeRunApi } from '../testing/fake-run-api';
import { findStepHeading, SLOW } from '../testing/find-step-heading';
import { aRunAtInspection } from '../testing/run-fixtures';

beforeEach(() => {
  setBenchStore(createMemoryBenchStore({ isDurable: true }));
  localStorage.clear();
});
afterEach(() => setBenchStore(null));

async function enterResistance(user: ReturnType<typeof renderApp>['user'], value: string) {
  expect(await findStepHeading('Measure the heater trace')).toBeInTheDocument();
  const card = screen.getByRole('region', { name: 'Reading: Trace resistance' });
  expect(within(card).getByText('8–12 Ω')).toBeInTheDocument();
  await user.click(within(card).getByRole('button', { name: 'Record reading: Trace resistance' }));
  await user.type(within(card).getByLabelText('Trace resistance'), value);
  return card;
}

describe('run page: readings', () => {
  it('when the server finds an unconfirmed reading out of limits (422), then the operator is asked and it is resent with the flag', async () => {
    const serverMessage = '13.1 Ω at 31 °C is 12.6 Ω at 20 °C: out of limits, above the upper limit of 12 Ω.';
    const api = fakeRunApi(aRunAtInspection, (write) =>
      (write.body as { confirmOutOfLimits?: boolean }).confirmOutOfLimits
        ? { reading: { id: 77 }, deviation: { id: 5 } }
        : HttpResponse.json({ error: { code: 'UNPROCESSABLE', message: 'The reading is out of limits.', details: { evaluation: { outOfLimits: true, message: serverMessage } } } }, { status: 422 }),
    );
    server.use(...api.handlers);
    const { user } = renderApp('/run/7');

    const card = await enterResistance(user, '11.5');
    expect(within(card).getByText('Within limits')).toBeInTheDocument();
    await user.click(within(card).getByRole('button', { name: 'Record reading' }));

    const dialog = await screen.findByRole('dialog', { name: 'This reading is out of limits' }, SLOW);
    expect(within(dialog).getByText(serverMessage)).toBeInTheDocument();
    await user.click(within(dialog).getByRole('button', { name: 'Record anyway' }));

    await waitFor(() => expect(api.recorded).toHaveLength(1), SLOW);
    const [refused, resent] = api.seen;
    expect(refused?.body).toMatchObject({ value: 11.5, confirmOutOfLimits: false });
    expect(resent?.body).toMatchObject({ value: 11.5, confirmOutOfLimits: true, specId: 'spec-resistance' });
    // The refusal recorded nothing, so the resend carries a key of its own.
    expect(resent?.key).not.toBe(refused?.key);
  });

  it('when the value typed is out of limits, then the operator confirms first and the reading is sent once, flagged', async () => {
    const stored = { id: 78, stepId: 'inspect-step-2', specId: 'spec-resistance', pieceId: null, value: 14, unit: 'Ω', correctedValue: null, ambientTempC: null, instrumentId: null, outOfLimits: true, recordedAt: '2026-12-02T10:00:05.000Z', recordedBy: { id: 1, name: 'Robin Vale' }, supersededById: null, correctionReason: null };
    const api = fakeRunApi(() => aRunAtInspection({ readings: api.recorded.length > 0 ? [stored] : [] }), () => ({ reading: { id: 78 } }));
    server.use(...api.handlers);
    const { user } = renderApp('/run/7');

    const card = await enterResistance(user, '14');
    expect(within(card).getByText('Out of limits')).toBeInTheDocument();
    await user.click(within(card).getByRole('button', { name: 'Record reading' }));
    const dialog = await screen.findByRole('dialog', { name: 'This reading is out of limits' }, SLOW);
    expect(api.seen).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Record anyway' }));

    await waitFor(() => expect(api.seen).toHaveLength(1), SLOW);
    expect(api.seen[0]?.body).toMatchObject({ value: 14, confirmOutOfLimits: true });
    const recorded = await within(card).findByRole('list', { name: 'Trace resistance' }, SLOW);
    expect(within(recorded).getByText('14 Ω')).toBeInTheDocument();
    expect(within(recorded).getByText('Out of limits')).toBeInTheDocument();
  });
});
