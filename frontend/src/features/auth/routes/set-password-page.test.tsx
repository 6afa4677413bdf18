import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeEach, describe, expect, it } from 'vitest';

import { apiError, LAB_SETTINGS, sessionFor } from '../../../../test/api-fixtures';
import { homeApis } from '../../../../test/home-api';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';

const TOKEN = 'k3Jx9QvLm2Tn8RwYp5ZsAe7Hb4Uc6Fd1';
const PREVIEW = { name: 'Noor Haddad', email: 'noor.haddad@lab.example', purpose: 'invitation' as const };

function previewAnswers() {
  server.use(http.get(`/api/auth/tokens/${TOKEN}`, () => HttpResponse.json(PREVIEW)));
}

describe('set-password page', () => {
  // Some of these land on the home page, which reads runs (and, for some roles, the quality overview).
  beforeEach(() => server.use(...homeApis()));

  it('when the two passwords differ, then the form refuses before anything is sent', async () => {
    previewAnswers();
    let completeCalls = 0;
    server.use(
      http.post('/api/auth/tokens/complete', () => {
        completeCalls += 1;
        return HttpResponse.json(sessionFor('quality'));
      }),
    );
    const { user } = renderApp(`/set-password/${TOKEN}`);

    await user.type(await screen.findByLabelText('New password'), 'copper traces dry slowly');
    await user.type(screen.getByLabelText('New password again'), 'copper traces dry slowly!');
    await user.click(screen.getByRole('button', { name: 'Set password and sign in' }));

    expect(await screen.findByLabelText('New password again')).toHaveAccessibleDescription(
      'The two passwords differ. Type the same password in both fields.',
    );
    expect(completeCalls).toBe(0);
  });

  it('when the passwords match, then token and password are sent and the person is signed in at home', async () => {
    previewAnswers();
    let sent: unknown;
    server.use(
      http.post('/api/auth/tokens/complete', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json(sessionFor('quality', { name: 'Noor Haddad' }));
      }),
      http.get('/api/settings', () => HttpResponse.json(LAB_SETTINGS)),
    );
    const { user, router } = renderApp(`/set-password/${TOKEN}`);

    expect(await screen.findByText('noor.haddad@lab.example')).toBeInTheDocument();
    await user.type(screen.getByLabelText('New password'), 'copper traces dry slowly');
    await user.type(screen.getByLabelText('New password again'), 'copper traces dry slowly');
    await user.click(screen.getByRole('button', { name: 'Set password and sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Welcome, Noor' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/');
    expect(sent).toEqual({ token: TOKEN, password: 'copper traces dry slowly' });
  });

  it.each([
    [410, { reason: 'expired' }, 'This link has expired.'],
    [410, { reason: 'used' }, 'This link has already been used.'],
    [404, undefined, 'This link does not work any more.'],
  ])('when the link answers %i (%j), then a clear message offers a way to ask again', async (status, details, title) => {
    server.use(http.get(`/api/auth/tokens/${TOKEN}`, () => apiError(status, 'NOT_FOUND', 'Gone.', details)));
    renderApp(`/set-password/${TOKEN}`);

    expect(await screen.findByText(title)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Ask for a new reset link' })).toHaveAttribute('href', '/forgot-password');
    expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
  });
});
