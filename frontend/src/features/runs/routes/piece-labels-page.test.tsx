import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { decodeQrDataUrl } from '../testing/decode-qr';
import { runPagesApi } from '../testing/run-api';
import { aRunDetail } from '../testing/run-fixtures';

// Drawing a QR code and loading the lazy print page can pass the default 1 s on a busy machine.
const QR_WAIT = { timeout: 5000 };

describe('piece labels page', () => {
  it('when the labels are shown, then each piece’s QR code decodes to the run’s address with that piece', async () => {
    server.use(...signedInAs('quality'), ...runPagesApi({ run: aRunDetail({ id: 42, travellerUrl: 'https://lab.example/run/42' }) }));
    renderApp('/runs/42/labels');

    const first = await screen.findByRole('img', { name: 'QR code: opens piece R-2026-0042-01 on a tablet' }, QR_WAIT);
    const second = await screen.findByRole('img', { name: 'QR code: opens piece R-2026-0042-02 on a tablet' }, QR_WAIT);

    expect(decodeQrDataUrl(first.getAttribute('src') ?? '')).toBe('https://lab.example/run/42?piece=R-2026-0042-01');
    expect(decodeQrDataUrl(second.getAttribute('src') ?? '')).toBe('https://lab.example/run/42?piece=R-2026-0042-02');
    expect(within(screen.getByRole('list', { name: 'Labels, one per piece' })).getAllByRole('listitem')).toHaveLength(2);
  });
});
