import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ComponentType } from 'react';
import { describe, expect, it } from 'vitest';

import { ArrheniusCard } from './arrhenius-card';
import { ContactAngleCard } from './contact-angle-card';
import { DropDiameterCard } from './drop-diameter-card';
import { DropSpacingCard } from './drop-spacing-card';
import { FootprintCard } from './footprint-card';
import { ReferenceResistanceCard } from './reference-resistance-card';
import { TraceResistanceCard } from './trace-resistance-card';
import { WettingMarginCard } from './wetting-margin-card';

type Example = [string, ComponentType, Record<string, string>, string, string, RegExp];

// Worked examples of /work/shared/brief/REFERENCES.md (all derived values there), typed as a person would.
const EXAMPLES: Example[] = [
  ['§3.2 spacing at 1270 dpi', DropSpacingCard, { 'Resolution (dpi)': '1270' }, 'Drop spacing results', 'Drop spacing', /^20 µm$/],
  ['§3.2 diameter of 10 pL', DropDiameterCard, { 'Drop volume (pL)': '10' }, 'Drop diameter results', 'Drop diameter', /^26\.73 µm$/],
  [
    '§3.2 footprint of a 30 µm drop at 30°',
    FootprintCard,
    { 'Drop volume (pL)': '14.137', 'Contact angle (°)': '30' },
    'Footprint results',
    'Footprint diameter',
    /^64\.02 µm$/,
  ],
  [
    '§2.3 water on a PTFE-like solid',
    ContactAngleCard,
    {
      'Ink surface tension, dispersive part (mN/m)': '21.8',
      'Ink surface tension, polar part (mN/m)': '51.0',
      'Solid surface energy, dispersive part (mN/m)': '18.0',
      'Solid surface energy, polar part (mN/m)': '0',
    },
    'Contact angle results',
    'Contact angle',
    /^117\.1°$/,
  ],
  [
    '§2.3 a 28 mN/m ink that spreads',
    ContactAngleCard,
    {
      'Ink surface tension, dispersive part (mN/m)': '26',
      'Ink surface tension, polar part (mN/m)': '2',
      'Solid surface energy, dispersive part (mN/m)': '45.414',
      'Solid surface energy, polar part (mN/m)': '4.945',
    },
    'Contact angle results',
    'Contact angle',
    /^0°$/,
  ],
  [
    '§4.4 trace of 200 squares of bulk silver',
    TraceResistanceCard,
    { 'Sheet resistance per pass (Ω/sq)': '0.0159', 'Path length (mm)': '100', 'Path width (mm)': '0.5' },
    'Trace resistance results',
    'Resistance',
    /^3\.18 Ω$/,
  ],
  [
    '§4.4 copper trace read at 60 °C, back to the default 20 °C',
    ReferenceResistanceCard,
    { 'Measured resistance (Ω)': '11.56', 'Measured at (°C)': '60', 'Temperature coefficient α (1/K)': '0.0039' },
    'Reference resistance results',
    'Resistance at reference',
    /^10 Ω$/,
  ],
  [
    '§5.1 30 min at 120 °C as minutes at 150 °C',
    ArrheniusCard,
    { 'Hold time (min)': '30', 'Hold temperature (°C)': '120', 'Reference temperature (°C)': '150', 'Activation energy Ea (kJ/mol)': '80' },
    'Equivalent time results',
    'Equivalent time at reference',
    /^5\.291 min$/,
  ],
];

describe('calculator cards with the reference sheet’s worked examples', () => {
  it.each(EXAMPLES)('when the %s values are typed, then the card shows the expected result', async (_case, Card, inputs, panel, result, expected) => {
    const user = userEvent.setup();
    render(<Card />);

    for (const [label, text] of Object.entries(inputs)) await user.type(screen.getByLabelText(label), text);

    const results = screen.getByRole('status', { name: panel });
    expect(results).toHaveAttribute('aria-live', 'polite');
    expect(within(results).getByRole('definition', { name: result })).toHaveTextContent(expected);
  });
});

describe('wetting margin card', () => {
  it('when a 28 mN/m ink meets a 50.36 mN/m surface, then the margin is 22.36 mN/m and met against the default 10', async () => {
    const user = userEvent.setup();
    render(<WettingMarginCard />);

    await user.type(screen.getByLabelText('Ink surface tension (mN/m)'), '28');
    await user.type(screen.getByLabelText('Substrate surface energy (mN/m)'), '50.36');

    expect(screen.getByLabelText('Required margin (mN/m)')).toHaveValue('10');
    expect(screen.getByLabelText('Required margin (mN/m)')).toHaveAccessibleDescription('Default 10 mN/m: common practice, no source.');
    const results = screen.getByRole('status', { name: 'Wetting margin results' });
    expect(within(results).getByRole('definition', { name: 'Margin' })).toHaveTextContent('22.36 mN/m');
    expect(within(results).getByText('Margin met')).toBeInTheDocument();
  });

  it('when the margin falls short, then it says so in words as well as colour', async () => {
    const user = userEvent.setup();
    render(<WettingMarginCard />);

    await user.type(screen.getByLabelText('Ink surface tension (mN/m)'), '45');
    await user.type(screen.getByLabelText('Substrate surface energy (mN/m)'), '50.36');

    expect(screen.getByText('Margin short: the ink may not wet')).toBeInTheDocument();
  });
});

describe('trace resistance card', () => {
  it('when the passes are not a whole number, then the library’s message appears under the passes', async () => {
    const user = userEvent.setup();
    render(<TraceResistanceCard />);

    await user.type(screen.getByLabelText('Sheet resistance per pass (Ω/sq)'), '0.0159');
    await user.type(screen.getByLabelText('Path length (mm)'), '100');
    await user.type(screen.getByLabelText('Path width (mm)'), '0.5');
    await user.clear(screen.getByLabelText('Print passes (whole number)'));
    await user.type(screen.getByLabelText('Print passes (whole number)'), '1.5');

    expect(screen.getByLabelText('Print passes (whole number)')).toHaveAccessibleDescription('Passes must be a whole number of 1 or more; got 1.5.');
  });
});
