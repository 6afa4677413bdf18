import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';

import { LAB_SETTINGS, signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { decodeQrDataUrl } from '../testing/decode-qr';
import { runPagesApi } from '../testing/run-api';
import { aRunDetail } from '../testing/run-fixtures';

const RUN = aRunDetail({ id: 42, code: 'R-2026-0042', travellerUrl: 'https://lab.example/run/42' });

// Drawing a QR code and loading the lazy print page can pass the default 1 s on a busy machine.
const QR_WAIT = { timeout: 5000 };

describe('traveller page', () => {
  it('when the traveller is shown, then its QR code decodes to the run’s tablet address and nothing more', async () => {
    server.use(...signedInAs('engineer'), ...runPagesApi({ run: RUN }));
    renderApp('/runs/42/traveller');

    const qr = await screen.findByRole('img', { name: 'QR code: opens run R-2026-0042 on a tablet' }, QR_WAIT);

    expect(decodeQrDataUrl(qr.getAttribute('src') ?? '')).toBe('https://lab.example/run/42');
  });

  it('when the traveller is shown, then each step lists its settings and cautions with boxes for time and initials', async () => {
    server.use(...signedInAs('engineer'), ...runPagesApi({ run: RUN }));
    renderApp('/runs/42/traveller');

    const cure = await screen.findByRole('region', { name: 'Step 2: Cure silver' }, QR_WAIT);
    expect(within(cure).getByRole('list', { name: 'Settings, step 2' })).toHaveTextContent('Oven A150 °C30 min at temperature');
    const cautions = within(cure).getByRole('list', { name: 'Cautions, step 2' });
    expect(cautions).toHaveTextContent(/Caution:.*150 °C/);
    expect(cautions).toHaveTextContent('Unload the oven with heat-resistant gloves.');
    const signOff = within(cure).getByRole('table', { name: 'Sign-off, step 2' });
    expect(within(signOff).getAllByRole('columnheader').map((h) => h.textContent)).toEqual(['Time', 'Initials']);
    expect(within(signOff).getAllByRole('rowheader').map((h) => h.textContent)).toEqual(['Started', 'Done']);
    const boxes = within(signOff).getAllByRole('row').slice(1).flatMap((row) => within(row).getAllByRole('cell'));
    expect(boxes.map((box) => box.textContent)).toEqual(['', '', '', '']);
    expect(screen.getAllByRole('table', { name: /^Sign-off, step/ })).toHaveLength(3);
  });

  it('when a step takes a reading per piece, then there is a row with its limits and blank cells for every piece', async () => {
    server.use(...signedInAs('engineer'), ...runPagesApi({ run: RUN }));
    renderApp('/runs/42/traveller');

    const readings = await screen.findByRole('table', { name: 'Readings, step 3' }, QR_WAIT);
    const rows = within(readings).getAllByRole('row').slice(1);
    expect(rows.map((row) => within(row).getAllByRole('cell')[1]?.textContent)).toEqual(['R-2026-0042-01', 'R-2026-0042-02']);
    expect(rows[0]).toHaveTextContent('8–12 Ωtarget 10 Ω');
    expect(within(rows[0] as HTMLElement).getAllByRole('cell')[2]).toHaveTextContent('blank, to fill in');
  });

  it('when the lab prints on Letter paper, then the page size is letter and Print opens the print dialogue', async () => {
    server.use(...signedInAs('engineer'), ...runPagesApi({ run: RUN }));
    server.use(http.get('/api/settings', () => HttpResponse.json({ ...LAB_SETTINGS, paperSize: 'Letter' })));
    const print = vi.spyOn(window, 'print').mockImplementation(() => undefined);
    const { user, container } = renderApp('/runs/42/traveller');

    await user.click(await screen.findByRole('button', { name: 'Print traveller' }, QR_WAIT));

    expect(print).toHaveBeenCalledOnce();
    expect(container.querySelector('style')?.textContent).toContain('@page { size: letter;');
  });
});
