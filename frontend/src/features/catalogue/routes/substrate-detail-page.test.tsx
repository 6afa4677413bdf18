import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import type { SubstrateWetting } from '@tracewright/shared';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aSubstrate } from '../../../../test/catalogue-records';
import { catalogueLists } from '../testing/catalogue-fixtures';

const SUBSTRATE = aSubstrate({ id: 4, name: 'Stretch TPU 50', waterContactAngleDeg: 72.5, diiodomethaneContactAngleDeg: 27 });
const WETTING: SubstrateWetting = {
  substrateId: 4,
  substrateName: 'Stretch TPU 50',
  surfaceEnergy: { source: 'owrk-contact-angles', dispersiveMilliNPerM: 45.4, polarMilliNPerM: 4.9, totalMilliNPerM: 50.4 },
  surfaceEnergyNote: 'From contact angles by OWRK (Owens & Wendt 1969).',
  requiredMarginMilliNPerM: 10,
  inks: [
    { inkId: 1, inkName: 'Thin ink', inkSurfaceTensionMilliNPerM: 45, margin: { marginMilliNPerM: 5.4, ok: false }, predictedContactAngleDeg: null, reasons: ['Short of the margin.'] },
    { inkId: 2, inkName: 'Unknown ink', inkSurfaceTensionMilliNPerM: 30, margin: null, predictedContactAngleDeg: null, reasons: ['Unknown.'] },
    { inkId: 3, inkName: 'Wetting ink', inkSurfaceTensionMilliNPerM: 28, margin: { marginMilliNPerM: 22.4, ok: true }, predictedContactAngleDeg: 0, reasons: ['Should wet.'] },
  ],
};

function substratePage() {
  server.use(
    ...signedInAs('engineer'),
    ...catalogueLists({ substrates: [SUBSTRATE] }),
    http.get('/api/substrates/4', () => HttpResponse.json(SUBSTRATE)),
    http.get('/api/substrates/4/wetting', () => HttpResponse.json(WETTING)),
  );
  return renderApp('/materials/substrates/4');
}

describe('substrate page', () => {
  it('when opened, then inks are listed widest margin first with their result as words', async () => {
    substratePage();

    const table = await screen.findByRole('table', { name: /sorted by wetting margin/ });
    const names = within(table).getAllByRole('rowheader').map((cell) => cell.textContent);
    expect(names).toEqual(['Wetting ink', 'Thin ink', 'Unknown ink']);
    const rowOf = (ink: string) => within(table).getByRole('rowheader', { name: ink }).closest('tr') as HTMLElement;
    expect(within(rowOf('Wetting ink')).getByText('Wets')).toBeInTheDocument();
    expect(within(rowOf('Thin ink')).getByText('Poor wetting')).toBeInTheDocument();
    expect(within(rowOf('Unknown ink')).getByText('Unknown')).toBeInTheDocument();
  });

  it('when opened, then angles read with the degree sign on the number and other units apart', async () => {
    substratePage();

    const properties = within(await screen.findByRole('region', { name: 'Properties' }));
    expect(properties.getByText('Water contact angle').nextElementSibling).toHaveTextContent(/^72\.5°$/);
    expect(properties.getByText('Thickness').nextElementSibling).toHaveTextContent(/^50 µm$/);
  });

  it('when new angles are typed in the check panel, then the surface energy follows them at once', async () => {
    const { user } = substratePage();

    const result = await screen.findByRole('status', { name: 'Surface energy from these angles' });
    // The shared function's worked example: 72.5° and 27° give 45.4 + 4.95 = 50.4 mN/m.
    expect(result).toHaveTextContent('Total50.4 mN/m');
    const water = screen.getByLabelText('Water contact angle (°)');
    await user.clear(water);
    expect(result).toHaveTextContent('Type both angles to see the surface energy.');
    await user.type(water, '190');
    expect(result).toHaveTextContent('Contact angles run from 0° to 180°.');
  });
});
