import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';

import { GaugeFactorCard } from './gauge-factor-card';

describe('gauge factor card', () => {
  it('when readings at 0 % and 10 % are pasted, then strain goes in as a fraction and GF is 2.1', async () => {
    const user = userEvent.setup();
    render(<GaugeFactorCard />);

    await user.click(screen.getByLabelText('Readings (strain %, Ω per line)'));
    await user.paste('0, 10\n\n10, 12.1\n');

    const results = screen.getByRole('status', { name: 'Gauge factor results' });
    expect(within(results).getByRole('definition', { name: 'Gauge factor' })).toHaveTextContent('2.1');
    expect(within(results).getByRole('definition', { name: 'R₀' })).toHaveTextContent('10 Ω');
    expect(results).toHaveTextContent('R₀ is the reading at 0 % strain');
  });

  it('when a line holds a single number, then the message under the readings names that line', async () => {
    const user = userEvent.setup();
    render(<GaugeFactorCard />);

    await user.click(screen.getByLabelText('Readings (strain %, Ω per line)'));
    await user.paste('0, 10\n10');

    expect(screen.getByLabelText('Readings (strain %, Ω per line)')).toHaveAccessibleDescription(
      expect.stringContaining('Line 2 needs two numbers, strain % then Ω; it has “10”.'),
    );
  });
});
