import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';

import { BeadWidthCard } from './bead-width-card';

describe('bead width card', () => {
  it('when a 30 µm drop (14.137 pL) lands every 25 µm at 30°, then the bead is 79.01 µm wide (REFERENCES §3.2)', async () => {
    const user = userEvent.setup();
    render(<BeadWidthCard />);

    await user.type(screen.getByLabelText('Drop volume (pL)'), '14.137');
    await user.click(screen.getByRole('radio', { name: 'Drop spacing in µm' }));
    await user.type(screen.getByLabelText('Drop spacing (µm)'), '25');
    await user.type(screen.getByLabelText('Contact angle (°)'), '30');

    const results = screen.getByRole('status', { name: 'Bead width results' });
    expect(within(results).getByRole('definition', { name: 'Bead width' })).toHaveTextContent('79.01 µm');
    expect(within(results).getByRole('definition', { name: 'Drop diameter' })).toHaveTextContent('30 µm');
  });

  it('when the contact angle is 0°, then the library’s open-range message appears under the angle', async () => {
    const user = userEvent.setup();
    render(<BeadWidthCard />);

    await user.type(screen.getByLabelText('Drop volume (pL)'), '10');
    await user.type(screen.getByLabelText('Resolution (dpi)'), '1000');
    await user.type(screen.getByLabelText('Contact angle (°)'), '0');

    expect(screen.getByLabelText('Contact angle (°)')).toHaveAccessibleDescription(/Contact angle \(°\) must be strictly between 0° and 180°/);
  });
});
