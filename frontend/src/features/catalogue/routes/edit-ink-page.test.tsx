import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { apiError, signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { anInk } from '../../../../test/catalogue-records';
import { catalogueLists } from '../testing/catalogue-fixtures';

const INK = anInk({ id: 3, name: 'Argent nano A9', version: 4, viscosityMilliPaS: 11 });

describe('edit ink form', () => {
  it('when someone else saved first (409), then the conflict is explained and every edit stays in the form', async () => {
    let sent: unknown;
    server.use(
      ...signedInAs('engineer'),
      ...catalogueLists({ inks: [INK] }),
      http.get('/api/inks/3', () => HttpResponse.json(INK)),
      http.put('/api/inks/3', async ({ request }) => {
        sent = await request.json();
        return apiError(409, 'CONFLICT', 'Someone else saved this ink first (it is now at version 5).', { currentVersion: 5 });
      }),
    );
    const { user } = renderApp('/materials/inks/3/edit');

    const name = await screen.findByLabelText('Name');
    expect(name).toHaveValue('Argent nano A9');
    await user.clear(name);
    await user.type(name, 'Argent nano A9 (warm room)');
    await user.clear(screen.getByLabelText('Viscosity (mPa·s)'));
    await user.type(screen.getByLabelText('Viscosity (mPa·s)'), '9.8');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'Someone else saved this ink first; reload to see their changes — your edits are still in the form.',
    );
    expect(sent).toMatchObject({ name: 'Argent nano A9 (warm room)', viscosityMilliPaS: 9.8, version: 4 });
    expect(screen.getByLabelText('Name')).toHaveValue('Argent nano A9 (warm room)');
    expect(screen.getByLabelText('Viscosity (mPa·s)')).toHaveValue('9.8');
  });
});
