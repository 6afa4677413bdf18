import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import type { SignInInput } from '@tracewright/shared';

import { apiError, LAB_SETTINGS, sessionFor } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';

async function fillAndSubmit(user: ReturnType<typeof renderApp>['user'], email: string, password: string) {
  await user.type(await screen.findByLabelText('E-mail'), email);
  await user.type(screen.getByLabelText('Password'), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('sign-in page', () => {
  it('when the e-mail and password are accepted, then the person lands on the page they came for', async () => {
    let sent: SignInInput | undefined;
    server.use(
      http.post('/api/auth/sign-in', async ({ request }) => {
        sent = (await request.json()) as SignInInput;
        return HttpResponse.json(sessionFor('engineer', { name: 'Ines Brandt' }));
      }),
      http.get('/api/settings', () => HttpResponse.json(LAB_SETTINGS)),
    );
    const { user, router } = renderApp('/sign-in?next=%2Fmy-pin');

    await fillAndSubmit(user, '  Ines.Brandt@Lab.Example ', 'correct horse battery');

    expect(await screen.findByRole('heading', { level: 1, name: 'My PIN' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/my-pin');
    // The shared schema trims and lower-cases before sending.
    expect(sent).toEqual({ email: 'ines.brandt@lab.example', password: 'correct horse battery' });
  });

  it.each([
    [401, 'UNAUTHENTICATED', 'That e-mail and password do not match. Check both and try again.'],
    [429, 'RATE_LIMITED', 'Too many attempts. Wait 15 minutes, then try again.'],
  ] as const)('when the server answers %i, then its message is shown and the person stays', async (status, code, message) => {
    server.use(http.post('/api/auth/sign-in', () => apiError(status, code, message)));
    const { user, router } = renderApp('/sign-in');

    await fillAndSubmit(user, 'robin.vale@lab.example', 'wrong password');

    expect(await screen.findByRole('alert')).toHaveTextContent(message);
    expect(router.state.location.pathname).toBe('/sign-in');
  });

  it('when the server answers 400 with field errors, then each message lands under its field', async () => {
    server.use(
      http.post('/api/auth/sign-in', () =>
        apiError(400, 'VALIDATION_FAILED', 'Some fields need attention.', {
          formErrors: [],
          fieldErrors: { email: ['No account uses this domain.'], password: ['Password can be at most 200 characters.'] },
        }),
      ),
    );
    const { user } = renderApp('/sign-in');

    await fillAndSubmit(user, 'robin.vale@lab.example', 'secret');

    const email = await screen.findByLabelText('E-mail');
    expect(email).toHaveAttribute('aria-invalid', 'true');
    expect(email).toHaveAccessibleDescription('No account uses this domain.');
    expect(screen.getByLabelText('Password')).toHaveAccessibleDescription('Password can be at most 200 characters.');
  });
});
