import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aLot, anInk, aSubstrate } from '../../../../test/catalogue-records';
import { catalogueLists } from '../testing/catalogue-fixtures';

const LOTS = [
  aLot({ id: 1, lotNumber: 'AN9-2609', status: { flags: ['expired', 'past-pot-life'], usable: false, messages: ['Expired on 2026-11-30.'] } }),
  aLot({ id: 2, lotNumber: 'AN9-2611' }),
  aLot({ id: 3, lotNumber: 'TPU-0042', materialType: 'substrate', materialId: 4, materialName: 'Stretch TPU 50' }),
];

const rowOf = (lot: string) => screen.getByRole('link', { name: lot }).closest('tr') as HTMLElement;

describe('lots page', () => {
  it('when lots carry flags, then each flag reads as a word beside its icon, and clean lots read "Usable"', async () => {
    server.use(...signedInAs('quality'), ...catalogueLists({ lots: LOTS }));
    renderApp('/materials/lots');

    expect(await screen.findByRole('link', { name: 'AN9-2609' })).toBeInTheDocument();
    expect(within(rowOf('AN9-2609')).getByText('Expired')).toBeInTheDocument();
    expect(within(rowOf('AN9-2609')).getByText('Past pot life')).toBeInTheDocument();
    expect(within(rowOf('AN9-2611')).getByText('Usable')).toBeInTheDocument();
    expect(within(rowOf('TPU-0042')).getByText('Stretch TPU 50')).toBeInTheDocument();
  });

  it('when an engineer records a lot of a substrate, then the body names the substrate and leaves unknown dates null', async () => {
    let sent: unknown;
    server.use(
      ...signedInAs('engineer'),
      ...catalogueLists({ inks: [anInk({ id: 1 })], substrates: [aSubstrate({ id: 4, name: 'Stretch TPU 50' })], lots: LOTS }),
      http.post('/api/lots', async ({ request }) => {
        sent = await request.json();
        const saved = aLot({ id: 9, lotNumber: 'TPU-0043', materialType: 'substrate', materialId: 4, materialName: 'Stretch TPU 50' });
        server.use(http.get('/api/lots/9', () => HttpResponse.json(saved)));
        return HttpResponse.json(saved, { status: 201 });
      }),
    );
    const { user } = renderApp('/materials/lots/new');

    await user.click(await screen.findByRole('radio', { name: 'Substrate' }));
    await user.selectOptions(screen.getByLabelText('Which substrate'), 'Stretch TPU 50');
    await user.type(screen.getByLabelText('Lot number'), 'TPU-0043');
    await user.type(screen.getByLabelText('Received'), '2026-11-28');
    await user.click(screen.getByRole('button', { name: 'Save lot' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Lot TPU-0043' })).toBeInTheDocument();
    expect(sent).toEqual({
      materialType: 'substrate',
      materialId: 4,
      lotNumber: 'TPU-0043',
      receivedOn: '2026-11-28',
      openedOn: null,
      expiresOn: null,
      notes: '',
    });
  });

  it('when no material is picked, then the form asks for one and sends nothing', async () => {
    let calls = 0;
    server.use(
      ...signedInAs('engineer'),
      ...catalogueLists({ inks: [anInk({ id: 1 })] }),
      http.post('/api/lots', () => ((calls += 1), HttpResponse.json({}))),
    );
    const { user } = renderApp('/materials/lots/new');

    await user.type(await screen.findByLabelText('Lot number'), 'X-1');
    await user.type(screen.getByLabelText('Received'), '2026-11-28');
    await user.click(screen.getByRole('button', { name: 'Save lot' }));

    expect(await screen.findByText('Pick the material of this lot.')).toBeInTheDocument();
    expect(calls).toBe(0);
  });
});
