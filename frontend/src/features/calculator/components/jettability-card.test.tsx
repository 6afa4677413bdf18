import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';

import { jettability, JETTING_WINDOWS, ProcessInputError } from '@tracewright/shared';

import { JettabilityCard } from './jettability-card';

async function typeGlycerolWater() {
  const user = userEvent.setup();
  render(<JettabilityCard />);
  // 50 wt % glycerol–water at 20 °C through 21 µm at 6 m/s (REFERENCES §1.4, derived values).
  await user.type(screen.getByLabelText('Viscosity (mPa·s)'), '6.00');
  await user.type(screen.getByLabelText('Surface tension (mN/m)'), '70');
  await user.type(screen.getByLabelText('Density (kg/m³)'), '1126');
  await user.type(screen.getByLabelText('Nozzle diameter (µm)'), '21');
  await user.type(screen.getByLabelText('Jetting speed (m/s, optional)'), '6');
  return { user, results: screen.getByRole('status', { name: 'Jettability results' }) };
}

function libraryMessageFor(viscosityMilliPaS: number): string {
  try {
    jettability({ viscosityMilliPaS, surfaceTensionMilliNPerM: 70, densityKgPerM3: 1126, nozzleDiameterUm: 21 });
  } catch (error) {
    if (error instanceof ProcessInputError) return error.message;
  }
  throw new Error('expected the library to reject the input');
}

describe('jettability card', () => {
  it('when the glycerol–water values of REFERENCES §1.4 are typed, then Z ≈ 6.78 and the verdict reads jettable', async () => {
    const { results } = await typeGlycerolWater();

    expect(within(results).getByRole('definition', { name: 'Z' })).toHaveTextContent(/^6\.78\d?$/);
    expect(within(results).getByRole('definition', { name: 'Oh' })).toHaveTextContent('0.1475');
    expect(within(results).getByRole('definition', { name: 'Re' })).toHaveTextContent('23.65');
    expect(within(results).getByRole('definition', { name: 'We' })).toHaveTextContent('12.16');
    expect(within(results).getByText('Jettable')).toBeInTheDocument();
    expect(within(results).getByRole('list', { name: 'Reasons' })).toHaveTextContent('inside the printable window 1 < Z < 10 (Reis & Derby 2000)');
  });

  it('when the viscosity is negative, then the library’s message appears under the viscosity field', async () => {
    const user = userEvent.setup();
    render(<JettabilityCard />);

    await user.type(screen.getByLabelText('Viscosity (mPa·s)'), '-1');
    await user.type(screen.getByLabelText('Surface tension (mN/m)'), '70');
    await user.type(screen.getByLabelText('Density (kg/m³)'), '1126');
    await user.type(screen.getByLabelText('Nozzle diameter (µm)'), '21');

    const message = libraryMessageFor(-1);
    expect(screen.getByLabelText('Viscosity (mPa·s)')).toHaveAccessibleDescription(message);
    expect(screen.getByLabelText('Viscosity (mPa·s)')).toBeInvalid();
    expect(screen.getByRole('status', { name: 'Jettability results' })).toHaveTextContent('No result: correct the marked field above.');
  });

  it('when the Jang, Kim & Moon window is chosen, then its unconfirmed length convention is stated', async () => {
    const { user, results } = await typeGlycerolWater();

    await user.selectOptions(screen.getByLabelText('Printable window'), 'jang-kim-moon');

    expect(screen.getByLabelText('Printable window')).toHaveAccessibleDescription(
      `Length used for Z: ${JETTING_WINDOWS['jang-kim-moon'].lengthConvention}`,
    );
    expect(within(results).getByRole('list', { name: 'Reasons' })).toHaveTextContent('its length convention is unconfirmed');
  });

  it('when no jetting speed is given, then Z is still judged and Re and We show a dash', async () => {
    const user = userEvent.setup();
    render(<JettabilityCard />);

    await user.type(screen.getByLabelText('Viscosity (mPa·s)'), '6');
    await user.type(screen.getByLabelText('Surface tension (mN/m)'), '70');
    await user.type(screen.getByLabelText('Density (kg/m³)'), '1126');
    await user.type(screen.getByLabelText('Nozzle diameter (µm)'), '21');

    const results = screen.getByRole('status', { name: 'Jettability results' });
    expect(within(results).getByRole('definition', { name: 'Re' })).toHaveTextContent('—');
    expect(within(results).getByText('Jettable')).toBeInTheDocument();
    expect(within(results).getByText(/No jetting speed given/)).toBeInTheDocument();
  });

  it('when a field is still empty, then no verdict is shown and the panel says what it waits for', () => {
    render(<JettabilityCard />);

    const results = screen.getByRole('status', { name: 'Jettability results' });
    expect(results).toHaveTextContent('Enter the values above to see results; fields marked optional may stay empty.');
    expect(within(results).queryByText('Verdict')).not.toBeInTheDocument();
  });
});
