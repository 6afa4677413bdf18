import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { checksPanel, renderBuilder, sequence } from '../testing/render-builder';

describe('recipe builder: live process checks', () => {
  it('when the cure temperature is raised above the film’s limits, then a Blocked heat check appears at once and is announced', async () => {
    const { user } = await renderBuilder();
    expect(within(checksPanel()).queryByText('Blocked', { selector: 'li *' })).not.toBeInTheDocument();

    await user.click(within(sequence()).getByRole('button', { name: 'Step 2: Cure silver' }));
    const temperature = screen.getByLabelText('Temperature (°C)');
    await user.clear(temperature);
    await user.type(temperature, '200');

    const attention = within(checksPanel()).getByRole('list', { name: 'Checks that need attention' });
    const heatLine = within(attention).getByRole('button', { name: 'Step 2: Cure at 200 °C on Demo PET film' }).closest('li') as HTMLElement;
    expect(within(heatLine).getByText('Blocked')).toBeInTheDocument();
    expect(within(heatLine).getByText(/short ≤ 170 °C/)).toBeInTheDocument();
    expect(within(checksPanel()).getByRole('status')).toHaveTextContent(/checks? blocks? this version now/);
  });

  it('when a check’s Why is opened, then its reason shows; when its title is pressed, then its step is selected', async () => {
    const { user } = await renderBuilder();
    await user.click(within(sequence()).getByRole('button', { name: 'Step 2: Cure silver' }));
    const temperature = screen.getByLabelText('Temperature (°C)');
    await user.clear(temperature);
    await user.type(temperature, '200');
    await user.click(within(sequence()).getByRole('button', { name: 'Step 1: Print silver traces' }));

    const attention = within(checksPanel()).getByRole('list', { name: 'Checks that need attention' });
    const heatLine = within(attention).getByRole('button', { name: 'Step 2: Cure at 200 °C on Demo PET film' }).closest('li') as HTMLElement;
    await user.click(within(heatLine).getByRole('button', { name: /^Why/ }));
    expect(within(heatLine).getByText(/short-exposure limit/)).toBeVisible();

    await user.click(within(heatLine).getByRole('button', { name: /^Step 2:/ }));
    expect(within(sequence()).getByRole('button', { name: 'Step 2: Cure silver' })).toHaveAttribute('aria-current', 'true');
  });

  it('when a required value is cleared, then the step is marked to fix and the checks say they leave it out', async () => {
    const { user } = await renderBuilder();
    await user.click(within(sequence()).getByRole('button', { name: 'Step 2: Cure silver' }));

    await user.clear(screen.getByLabelText('Time at temperature (min)'));

    expect(screen.getByLabelText('Time at temperature (min)')).toHaveAccessibleDescription(/Time at temperature must be a number in min/);
    expect(within(sequence()).getByText('Fields to fix')).toBeInTheDocument();
    expect(within(checksPanel()).getByText(/Left out until their fields are complete: step 2 “Cure silver”/)).toBeInTheDocument();
  });
});
