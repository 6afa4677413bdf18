import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { anInk } from '../../../../test/catalogue-records';
import { catalogueLists } from '../testing/catalogue-fixtures';

const INKS = [
  anInk({ id: 1, name: 'Argent nano A9', viscosityMilliPaS: 11, manufacturer: 'Larkspur Inks' }),
  anInk({ id: 2, name: 'Carbon trace C2', viscosityMilliPaS: 4.5, manufacturer: 'Soot & Co' }),
  anInk({ id: 3, name: 'Dielectric cover D1', function: 'dielectric', viscosityMilliPaS: 22, manufacturer: 'Larkspur Inks' }),
  anInk({ id: 4, name: 'Old silver S0', viscosityMilliPaS: 9, archived: true }),
];

const rowNames = () => screen.getAllByRole('rowheader').map((cell) => within(cell).getByRole('link').textContent);

// The ink page is loaded lazily with the chart library; load it once here, so no test's own
// wait is spent compiling it.
beforeAll(async () => {
  await import('./ink-detail-page');
}, 30_000);

describe('inks page', () => {
  it('when the table is sorted by viscosity and filtered, then it shows the matching inks in that order', async () => {
    server.use(...signedInAs('engineer'), ...catalogueLists({ inks: INKS }));
    const { user } = renderApp('/materials/inks');

    expect(await screen.findAllByRole('rowheader')).toHaveLength(3);
    expect(rowNames()).toEqual(['Argent nano A9', 'Carbon trace C2', 'Dielectric cover D1']);

    await user.click(screen.getByRole('button', { name: /Viscosity/ }));
    expect(rowNames()).toEqual(['Carbon trace C2', 'Argent nano A9', 'Dielectric cover D1']);
    expect(screen.getByRole('columnheader', { name: /Viscosity/ })).toHaveAttribute('aria-sort', 'ascending');

    await user.click(screen.getByRole('button', { name: /Viscosity/ }));
    expect(rowNames()).toEqual(['Dielectric cover D1', 'Argent nano A9', 'Carbon trace C2']);

    await user.type(screen.getByLabelText('Filter inks'), 'larkspur');
    expect(rowNames()).toEqual(['Dielectric cover D1', 'Argent nano A9']);
    expect(screen.getByText('2 of 3 inks shown')).toBeInTheDocument();
  });

  it('when "Show archived" is ticked, then archived inks join the table, marked as archived', async () => {
    server.use(...signedInAs('engineer'), ...catalogueLists({ inks: INKS }));
    const { user } = renderApp('/materials/inks');

    await screen.findAllByRole('rowheader');
    expect(screen.queryByRole('link', { name: 'Old silver S0' })).not.toBeInTheDocument();

    await user.click(screen.getByRole('checkbox', { name: 'Show archived' }));

    const row = screen.getByRole('link', { name: 'Old silver S0' }).closest('tr') as HTMLElement;
    expect(within(row).getByText('Archived')).toBeInTheDocument();
    expect(screen.getByText('4 inks')).toBeInTheDocument();
  });

  it('when a row is clicked, then the ink’s page opens', async () => {
    server.use(
      ...signedInAs('engineer'),
      ...catalogueLists({ inks: INKS }),
      http.get('/api/inks/2', () => HttpResponse.json(INKS[1])),
      http.get('/api/inks/2/printability', () =>
        HttpResponse.json({ inkId: 2, inkName: 'Carbon trace C2', solidsVolumeFraction: null, solidsVolumeFractionNote: '', printers: [] }),
      ),
    );
    const { user } = renderApp('/materials/inks');

    await user.click(await screen.findByRole('cell', { name: 'Soot & Co' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Carbon trace C2' })).toBeInTheDocument();
  });
});
