import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it } from 'vitest';

import type { Role } from '@tracewright/shared';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aLot, anInk } from '../../../../test/catalogue-records';
import { aFit, catalogueLists } from '../testing/catalogue-fixtures';

const INK = anInk({
  id: 5,
  name: 'Argent nano A9',
  solvents: [{ name: 'Ethanol', casNumber: '64-17-5', hazardCodes: ['H225', 'H319'], pictograms: ['GHS02'], signalWord: 'Danger' }],
});
const PRINTABILITY = {
  inkId: 5,
  inkName: 'Argent nano A9',
  solidsVolumeFraction: null,
  solidsVolumeFractionNote: 'Record the solids density to estimate how much of the wet film stays as solids.',
  printers: [
    aFit({ id: 1, name: 'Bench jetter' }, { verdict: 'jettable', reasons: ['Z = 6.8 is inside the printable window 1 < Z < 10 (Reis & Derby 2000).'] }),
    aFit(
      { id: 2, name: 'Wide nozzle rig' },
      { z: 12.5, weber: 30, verdict: 'satellites', reasons: ['Z = 12.5 is above the printable window 1 < Z < 10 (Reis & Derby 2000): expect satellite drops.'] },
      { verdict: 'jettable', reasons: ['Z = 12.5 is inside the printable window 4 ≤ Z ≤ 14 (Jang, Kim & Moon 2009).'] },
    ),
  ],
};
const LOTS = [
  aLot({ id: 1, materialId: 5, lotNumber: 'AN9-2609', expiresOn: '2026-11-30', status: { flags: ['expired'], usable: false, messages: ['Expired on 2026-11-30.'] } }),
  aLot({ id: 2, materialId: 5, lotNumber: 'AN9-2611', status: { flags: ['past-pot-life'], usable: false, messages: [] } }),
  aLot({ id: 3, materialId: 99, lotNumber: 'OTHER-1' }),
];

function inkPageAs(role: Role) {
  server.use(
    ...signedInAs(role),
    ...catalogueLists({ inks: [INK], lots: LOTS }),
    http.get('/api/inks/5', () => HttpResponse.json(INK)),
    http.get('/api/inks/5/printability', () => HttpResponse.json(PRINTABILITY)),
  );
  return renderApp('/materials/inks/5');
}

const cardOf = (printer: string) => screen.getByRole('link', { name: printer }).closest('li') as HTMLElement;

// The ink page is loaded lazily with the chart library; load it once here, so no test's own
// wait is spent compiling it.
beforeAll(async () => {
  await import('./ink-detail-page');
}, 30_000);

describe('ink page', () => {
  it('when the ink is opened, then each printer shows its verdict in words, its reasons and a Z–We chart', async () => {
    const { container } = inkPageAs('engineer');

    expect(await screen.findByRole('heading', { level: 1, name: 'Argent nano A9' })).toBeInTheDocument();
    const bench = cardOf('Bench jetter');
    expect(within(bench).getByText('Jettable')).toBeInTheDocument();
    expect(within(bench).getByText('Z = 6.8 is inside the printable window 1 < Z < 10 (Reis & Derby 2000).')).toBeInTheDocument();
    const wide = cardOf('Wide nozzle rig');
    expect(within(wide).getByText('Satellite drops likely')).toBeInTheDocument();
    expect(within(wide).getByRole('figure', { name: 'Argent nano A9 through Wide nozzle rig: Z–We plane' })).toHaveAccessibleDescription(
      /Z = 12.5, We = 30.*Verdict: Satellite drops likely\./,
    );
    expect(container.querySelectorAll('figure svg.recharts-surface')).toHaveLength(2);
    expect(screen.getByText('With 1 < Z < 10: jettable through 1 of 2 printers.')).toHaveAttribute('role', 'status');
  });

  it('when the alternative window is picked, then verdicts, reasons and the summary follow it', async () => {
    const { user } = inkPageAs('engineer');

    await user.click(await screen.findByRole('radio', { name: /4 ≤ Z ≤ 14/ }));

    const wide = cardOf('Wide nozzle rig');
    expect(within(wide).getByText('Jettable')).toBeInTheDocument();
    expect(within(wide).getByText('Z = 12.5 is inside the printable window 4 ≤ Z ≤ 14 (Jang, Kim & Moon 2009).')).toBeInTheDocument();
    expect(screen.getByText('With 4 ≤ Z ≤ 14: jettable through 2 of 2 printers.')).toBeInTheDocument();
  });

  it('when the ink has solvents and flagged lots, then cautions read as words and each lot’s flags show as words', async () => {
    inkPageAs('operator');

    const cautions = await screen.findByRole('region', { name: 'Solvents and cautions' });
    expect(within(cautions).getByText('H225 — Highly flammable liquid and vapour')).toBeInTheDocument();
    expect(within(cautions).getByText(/GHS02 Flame \(flammable\)/)).toBeInTheDocument();
    expect(within(cautions).getByText('The supplier’s safety data sheet comes first.')).toBeInTheDocument();
    const lots = screen.getByRole('region', { name: 'Lots' });
    const rowOf = (lot: string) => within(lots).getByRole('link', { name: lot }).closest('tr') as HTMLElement;
    expect(within(rowOf('AN9-2609')).getByText('Expired')).toBeInTheDocument();
    expect(within(rowOf('AN9-2611')).getByText('Past pot life')).toBeInTheDocument();
    expect(within(lots).queryByText('OTHER-1')).not.toBeInTheDocument();
  });

  it('when an operator opens the ink, then there is no edit or archive button', async () => {
    inkPageAs('operator');

    expect(await screen.findByRole('heading', { level: 1, name: 'Argent nano A9' })).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Edit' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Archive' })).not.toBeInTheDocument();
  });

  it('when an engineer archives the ink, then it asks first and sends the version on screen', async () => {
    let sent: unknown;
    const { user } = inkPageAs('engineer');
    server.use(
      http.post('/api/inks/5/archive', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json({ ...INK, archived: true, version: 2 });
      }),
    );

    await user.click(await screen.findByRole('button', { name: 'Archive' }));
    expect(screen.getByRole('group', { name: /Archive Argent nano A9\?/ })).toBeInTheDocument();
    expect(sent).toBeUndefined();
    await user.click(screen.getByRole('button', { name: 'Yes, archive' }));

    expect(await screen.findByText('Argent nano A9 is archived.')).toBeInTheDocument();
    expect(sent).toEqual({ version: 1 });
  });
});
