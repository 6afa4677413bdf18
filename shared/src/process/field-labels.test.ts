import { describe, expect, it } from 'vitest';

import { fieldLabel } from './field-labels';

describe('fieldLabel', () => {
  it.each([
    ['viscosityMilliPaS', 'Viscosity (mPa·s)'],
    ['surfaceTensionMilliNPerM', 'Surface tension (mN/m)'],
    ['densityKgPerM3', 'Density (kg/m³)'],
    ['nozzleDiameterUm', 'Nozzle diameter (µm)'],
    ['dropVolumePl', 'Drop volume (pL)'],
    ['dropVelocityMetresPerSecond', 'Drop velocity (m/s)'],
    ['waterAngleDeg', 'Water angle (°)'],
    ['measuredTempC', 'Measured temperature (°C)'],
    ['atTempC', 'At temperature (°C)'],
    ['activationEnergyKJPerMol', 'Activation energy (kJ/mol)'],
    ['sheetResistanceOhmPerSq', 'Sheet resistance (Ω/sq)'],
    ['tcrPerK', 'Tcr (1/K)'],
    ['strain', 'Strain'],
    ['samples', 'Samples'],
  ])('when the field is %s, then a person reads "%s"', (field, label) => {
    expect(fieldLabel(field)).toBe(label);
  });
});
