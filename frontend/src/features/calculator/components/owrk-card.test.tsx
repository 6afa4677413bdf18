import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';

import { OwrkCard } from './owrk-card';

describe('surface energy card', () => {
  it('when θW = 72.5° and θD = 27.0° are typed, then the total is about 50.36 mN/m (REFERENCES §2.3)', async () => {
    const user = userEvent.setup();
    render(<OwrkCard />);

    await user.type(screen.getByLabelText('Water contact angle (°)'), '72.5');
    await user.type(screen.getByLabelText('Diiodomethane contact angle (°)'), '27.0');

    const results = screen.getByRole('status', { name: 'Surface energy results' });
    expect(within(results).getByRole('definition', { name: 'Total' })).toHaveTextContent('50.36 mN/m');
    expect(within(results).getByRole('definition', { name: 'Dispersive' })).toHaveTextContent('45.41 mN/m');
    expect(within(results).getByRole('definition', { name: 'Polar' })).toHaveTextContent('4.945 mN/m');
  });

  it('when an angle is above 180°, then the library’s message appears under that angle', async () => {
    const user = userEvent.setup();
    render(<OwrkCard />);

    await user.type(screen.getByLabelText('Water contact angle (°)'), '190');
    await user.type(screen.getByLabelText('Diiodomethane contact angle (°)'), '27');

    expect(screen.getByLabelText('Water contact angle (°)')).toHaveAccessibleDescription(/Water angle \(°\) must be between 0° and 180°; got 190°/);
  });

  it('when the card is shown, then it names OWRK’s source and the probe liquids’ attribution', () => {
    render(<OwrkCard />);

    const card = screen.getByRole('article', { name: 'Surface energy of a solid' });
    expect(card).toHaveTextContent('Owens & Wendt 1969');
    expect(card).toHaveTextContent('water 72.8 mN/m (21.8 dispersive + 51 polar)');
    expect(card).toHaveTextContent('attribution from memory');
  });
});
