import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { apiError, signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { anInk, aPrinter } from '../../../../test/catalogue-records';
import { catalogueLists } from '../testing/catalogue-fixtures';

const INKS = [anInk({ id: 1, name: 'Argent nano A9' }), anInk({ id: 2, name: 'Dielectric cover D1' }), anInk({ id: 3, name: 'Retired ink', archived: true })];
const PRINTER = aPrinter({ id: 6, name: 'Bench jetter', version: 3, channels: [{ name: 'A', inkId: 1 }] });

function editingPrinter() {
  server.use(...signedInAs('engineer'), ...catalogueLists({ inks: INKS, printers: [PRINTER] }), http.get('/api/printers/6', () => HttpResponse.json(PRINTER)));
  return renderApp('/equipment/printers/6/edit');
}

describe('printer form', () => {
  it('when channels are added and removed, then the saved body lists exactly the remaining ones, in order', async () => {
    const { user } = editingPrinter();
    let sent: unknown;
    server.use(
      http.put('/api/printers/6', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json({ ...PRINTER, ...(sent as object), version: 4 });
      }),
    );

    await user.click(await screen.findByRole('button', { name: 'Add a channel' }));
    await user.type(screen.getByLabelText('Name of channel 2'), 'B');
    await user.selectOptions(screen.getByLabelText('Ink in channel 2'), 'Dielectric cover D1');
    await user.click(screen.getByRole('button', { name: 'Add a channel' }));
    await user.type(screen.getByLabelText('Name of channel 3'), 'C');
    expect(screen.getAllByRole('group', { name: /^Channel \d$/ })).toHaveLength(3);

    await user.click(screen.getByRole('button', { name: 'Remove channel 1' }));
    expect(screen.getAllByRole('group', { name: /^Channel \d$/ })).toHaveLength(2);
    expect(screen.getByLabelText('Name of channel 1')).toHaveValue('B');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Bench jetter' })).toBeInTheDocument();
    expect(sent).toMatchObject({ version: 3, channels: [{ name: 'B', inkId: 2 }, { name: 'C', inkId: null }] });
  });

  it('when one channel is left, then it cannot be removed, and archived inks are not offered for loading', async () => {
    editingPrinter();

    const only = await screen.findByRole('group', { name: 'Channel 1' });
    expect(within(only).queryByRole('button', { name: /Remove/ })).not.toBeInTheDocument();
    const options = within(screen.getByLabelText('Ink in channel 1')).getAllByRole('option').map((o) => o.textContent);
    expect(options).toEqual(['Empty', 'Argent nano A9', 'Dielectric cover D1']);
  });

  it('when two channels share a name, then the schema says so before anything is sent', async () => {
    const { user } = editingPrinter();
    await user.click(await screen.findByRole('button', { name: 'Add a channel' }));
    await user.type(screen.getByLabelText('Name of channel 2'), 'a');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    expect(await screen.findByText('Channel names must differ.')).toBeInTheDocument();
  });

  it('when the server refuses a channel’s ink (422), then its message shows in the channels section', async () => {
    const { user } = editingPrinter();
    const message = 'Channel A: there is no ink with id 1. Pick an ink from the list.';
    server.use(http.put('/api/printers/6', () => apiError(422, 'UNPROCESSABLE', message, { formErrors: [], fieldErrors: { channels: [message] } })));

    await user.click(await screen.findByRole('button', { name: 'Save changes' }));

    expect(await screen.findByText(message)).toBeInTheDocument();
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });
});
