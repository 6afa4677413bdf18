import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';

describe('forgot-password page', () => {
  it('when an address is sent, then the same neutral confirmation appears whoever it belongs to', async () => {
    let sent: unknown;
    server.use(
      http.post('/api/auth/password-reset', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json({ message: 'Queued.' }, { status: 202 });
      }),
    );
    const { user } = renderApp('/forgot-password');

    await user.type(await screen.findByLabelText('E-mail'), 'someone@lab.example');
    await user.click(screen.getByRole('button', { name: 'Send a reset link' }));

    const confirmation = await screen.findByText('If that address belongs to someone here, a reset link is on its way.');
    // Inside a live region, so a screen reader announces it.
    expect(confirmation.closest('[role="status"]')).not.toBeNull();
    expect(screen.queryByLabelText('E-mail')).not.toBeInTheDocument();
    expect(sent).toEqual({ email: 'someone@lab.example' });
  });
});
