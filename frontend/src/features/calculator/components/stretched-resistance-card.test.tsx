import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';

import { StretchedResistanceCard } from './stretched-resistance-card';

describe('stretched resistance card', () => {
  it('when 10 % strain is typed, then it is passed as 0.10 and R/R₀ is 1.21 (REFERENCES §4.4)', async () => {
    const user = userEvent.setup();
    render(<StretchedResistanceCard />);

    await user.type(screen.getByLabelText('Unstretched resistance R₀ (Ω)'), '10');
    await user.type(screen.getByLabelText('Strain (%)'), '10');

    const results = screen.getByRole('status', { name: 'Stretched resistance results' });
    expect(within(results).getByRole('definition', { name: 'R/R₀' })).toHaveTextContent('1.21');
    expect(within(results).getByRole('definition', { name: 'Stretched resistance' })).toHaveTextContent('12.1 Ω');
  });

  it('when the strain is −100 % or less, then the library’s message appears under the strain field', async () => {
    const user = userEvent.setup();
    render(<StretchedResistanceCard />);

    await user.type(screen.getByLabelText('Unstretched resistance R₀ (Ω)'), '10');
    await user.type(screen.getByLabelText('Strain (%)'), '-150');

    expect(screen.getByText(/Strain must be above -1 \(a fraction, 0\.3 = 30 %\); got -1\.5\./)).toBeInTheDocument();
    expect(screen.getByLabelText('Strain (%)')).toBeInvalid();
  });
});
