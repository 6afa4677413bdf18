import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import type { InstrumentView } from '@tracewright/shared';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aPrinter } from '../../../../test/catalogue-records';
import { catalogueLists } from '../testing/catalogue-fixtures';

const anInstrument = (id: number, name: string, state: InstrumentView['status']['state'], due: string | null): InstrumentView => ({
  id,
  name,
  kind: 'multimeter',
  serialNumber: `SN-${id}`,
  calibrationDueOn: due,
  notes: '',
  version: 1,
  archived: false,
  updatedAt: '2026-11-20T08:00:00Z',
  status: { state, message: `Status ${state}.` },
});

const INSTRUMENTS = [
  anInstrument(1, 'Bench meter', 'ok', '2027-06-01'),
  anInstrument(2, 'Four-point head', 'overdue', '2026-10-01'),
  anInstrument(3, 'Goniometer', 'due-soon', '2026-12-10'),
  anInstrument(4, 'Loupe', 'not-tracked', null),
];

describe('equipment pages', () => {
  it('when instruments are listed, then each calibration status reads as a word, and sorting puts overdue first', async () => {
    server.use(...signedInAs('operator'), http.get('/api/instruments', () => HttpResponse.json({ instruments: INSTRUMENTS })));
    const { user } = renderApp('/equipment/instruments');

    const rowOf = (name: string) => screen.getByRole('link', { name }).closest('tr') as HTMLElement;
    expect(within(await screen.findByRole('row', { name: /Bench meter/ })).getByText('OK')).toBeInTheDocument();
    expect(within(rowOf('Four-point head')).getByText('Overdue')).toBeInTheDocument();
    expect(within(rowOf('Goniometer')).getByText('Due soon')).toBeInTheDocument();
    expect(within(rowOf('Loupe')).getByText('Not tracked')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Calibration' }));
    const names = screen.getAllByRole('rowheader').map((cell) => within(cell).getByRole('link').textContent);
    expect(names).toEqual(['Four-point head', 'Goniometer', 'Bench meter', 'Loupe']);
  });

  it('when an operator opens the equipment and a printer, then no new, edit or archive action is offered', async () => {
    const printer = aPrinter({ id: 6, name: 'Bench jetter' });
    server.use(...signedInAs('operator'), ...catalogueLists({ printers: [printer] }), http.get('/api/printers/6', () => HttpResponse.json(printer)));
    const { user } = renderApp('/equipment');

    expect(await screen.findByRole('heading', { level: 1, name: 'Printers' })).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'New printer' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('link', { name: 'Bench jetter' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Bench jetter' })).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Edit' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Archive' })).not.toBeInTheDocument();
  });

  it('when an operator types a form address, then the page explains it is not for their role', async () => {
    server.use(...signedInAs('operator'), ...catalogueLists({}));
    renderApp('/equipment/printers/new');

    expect(await screen.findByRole('heading', { name: 'This page is not for your role' })).toBeInTheDocument();
  });
});
