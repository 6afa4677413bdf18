import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { apiError, signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';

async function fill(user: ReturnType<typeof renderApp>['user'], pin: string, again: string, password: string) {
  await user.type(await screen.findByLabelText('New PIN'), pin);
  await user.type(screen.getByLabelText('New PIN again'), again);
  await user.type(screen.getByLabelText('Your password'), password);
  await user.click(screen.getByRole('button', { name: 'Save PIN' }));
}

describe('My PIN page', () => {
  it('when the PIN is typed twice alike with the password, then both are sent and success is announced', async () => {
    let sent: unknown;
    server.use(
      ...signedInAs('operator'),
      http.put('/api/auth/pin', async ({ request }) => {
        sent = await request.json();
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const { user } = renderApp('/my-pin');

    await fill(user, '480613', '480613', 'my long password');

    expect(await screen.findByText('Your PIN is saved. Use it under “Switch person”.')).toBeInTheDocument();
    expect(sent).toEqual({ pin: '480613', password: 'my long password' });
  });

  it('when the password is wrong, then the server message is shown under the password field', async () => {
    server.use(
      ...signedInAs('operator'),
      http.put('/api/auth/pin', () =>
        apiError(400, 'VALIDATION_FAILED', 'Check the fields.', { formErrors: [], fieldErrors: { password: ['That password is not right.'] } }),
      ),
    );
    const { user } = renderApp('/my-pin');

    await fill(user, '4806', '4806', 'not it');

    expect(await screen.findByLabelText('Your password')).toHaveAccessibleDescription(
      'We ask for it so that nobody can set a PIN on an unattended screen. That password is not right.',
    );
  });

  it('when the PIN has letters, then the shared rule refuses it before sending', async () => {
    let calls = 0;
    server.use(
      ...signedInAs('operator'),
      http.put('/api/auth/pin', () => {
        calls += 1;
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const { user } = renderApp('/my-pin');

    await fill(user, '12ab', '12ab', 'my long password');

    expect(await screen.findByText('PIN must be 4 to 8 digits.')).toBeInTheDocument();
    expect(calls).toBe(0);
  });
});
