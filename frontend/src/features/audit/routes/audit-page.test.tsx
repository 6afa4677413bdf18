import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import type { AuditEvent } from '@tracewright/shared';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';

const EVENT: AuditEvent = {
  id: 41,
  at: '2026-12-01T10:15:00Z',
  actorId: 1,
  actorName: 'Robin Vale',
  action: 'user.role-changed',
  entityType: 'user',
  entityId: '7',
  before: { role: 'operator' },
  after: { role: 'quality' },
  reason: null,
};

/** Answers every page with one event and `total`, and records each query string asked for. */
function auditAnswers(total: number) {
  const asked: URLSearchParams[] = [];
  server.use(
    ...signedInAs('quality'),
    http.get('/api/audit-events', ({ request }) => {
      asked.push(new URL(request.url).searchParams);
      return HttpResponse.json({ events: [EVENT], total });
    }),
  );
  return asked;
}

describe('audit log page', () => {
  it('when a row is expanded, then the values before and after show as compact JSON', async () => {
    auditAnswers(1);
    const { user } = renderApp('/audit');

    const toggle = await screen.findByRole('button', { name: /Show changes/ });
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    await user.click(toggle);

    expect(toggle).toHaveAttribute('aria-expanded', 'true');
    expect(screen.getByText('{"role":"operator"}')).toBeInTheDocument();
    expect(screen.getByText('{"role":"quality"}')).toBeInTheDocument();
  });

  it('when there are more events than fit, then "Next page" asks the server for the following page', async () => {
    const asked = auditAnswers(120);
    const { user, router } = renderApp('/audit?pageSize=50');

    expect(await screen.findByText(/page 1 of 3/)).toBeInTheDocument();
    const pager = screen.getByRole('navigation', { name: 'Audit pages' });
    expect(within(pager).queryByRole('link', { name: /Previous page/ })).not.toBeInTheDocument();
    await user.click(within(pager).getByRole('link', { name: /Next page/ }));

    expect(await screen.findByText(/page 2 of 3/)).toBeInTheDocument();
    expect(router.state.location.search).toBe('?pageSize=50&page=2');
    expect(asked.at(-1)?.get('page')).toBe('2');
    expect(asked.at(-1)?.get('pageSize')).toBe('50');
  });

  it('when filters are applied, then the server is asked for that record type and action from page 1', async () => {
    const asked = auditAnswers(1);
    const { user } = renderApp('/audit?page=4');

    await user.type(await screen.findByLabelText('Record type'), 'user');
    await user.type(screen.getByLabelText('Action'), 'user.invited');
    await user.click(screen.getByRole('button', { name: 'Apply filters' }));

    await screen.findByDisplayValue('user.invited');
    const last = asked.at(-1);
    expect(last?.get('entityType')).toBe('user');
    expect(last?.get('action')).toBe('user.invited');
    expect(last?.get('page')).toBe('1');
  });
});
