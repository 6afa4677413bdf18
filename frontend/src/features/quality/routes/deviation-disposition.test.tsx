import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { apiError, signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aDeviation, HASH } from '../testing/deviation-fixtures';
import { deviationApi, pickerLists } from '../testing/quality-api';

function dispositionApi(bodies: unknown[], answer: () => Response = () => HttpResponse.json({})) {
  return http.post('/api/deviations/31/disposition', async ({ request }) => {
    bodies.push(await request.json());
    return answer();
  });
}

async function openForm() {
  const { user } = renderApp('/deviations/31');
  const form = (await screen.findByRole('heading', { name: 'Disposition' })).closest('section') as HTMLElement;
  return { user, form: within(form) };
}

describe('deviation disposition', () => {
  it('when the disposition is sent without a rationale, then it says what is missing and nothing is signed', async () => {
    const bodies: unknown[] = [];
    server.use(...signedInAs('quality'), ...pickerLists(), deviationApi(aDeviation()), dispositionApi(bodies));
    const { user, form } = await openForm();

    await user.click(form.getByRole('radio', { name: /Scrap/ }));
    await user.type(form.getByLabelText('Rationale'), 'Too high');
    await user.click(form.getByRole('button', { name: 'Sign disposition…' }));

    expect(await form.findByText('Rationale needs at least 10 characters.')).toBeInTheDocument();
    expect(form.getByLabelText('Rationale')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(bodies).toHaveLength(0);
  });

  it('when a disposition is signed, then the password is asked for and the request carries the decision, pieces, action, password and hash', async () => {
    const bodies: unknown[] = [];
    server.use(...signedInAs('quality'), ...pickerLists(), deviationApi(aDeviation()), dispositionApi(bodies));
    const { user, form } = await openForm();

    await user.click(form.getByRole('radio', { name: /Scrap/ }));
    await user.click(form.getByRole('checkbox', { name: 'R-2026-0041-01' }));
    await user.click(form.getByRole('checkbox', { name: 'R-2026-0041-03' }));
    await user.type(form.getByLabelText('Rationale'), 'Resistance is 22 % above the limit; not reworkable.');
    await user.click(form.getByRole('checkbox', { name: 'Add a corrective action' }));
    await user.type(form.getByLabelText('Corrective action'), 'Recalibrate the oven probe');
    await user.selectOptions(await form.findByRole('combobox', { name: 'Owner' }), 'Ada Kerr');
    await user.type(form.getByLabelText('Due on'), '2026-12-20');
    await user.click(form.getByRole('button', { name: 'Sign disposition…' }));

    const dialog = within(await screen.findByRole('dialog', { name: 'Sign the disposition of deviation #31' }));
    expect(dialog.getByText(/Robin Vale/)).toBeInTheDocument();
    expect(dialog.getByText(/decide “Scrap” for the pieces named/)).toBeInTheDocument();
    expect(dialog.getByText(HASH)).toBeInTheDocument();
    expect(dialog.getByText(/pieces R-2026-0041-02/)).toBeInTheDocument();
    await user.click(dialog.getByRole('button', { name: 'Sign disposition' }));
    expect(await dialog.findByText('Enter your password to sign.')).toBeInTheDocument();
    expect(bodies).toHaveLength(0);

    await user.type(dialog.getByLabelText('Your password'), 'bench-copper-7');
    await user.click(dialog.getByRole('button', { name: 'Sign disposition' }));

    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(bodies).toEqual([
      {
        password: 'bench-copper-7',
        contentHash: HASH,
        disposition: 'scrap',
        rationale: 'Resistance is 22 % above the limit; not reworkable.',
        pieceIds: [502],
        reworkStepIds: [],
        correctiveAction: { note: 'Recalibrate the oven probe', ownerId: 5, dueOn: '2026-12-20' },
      },
    ]);
  });

  it('when the password is wrong (401), then the message shows under the password field and the dialog stays open', async () => {
    const refuse = () => apiError(401, 'UNAUTHENTICATED', 'That password is not right, so nothing was signed.', { formErrors: [], fieldErrors: { password: ['That password is not right.'] } });
    server.use(...signedInAs('quality'), ...pickerLists(), deviationApi(aDeviation()), dispositionApi([], refuse));
    const { user, form } = await openForm();

    await user.click(form.getByRole('radio', { name: /Use as is/ }));
    await user.type(form.getByLabelText('Rationale'), 'Within the customer tolerance for this prototype.');
    await user.click(form.getByRole('button', { name: 'Sign disposition…' }));
    const dialog = within(await screen.findByRole('dialog'));
    await user.type(dialog.getByLabelText('Your password'), 'not-mine');
    await user.click(dialog.getByRole('button', { name: 'Sign disposition' }));

    const password = dialog.getByLabelText('Your password');
    await waitFor(() => expect(password).toHaveAccessibleDescription(expect.stringContaining('That password is not right.')));
    expect(password).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByRole('dialog')).toBeInTheDocument();
  });

  it('when rework is chosen, then the run steps are offered and the picked ones go in the request', async () => {
    const bodies: unknown[] = [];
    const steps = [
      { id: 'print-step-01', kind: 'print-pass', title: 'Print silver trace' },
      { id: 'cure-step-01', kind: 'cure', title: 'Cure silver trace' },
    ];
    server.use(
      ...signedInAs('quality'),
      ...pickerLists(),
      deviationApi(aDeviation()),
      dispositionApi(bodies),
      http.get('/api/runs/41', () => HttpResponse.json({ content: { steps } })),
    );
    const { user, form } = await openForm();

    await user.click(form.getByRole('radio', { name: /Rework/ }));
    await user.click(await form.findByRole('checkbox', { name: /Cure silver trace/ }));
    await user.type(form.getByLabelText('Rationale'), 'A second cure brings the trace into limits.');
    await user.click(form.getByRole('button', { name: 'Sign disposition…' }));
    const dialog = within(await screen.findByRole('dialog'));
    await user.type(dialog.getByLabelText('Your password'), 'bench-copper-7');
    await user.click(dialog.getByRole('button', { name: 'Sign disposition' }));

    await waitFor(() => expect(bodies).toHaveLength(1));
    expect(bodies[0]).toMatchObject({ disposition: 'rework', reworkStepIds: ['cure-step-01'], pieceIds: [501, 502, 503], correctiveAction: null });
  });

  it('when the server refuses the rationale (400), then the dialog closes and the message stands under the rationale', async () => {
    const refuse = () => apiError(400, 'VALIDATION_FAILED', 'Check the disposition.', { formErrors: [], fieldErrors: { rationale: ['Say why the pieces can be used as they are.'] } });
    server.use(...signedInAs('quality'), ...pickerLists(), deviationApi(aDeviation()), dispositionApi([], refuse));
    const { user, form } = await openForm();

    await user.click(form.getByRole('radio', { name: /Use as is/ }));
    await user.type(form.getByLabelText('Rationale'), 'Looks fine to me.');
    await user.click(form.getByRole('button', { name: 'Sign disposition…' }));
    const dialog = within(await screen.findByRole('dialog'));
    await user.type(dialog.getByLabelText('Your password'), 'bench-copper-7');
    await user.click(dialog.getByRole('button', { name: 'Sign disposition' }));

    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(form.getByLabelText('Rationale')).toHaveAccessibleDescription(expect.stringContaining('Say why the pieces can be used as they are.'));
  });
});
