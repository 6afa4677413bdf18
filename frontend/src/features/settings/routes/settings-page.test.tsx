import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import type { LabSettings } from '@tracewright/shared';

import { apiError, LAB_SETTINGS, sessionFor } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';

function adminWithSettings() {
  server.use(
    http.get('/api/auth/session', () => HttpResponse.json(sessionFor('admin'))),
    http.get('/api/settings', () => HttpResponse.json(LAB_SETTINGS)),
  );
}

describe('lab settings page', () => {
  it('when the admin saves new settings, then they are sent and the header shows the new lab name', async () => {
    adminWithSettings();
    let sent: unknown;
    server.use(
      http.put('/api/settings', async ({ request }) => {
        const body = (await request.json()) as LabSettings;
        sent = body;
        return HttpResponse.json(body);
      }),
    );
    const { user } = renderApp('/settings');

    const name = await screen.findByLabelText('Lab name');
    expect(name).toHaveValue('Stretch Lab North');
    await user.clear(name);
    await user.type(name, 'Soft Circuits Annex');
    await user.clear(screen.getByLabelText('Time zone'));
    await user.type(screen.getByLabelText('Time zone'), 'America/Chicago');
    await user.click(screen.getByRole('radio', { name: /Letter/ }));
    await user.click(screen.getByRole('button', { name: 'Save settings' }));

    expect(await screen.findByText('Lab settings saved.')).toBeInTheDocument();
    expect(sent).toEqual({ labName: 'Soft Circuits Annex', timeZone: 'America/Chicago', paperSize: 'Letter' });
    expect(within(screen.getByRole('banner')).getByText('Soft Circuits Annex')).toBeInTheDocument();
  });

  it('when the time zone is not a real zone, then it is refused at the field before sending', async () => {
    adminWithSettings();
    let calls = 0;
    server.use(
      http.put('/api/settings', () => {
        calls += 1;
        return apiError(400, 'VALIDATION_FAILED', 'No.');
      }),
    );
    const { user } = renderApp('/settings');

    const zone = await screen.findByLabelText('Time zone');
    await user.clear(zone);
    await user.type(zone, 'Mars/Olympus');
    await user.click(screen.getByRole('button', { name: 'Save settings' }));

    expect(await screen.findByText('Use a time zone name such as Europe/Berlin or America/Chicago.')).toBeInTheDocument();
    expect(zone).toHaveAttribute('aria-invalid', 'true');
    expect(calls).toBe(0);
  });
});
