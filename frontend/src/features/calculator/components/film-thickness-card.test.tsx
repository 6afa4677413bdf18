import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';

import { FilmThicknessCard } from './film-thickness-card';

describe('film thickness card', () => {
  it('when the volume fraction is worked out from wt % and used, then wet and dry match REFERENCES §3.2', async () => {
    const user = userEvent.setup();
    render(<FilmThicknessCard />);

    await user.type(screen.getByLabelText('Drop volume (pL)'), '10');
    await user.type(screen.getByLabelText('Resolution (dpi)'), '1000');
    await user.click(screen.getByText('Work out the volume fraction from wt % and densities'));
    await user.type(screen.getByLabelText('Solids content (wt %)'), '20');
    await user.type(screen.getByLabelText('Solids density (kg/m³)'), '10490');
    await user.type(screen.getByLabelText('Carrier density (kg/m³)'), '1000');
    await user.click(screen.getByRole('button', { name: 'Use 0.02328 as the volume fraction' }));

    expect(screen.getByLabelText('Solids volume fraction (0 to 1)')).toHaveValue('0.02328');
    const results = screen.getByRole('status', { name: 'Film thickness results' });
    expect(within(results).getByRole('definition', { name: 'Wet thickness' })).toHaveTextContent('15.5 µm');
    expect(within(results).getByRole('definition', { name: 'Dry thickness' })).toHaveTextContent('0.3608 µm');
  });

  it('when the spacing is given in µm instead of dpi, then the µm field replaces the dpi field', async () => {
    const user = userEvent.setup();
    render(<FilmThicknessCard />);

    await user.click(screen.getByRole('radio', { name: 'Drop spacing in µm' }));

    expect(screen.queryByLabelText('Resolution (dpi)')).not.toBeInTheDocument();
    expect(screen.getByLabelText('Drop spacing (µm)')).toBeInTheDocument();
  });
});
