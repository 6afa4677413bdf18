import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import type { User } from '@tracewright/shared';

import { aUser, signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';

const ADMIN_ID = 1;
const PEOPLE: User[] = [
  aUser({ id: ADMIN_ID, name: 'Robin Vale', email: 'robin.vale@lab.example', role: 'admin' }),
  aUser({ id: 2, name: 'Mika Sato', email: 'mika.sato@lab.example', role: 'operator', hasPin: true, lastSignInAt: '2026-11-30T07:45:00Z' }),
  aUser({ id: 3, name: 'Cleo Ferrand', email: 'cleo.ferrand@lab.example', role: 'engineer', status: 'invited' }),
];

function withPeople(users: User[] = PEOPLE) {
  server.use(...signedInAs('admin', { id: ADMIN_ID }), http.get('/api/users', () => HttpResponse.json({ users })));
}

const rowOf = (name: string) => screen.getByRole('rowheader', { name: new RegExp(`^${name}`) }).closest('tr') as HTMLElement;
const bodyNames = () => screen.getAllByRole('rowheader').map((cell) => cell.textContent);

describe('people page', () => {
  it('when an admin invites a person, then the request carries the name, e-mail and role entered', async () => {
    withPeople();
    let sent: unknown;
    server.use(
      http.post('/api/users', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json(aUser({ id: 9, name: 'Tove Lind', email: 'tove.lind@lab.example', role: 'quality', status: 'invited' }), { status: 201 });
      }),
    );
    const { user } = renderApp('/people');

    await user.click(await screen.findByRole('button', { name: 'Invite a person' }));
    const form = screen.getByRole('form', { name: 'Invite a person' });
    await user.type(within(form).getByLabelText('Name'), 'Tove Lind');
    await user.type(within(form).getByLabelText('E-mail'), 'Tove.Lind@Lab.Example');
    await user.selectOptions(within(form).getByLabelText('Role'), 'Quality');
    await user.click(within(form).getByRole('button', { name: 'Send invitation' }));

    expect(await screen.findByText('Invitation sent to tove.lind@lab.example.')).toBeInTheDocument();
    expect(sent).toEqual({ name: 'Tove Lind', email: 'tove.lind@lab.example', role: 'quality' });
  });

  it('when the e-mail is already taken, then the server message appears under the e-mail field', async () => {
    withPeople();
    server.use(
      http.post('/api/users', () =>
        HttpResponse.json({ error: { code: 'CONFLICT', message: 'Someone here already uses this e-mail address.' } }, { status: 409 }),
      ),
    );
    const { user } = renderApp('/people');

    await user.click(await screen.findByRole('button', { name: 'Invite a person' }));
    await user.type(screen.getByLabelText('Name'), 'Mika Again');
    await user.type(screen.getByLabelText('E-mail'), 'mika.sato@lab.example');
    await user.click(screen.getByRole('button', { name: 'Send invitation' }));

    expect(await screen.findByLabelText('E-mail')).toHaveAccessibleDescription(
      'The invitation link goes to this address. Someone here already uses this e-mail address.',
    );
  });

  it('when an admin deactivates a person, then it asks first and only then sends the new status', async () => {
    withPeople();
    const patches: unknown[] = [];
    server.use(
      http.patch('/api/users/2', async ({ request }) => {
        patches.push(await request.json());
        return HttpResponse.json({ ...PEOPLE[1], status: 'deactivated' });
      }),
    );
    const { user } = renderApp('/people');

    await user.click(await screen.findByRole('button', { name: 'Deactivate Mika Sato' }));
    expect(screen.getByRole('group', { name: /Deactivate Mika Sato\?/ })).toBeInTheDocument();
    expect(patches).toEqual([]);
    await user.click(screen.getByRole('button', { name: 'Yes, deactivate' }));

    expect(await screen.findByText('Mika Sato is deactivated.')).toBeInTheDocument();
    expect(patches).toEqual([{ status: 'deactivated' }]);
  });

  it('when an admin picks another role in a row, then that role is saved for that person', async () => {
    withPeople();
    let sent: unknown;
    server.use(
      http.patch('/api/users/3', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json({ ...PEOPLE[2], role: 'quality' });
      }),
    );
    const { user } = renderApp('/people');

    await user.selectOptions(await screen.findByLabelText('Role for Cleo Ferrand'), 'Quality');

    expect(await screen.findByText('Cleo Ferrand now has the Quality role.')).toBeInTheDocument();
    expect(sent).toEqual({ role: 'quality' });
  });

  it('when a person is still invited, then the invitation can be sent again', async () => {
    withPeople();
    let resent = false;
    server.use(
      http.post('/api/users/3/invitation', () => {
        resent = true;
        return HttpResponse.json({ message: 'Sent.' }, { status: 202 });
      }),
    );
    const { user } = renderApp('/people');

    await user.click(await screen.findByRole('button', { name: 'Resend invitation to Cleo Ferrand' }));

    expect(await screen.findByText('Invitation sent again to cleo.ferrand@lab.example.')).toBeInTheDocument();
    expect(resent).toBe(true);
    expect(within(rowOf('Mika Sato')).queryByRole('button', { name: /Resend/ })).not.toBeInTheDocument();
  });

  it('when the admin filters and sorts, then the table shows the matching people in that order', async () => {
    withPeople();
    const { user } = renderApp('/people');

    expect(await screen.findAllByRole('rowheader')).toHaveLength(3);
    expect(bodyNames()).toEqual(['Cleo Ferrand', 'Mika Sato', 'Robin Vale(you)']);

    await user.click(screen.getByRole('button', { name: 'Role' }));
    expect(bodyNames()).toEqual(['Robin Vale(you)', 'Mika Sato', 'Cleo Ferrand']);
    expect(screen.getByRole('columnheader', { name: 'Role' })).toHaveAttribute('aria-sort', 'ascending');

    await user.type(screen.getByLabelText('Filter people'), 'SATO');
    expect(bodyNames()).toEqual(['Mika Sato']);
    expect(screen.getByText('1 of 3 people shown')).toBeInTheDocument();
  });

  it('when the admin looks at their own row, then they cannot deactivate themselves', async () => {
    withPeople();
    renderApp('/people');

    await screen.findAllByRole('rowheader');
    const ownRow = rowOf('Robin Vale');
    expect(within(ownRow).queryByRole('button', { name: /Deactivate/ })).not.toBeInTheDocument();
    expect(within(ownRow).getByLabelText('Role for Robin Vale')).toBeDisabled();
  });
});
