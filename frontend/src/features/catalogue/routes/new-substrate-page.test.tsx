import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aSubstrate } from '../../../../test/catalogue-records';
import { catalogueLists } from '../testing/catalogue-fixtures';

describe('new substrate form', () => {
  it('when contact angles are typed, then their surface energy shows at once and the body carries the angles, parts left null', async () => {
    let sent: unknown;
    server.use(
      ...signedInAs('admin'),
      ...catalogueLists({}),
      http.post('/api/substrates', async ({ request }) => {
        sent = await request.json();
        const saved = aSubstrate({ ...(sent as object), id: 8 });
        server.use(
          http.get('/api/substrates/8', () => HttpResponse.json(saved)),
          http.get('/api/substrates/8/wetting', () =>
            HttpResponse.json({ substrateId: 8, substrateName: saved.name, surfaceEnergy: null, surfaceEnergyNote: '', requiredMarginMilliNPerM: 10, inks: [] }),
          ),
        );
        return HttpResponse.json(saved, { status: 201 });
      }),
    );
    const { user } = renderApp('/materials/substrates/new');

    await user.type(await screen.findByLabelText('Name'), 'Clear PET 125');
    await user.selectOptions(screen.getByLabelText('Class'), 'PET film');
    await user.type(screen.getByLabelText('Thickness (µm)'), '125');
    const preview = screen.getByRole('status', { name: 'Surface energy from the angles' });
    expect(preview).toHaveTextContent('Type both angles to see the surface energy.');
    await user.type(screen.getByLabelText('Water contact angle (°)'), '72.5');
    await user.type(screen.getByLabelText('Diiodomethane contact angle (°)'), '27');
    // The shared function's worked example: 72.5° and 27° give 45.4 + 4.95 = 50.4 mN/m.
    expect(preview).toHaveTextContent('Total50.4 mN/m');
    await user.type(screen.getByLabelText('Continuous maximum temperature (°C)'), '120');
    await user.type(screen.getByLabelText('Short-exposure maximum temperature (°C)'), '150');
    await user.type(screen.getByLabelText('Short-exposure time (s)'), '60');
    await user.click(screen.getByRole('button', { name: 'Save substrate' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Clear PET 125' })).toBeInTheDocument();
    expect(sent).toMatchObject({
      substrateClass: 'pet-film',
      thicknessUm: 125,
      waterContactAngleDeg: 72.5,
      diiodomethaneContactAngleDeg: 27,
      surfaceEnergyDispersiveMilliNPerM: null,
      surfaceEnergyPolarMilliNPerM: null,
      maxContinuousTempC: 120,
      maxShortExposureTempC: 150,
      maxShortExposureSeconds: 60,
      isTransferCarrier: false,
    });
  });

  it('when the short-exposure maximum is below the continuous one, then the schema’s message shows at that field', async () => {
    server.use(...signedInAs('engineer'), ...catalogueLists({}));
    const { user } = renderApp('/materials/substrates/new');

    await user.type(await screen.findByLabelText('Name'), 'Tattoo sheet');
    await user.type(screen.getByLabelText('Thickness (µm)'), '30');
    await user.type(screen.getByLabelText('Continuous maximum temperature (°C)'), '130');
    await user.type(screen.getByLabelText('Short-exposure maximum temperature (°C)'), '100');
    await user.type(screen.getByLabelText('Short-exposure time (s)'), '10');
    await user.click(screen.getByRole('button', { name: 'Save substrate' }));

    expect(await screen.findByText('The short-exposure maximum cannot be below the continuous maximum.')).toBeInTheDocument();
  });
});
