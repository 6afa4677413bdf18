import { act, screen } from '@testing-library/react';
import { http } from 'msw';
import { describe, expect, it } from 'vitest';

import { aUser, apiError, signedInAs } from '../../test/api-fixtures';
import { server } from '../../test/msw-server';
import { renderApp } from '../../test/render-app';

describe('redirect on 401', () => {
  it('when a query answers 401 after the page loaded, then the person is sent to sign in and back here afterwards', async () => {
    server.use(...signedInAs('admin'), http.get('/api/users', () => Response.json({ users: [aUser()] })));
    const { router, queryClient } = renderApp('/people?sort=role');
    expect(await screen.findByRole('heading', { name: 'People' })).toBeInTheDocument();

    // The session ends on the server; the next refetch of the list is refused.
    server.use(http.get('/api/users', () => apiError(401, 'UNAUTHENTICATED', 'Your session ended.')));
    await act(() => queryClient.invalidateQueries({ queryKey: ['users'] }));

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent('/people?sort=role')}`);
  });

  it('when a query answers 403, then the person stays where they are', async () => {
    server.use(...signedInAs('admin'), http.get('/api/users', () => Response.json({ users: [aUser()] })));
    const { router, queryClient } = renderApp('/people');
    expect(await screen.findByRole('heading', { name: 'People' })).toBeInTheDocument();

    server.use(http.get('/api/users', () => apiError(403, 'FORBIDDEN', 'Admins only.')));
    await act(() => queryClient.invalidateQueries({ queryKey: ['users'] }));

    expect(router.state.location.pathname).toBe('/people');
    expect(screen.getByRole('heading', { name: 'People' })).toBeInTheDocument();
  });
});
