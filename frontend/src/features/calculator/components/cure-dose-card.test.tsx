import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';

import { CureDoseCard } from './cure-dose-card';

describe('cure dose card', () => {
  it('when a 30 min log at 120 °C is pasted with Ea 80 kJ/mol, then the dose is 5.291 min at 150 °C (REFERENCES §5.1)', async () => {
    const user = userEvent.setup();
    render(<CureDoseCard />);

    await user.click(screen.getByLabelText('Temperature log (minute, °C per line)'));
    await user.paste('0\t120\n30\t120');
    await user.type(screen.getByLabelText('Reference temperature (°C)'), '150');
    await user.type(screen.getByLabelText('Activation energy Ea (kJ/mol)'), '80');

    const results = screen.getByRole('status', { name: 'Cure dose results' });
    expect(within(results).getByRole('definition', { name: 'Cure dose at reference' })).toHaveTextContent('5.291 min');
  });

  it('when the whole log is below the minimum effective temperature, then the dose is 0', async () => {
    const user = userEvent.setup();
    render(<CureDoseCard />);

    await user.click(screen.getByLabelText('Temperature log (minute, °C per line)'));
    await user.paste('0, 120\n30, 120');
    await user.type(screen.getByLabelText('Reference temperature (°C)'), '150');
    await user.type(screen.getByLabelText('Activation energy Ea (kJ/mol)'), '80');
    await user.type(screen.getByLabelText('Minimum effective temperature (°C, optional)'), '130');

    expect(screen.getByRole('definition', { name: 'Cure dose at reference' })).toHaveTextContent(/^0 min$/);
  });
});
