import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeEach, describe, expect, it } from 'vitest';

import { apiError, LAB_SETTINGS, sessionFor } from '../../../../test/api-fixtures';
import { homeApis } from '../../../../test/home-api';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';

const ROSTER = {
  users: [
    { id: 4, name: 'Paulo Reis', role: 'operator' },
    { id: 5, name: 'Hana Novak', role: 'quality' },
  ],
};

describe('PIN switch page', () => {
  // Some of these land on the home page, which reads runs (and, for some roles, the quality overview).
  beforeEach(() => server.use(...homeApis()));

  it('when the tablet is not trusted (401), then it explains that someone must sign in with a password once', async () => {
    server.use(http.get('/api/auth/pin-users', () => apiError(401, 'UNAUTHENTICATED', 'Not a trusted device.')));
    const { router } = renderApp('/pin');

    expect(await screen.findByText('This tablet does not know anyone yet.')).toBeInTheDocument();
    expect(screen.getByText(/signed in with their e-mail and password at\s+least once/)).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/pin');
  });

  it('when a person taps their name and their PIN on the keypad, then the switch sends their id and PIN', async () => {
    let sent: unknown;
    server.use(
      http.get('/api/auth/pin-users', () => HttpResponse.json(ROSTER)),
      http.post('/api/auth/pin-switch', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json(sessionFor('operator', { id: 4, name: 'Paulo Reis', hasPin: true }));
      }),
      http.get('/api/settings', () => HttpResponse.json(LAB_SETTINGS)),
    );
    const { user, router } = renderApp('/pin');

    const people = await screen.findByRole('list', { name: 'People with a PIN' });
    // Sorted by name so each person finds themselves in the same place every time.
    expect(within(people).getAllByRole('button').map((b) => b.textContent)).toEqual(['Hana NovakQuality', 'Paulo ReisOperator']);
    await user.click(within(people).getByRole('button', { name: /Paulo Reis/ }));
    const keypad = screen.getByRole('group', { name: 'Keypad' });
    for (const digit of ['2', '7', '0', '9', '9']) await user.click(within(keypad).getByRole('button', { name: digit }));
    await user.click(within(keypad).getByRole('button', { name: 'Delete' }));
    await user.click(screen.getByRole('button', { name: 'Switch to Paulo Reis' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Welcome, Paulo' })).toBeInTheDocument();
    expect(sent).toEqual({ userId: 4, pin: '2709' });
    expect(router.state.location.pathname).toBe('/');
  });

  it('when the PIN is too short, then it is refused before sending', async () => {
    let calls = 0;
    server.use(
      http.get('/api/auth/pin-users', () => HttpResponse.json(ROSTER)),
      http.post('/api/auth/pin-switch', () => {
        calls += 1;
        return apiError(401, 'UNAUTHENTICATED', 'Wrong PIN.');
      }),
    );
    const { user } = renderApp('/pin');

    await user.click(await screen.findByRole('button', { name: /Hana Novak/ }));
    await user.type(screen.getByLabelText('PIN'), '12');
    await user.click(screen.getByRole('button', { name: 'Switch to Hana Novak' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('PIN must be 4 to 8 digits.');
    expect(calls).toBe(0);
  });

  it('when the PIN is wrong, then the server message shows and the entry is cleared', async () => {
    server.use(
      http.get('/api/auth/pin-users', () => HttpResponse.json(ROSTER)),
      http.post('/api/auth/pin-switch', () => apiError(401, 'UNAUTHENTICATED', 'That PIN does not match. 4 tries left.')),
    );
    const { user } = renderApp('/pin');

    await user.click(await screen.findByRole('button', { name: /Hana Novak/ }));
    await user.type(screen.getByLabelText('PIN'), '5555');
    await user.click(screen.getByRole('button', { name: 'Switch to Hana Novak' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('That PIN does not match. 4 tries left.');
    expect(screen.getByLabelText('PIN')).toHaveValue('');
  });
});
