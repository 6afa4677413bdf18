import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';

import { QualityCard } from './quality-card';

// The illustrative I-MR series of REFERENCES §6.1 (e.g. line width in µm).
const READINGS = '52, 55, 51, 54, 53, 56, 52, 50, 54, 53';

function setup() {
  const user = userEvent.setup();
  render(<QualityCard />);
  const results = screen.getByRole('status', { name: 'Quality statistics results' });
  const value = (name: string) => within(results).getByRole('definition', { name });
  return { user, results, value };
}

describe('quality statistics card', () => {
  it('when the §6.1 readings and both limits are entered, then the chart and capability numbers match it', async () => {
    const { user, value } = setup();

    await user.type(screen.getByLabelText('Readings'), READINGS);
    await user.type(screen.getByLabelText('Lower specification limit LSL (optional)'), '44');
    await user.type(screen.getByLabelText('Upper specification limit USL (optional)'), '60');

    expect(value('Mean')).toHaveTextContent('53');
    expect(value('MR̄ (mean moving range)')).toHaveTextContent('2.778');
    expect(value('UCL')).toHaveTextContent('60.39');
    expect(value('LCL')).toHaveTextContent('45.61');
    expect(value('MR UCL')).toHaveTextContent('9.075');
    expect(value('Cp')).toHaveTextContent('1.083');
    expect(value('Cpk')).toHaveTextContent('0.9475');
    expect(value('Points')).toHaveTextContent('10');
    expect(screen.getByText('Provisional: below 20 points')).toBeInTheDocument();
    expect(screen.getByText('Run rules: no signals.')).toBeInTheDocument();
  });

  it('when only an upper limit is given, then Cp and Pp show “—” and Cpk is one-sided', async () => {
    const { user, value } = setup();

    await user.type(screen.getByLabelText('Readings'), READINGS);
    await user.type(screen.getByLabelText('Upper specification limit USL (optional)'), '60');

    expect(value('Cp')).toHaveTextContent(/^— needs both limits$/);
    expect(value('Pp')).toHaveTextContent(/^—/);
    // One-sided: (USL − mean) / 3σ̂ = 7 / (3 × 2.4626).
    expect(value('Cpk')).toHaveTextContent(/^0\.9475 one-sided$/);
  });

  it('when readings break run rules, then each signal is listed in words by point number', async () => {
    const { user } = setup();

    // Points 7 and 9 sit above mean + 2σ̂ (50.77 + 2 × 2.185); the rule completes at point 9.
    await user.type(screen.getByLabelText('Readings'), '50, 51, 49, 50, 51, 49, 55.5, 50.5, 55.5, 50, 51, 49, 50, 50.5, 49.5');

    const signals = screen.getByRole('list', { name: 'Run-rule signals' });
    expect(within(signals).getAllByRole('listitem').map((item) => item.textContent)).toEqual(['point 9: 2 of 3 beyond 2σ']);
  });

  it('when the pasted readings hold text, then a clear message appears under the readings', async () => {
    const { user, results } = setup();

    await user.type(screen.getByLabelText('Readings'), '52\nn/a\n55');

    expect(screen.getByLabelText('Readings')).toHaveAccessibleDescription(expect.stringContaining('Line 2: “n/a” is not a number.'));
    expect(results).toHaveTextContent('No result: correct the marked field above.');
  });

  it('when a unit is given, then the limits are labelled and shown with it', async () => {
    const { user, value } = setup();

    await user.type(screen.getByLabelText('Unit of the readings (optional)'), 'µm');
    await user.type(screen.getByLabelText('Readings'), READINGS);

    expect(screen.getByLabelText('Upper specification limit USL (µm, optional)')).toBeInTheDocument();
    expect(value('UCL')).toHaveTextContent('60.39 µm');
  });
});
