import { screen, within } from '@testing-library/react';
import { http } from 'msw';
import { beforeEach, describe, expect, it } from 'vitest';

import type { Role } from '@tracewright/shared';

import { apiError, signedInAs } from '../../../test/api-fixtures';
import { homeApis } from '../../../test/home-api';
import { server } from '../../../test/msw-server';
import { renderApp } from '../../../test/render-app';

const ADMIN_ONLY = ['People', 'Lab settings', 'Outgoing mail'];
// Pages for everyone signed in grow with the product; these must always be there.
const FOR_EVERYONE = ['Home', 'My PIN'];

async function navLinkNames() {
  const nav = await screen.findByRole('navigation', { name: 'Main' });
  return within(nav)
    .getAllByRole('link')
    .map((link) => link.textContent);
}

describe('app shell', () => {
  // Some of these land on the home page, which reads runs (and, for some roles, the quality overview).
  beforeEach(() => server.use(...homeApis()));

  it('when an admin is signed in, then the navigation offers the admin pages', async () => {
    server.use(...signedInAs('admin'));
    renderApp('/');

    expect(await navLinkNames()).toEqual(expect.arrayContaining([...FOR_EVERYONE, 'Audit log', ...ADMIN_ONLY]));
  });

  it.each([
    ['quality', true],
    ['engineer', false],
    ['operator', false],
  ] as [Role, boolean][])('when someone with the %s role is signed in, then no admin link is shown', async (role, seesAudit) => {
    server.use(...signedInAs(role));
    renderApp('/');

    const names = await navLinkNames();
    expect(names).toEqual(expect.arrayContaining(FOR_EVERYONE));
    expect(names.includes('Audit log')).toBe(seesAudit);
    for (const adminLink of ADMIN_ONLY) expect(names).not.toContain(adminLink);
  });

  it('when someone is signed in, then the header shows the lab, the person and their role', async () => {
    server.use(...signedInAs('quality', { name: 'Aino Lehto' }));
    renderApp('/');

    const banner = await screen.findByRole('banner');
    expect(await within(banner).findByText('Stretch Lab North')).toBeInTheDocument();
    expect(within(banner).getByText('Aino Lehto')).toBeInTheDocument();
    expect(within(banner).getByText('Quality')).toBeInTheDocument();
    expect(within(banner).getByRole('link', { name: 'Switch person' })).toHaveAttribute('href', '/pin');
  });

  it('when an operator opens an admin page, then a "not for your role" page explains it and no user data is fetched', async () => {
    let usersFetched = false;
    server.use(
      ...signedInAs('operator'),
      http.get('/api/users', () => {
        usersFetched = true;
        return apiError(403, 'FORBIDDEN', 'Admins only.');
      }),
    );
    renderApp('/people');

    expect(await screen.findByRole('heading', { name: 'This page is not for your role' })).toBeInTheDocument();
    expect(screen.getByText('Only people with the Admin role can use this page.')).toBeInTheDocument();
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeInTheDocument();
    expect(usersFetched).toBe(false);
  });

  it('when nobody is signed in, then the sign-in page opens and remembers where the person was going', async () => {
    server.use(http.get('/api/auth/session', () => apiError(401, 'UNAUTHENTICATED', 'Sign in first.')));
    const { router } = renderApp('/audit?page=3');

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent('/audit?page=3')}`);
  });

  it('when the person signs out, then the server is told and the sign-in page opens', async () => {
    let signedOut = false;
    server.use(
      ...signedInAs('engineer'),
      http.post('/api/auth/sign-out', () => {
        signedOut = true;
        return new Response(null, { status: 204 });
      }),
    );
    const { user, router } = renderApp('/');

    await user.click(await screen.findByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(signedOut).toBe(true);
    expect(router.state.location.pathname).toBe('/sign-in');
  });
});
