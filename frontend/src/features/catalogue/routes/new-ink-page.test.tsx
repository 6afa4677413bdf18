import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';

import { apiError, signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { anInk } from '../../../../test/catalogue-records';
import { catalogueLists } from '../testing/catalogue-fixtures';

function engineerOnNewInk() {
  server.use(
    ...signedInAs('engineer'),
    ...catalogueLists({}),
    http.get('/api/inks/7/printability', () =>
      HttpResponse.json({ inkId: 7, inkName: 'Dielectric cover D3', solidsVolumeFraction: null, solidsVolumeFractionNote: '', printers: [] }),
    ),
  );
  return renderApp('/materials/inks/new');
}

// The ink page is loaded lazily with the chart library; load it once here, so no test's own
// wait is spent compiling it.
beforeAll(async () => {
  await import('./ink-detail-page');
}, 30_000);

describe('new ink form', () => {
  it('when required values are missing or inconsistent, then the schema’s messages show at their fields and nothing is sent', async () => {
    const { user } = engineerOnNewInk();
    let calls = 0;
    server.use(http.post('/api/inks', () => ((calls += 1), HttpResponse.json({}))));

    await user.type(await screen.findByLabelText('Name'), 'Argent test');
    await user.type(screen.getByLabelText('Viscosity (mPa·s)'), 'thick');
    await user.type(screen.getByLabelText('Surface tension (mN/m)'), '30');
    await user.type(screen.getByLabelText('Density (kg/m³)'), '1400');
    await user.type(screen.getByLabelText('Solids (wt%)'), '25');
    await user.click(screen.getByRole('button', { name: 'Save ink' }));

    expect(await screen.findByText('Viscosity must be a number in mPa·s.')).toBeInTheDocument();
    expect(screen.getByLabelText('Viscosity (mPa·s)')).toHaveAttribute('aria-invalid', 'true');
    await user.clear(screen.getByLabelText('Viscosity (mPa·s)'));
    await user.type(screen.getByLabelText('Viscosity (mPa·s)'), '9,5');
    await user.click(screen.getByRole('button', { name: 'Save ink' }));

    expect(await screen.findByText('A conductor needs its sheet resistance per pass.')).toBeInTheDocument();
    expect(calls).toBe(0);
  });

  it('when the server refuses a field, then its message appears under that field', async () => {
    const { user } = engineerOnNewInk();
    server.use(
      http.post('/api/inks', () =>
        apiError(400, 'VALIDATION_FAILED', 'Check the highlighted fields.', {
          formErrors: [],
          fieldErrors: { name: ['An ink with this name already exists; add the batch or supplier to tell them apart.'] },
        }),
      ),
    );

    await user.type(await screen.findByLabelText('Name'), 'Dielectric cover D3');
    await user.selectOptions(screen.getByLabelText('Function'), 'Dielectric');
    await user.type(screen.getByLabelText('Viscosity (mPa·s)'), '14');
    await user.type(screen.getByLabelText('Surface tension (mN/m)'), '33');
    await user.type(screen.getByLabelText('Density (kg/m³)'), '1100');
    await user.type(screen.getByLabelText('Solids (wt%)'), '40');
    await user.click(screen.getByRole('button', { name: 'Save ink' }));

    expect(await screen.findByText('An ink with this name already exists; add the batch or supplier to tell them apart.')).toBeInTheDocument();
    expect(screen.getByLabelText('Name')).toHaveAttribute('aria-invalid', 'true');
  });

  it('when a valid ink with a solvent is saved, then the body carries its numbers, nulls and hazard data and its page opens', async () => {
    const { user } = engineerOnNewInk();
    let sent: unknown;
    server.use(
      http.post('/api/inks', async ({ request }) => {
        sent = await request.json();
        const saved = anInk({ ...(sent as object), id: 7 });
        server.use(http.get('/api/inks/7', () => HttpResponse.json(saved)));
        return HttpResponse.json(saved, { status: 201 });
      }),
    );

    await user.type(await screen.findByLabelText('Name'), 'Dielectric cover D3');
    await user.selectOptions(screen.getByLabelText('Function'), 'Dielectric');
    await user.type(screen.getByLabelText('Viscosity (mPa·s)'), '14');
    await user.type(screen.getByLabelText('Surface tension (mN/m)'), '33,5');
    await user.type(screen.getByLabelText('Density (kg/m³)'), '1100');
    await user.type(screen.getByLabelText('Solids (wt%)'), '40');
    await user.click(screen.getByRole('button', { name: 'Add a solvent' }));
    const solvent = screen.getByRole('group', { name: 'Solvent 1' });
    await user.type(within(solvent).getByLabelText('Solvent name'), 'Ethanol');
    await user.type(within(solvent).getByLabelText('CAS number'), '64-17-5');
    await user.type(within(solvent).getByLabelText('Hazard codes'), 'h225, H319');
    await user.click(within(solvent).getByRole('checkbox', { name: /GHS02/ }));
    await user.click(within(solvent).getByRole('checkbox', { name: /GHS07/ }));
    await user.selectOptions(within(solvent).getByLabelText('Signal word'), 'Danger');
    await user.click(screen.getByRole('button', { name: 'Save ink' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Dielectric cover D3' })).toBeInTheDocument();
    expect(sent).toMatchObject({
      name: 'Dielectric cover D3',
      function: 'dielectric',
      viscosityMilliPaS: 14,
      surfaceTensionMilliNPerM: 33.5,
      densityKgPerM3: 1100,
      solidsWtPercent: 40,
      sheetResistanceOhmPerSq: null,
      potLifeHours: null,
      solvents: [{ name: 'Ethanol', casNumber: '64-17-5', hazardCodes: ['H225', 'H319'], pictograms: ['GHS02', 'GHS07'], signalWord: 'Danger' }],
    });
    expect(sent).not.toHaveProperty('version');
  });

  it('when a solvent row is removed, then it is not sent', async () => {
    const { user } = engineerOnNewInk();
    await user.click(await screen.findByRole('button', { name: 'Add a solvent' }));
    await user.type(screen.getByLabelText('Solvent name'), 'Ethanol');
    expect(screen.getByRole('group', { name: 'Solvent 1: Ethanol' })).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Remove Ethanol' }));

    expect(screen.queryByRole('group', { name: /Solvent 1/ })).not.toBeInTheDocument();
    expect(screen.getByText('No solvents recorded.')).toBeInTheDocument();
  });
});
