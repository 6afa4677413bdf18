import { describe, expect, it } from 'vitest';

import { filmThicknessUm, solidsVolumeFraction } from './film-thickness';
import { ProcessInputError } from './process-input-error';
import { expectRelativelyClose } from './test-support';

// Silver density 10 490 kg/m³ is a handbook value from memory (REFERENCES §3.1).
const SILVER_KG_PER_M3 = 10_490;

describe('solidsVolumeFraction', () => {
  it.each([
    // REFERENCES §3.2: 20 wt % Ag (10.49 g/cm³, from memory) in a 1.00 g/cm³ carrier → φv = 0.023280 (±0.1 %)
    { wt: 20, solids: SILVER_KG_PER_M3, carrier: 1000, expected: 0.02328 },
    // REFERENCES §3.1 formula limits: no solids → 0; all solids → 1; equal densities → wt fraction
    { wt: 0, solids: SILVER_KG_PER_M3, carrier: 1000, expected: 0 },
    { wt: 100, solids: SILVER_KG_PER_M3, carrier: 1000, expected: 1 },
    { wt: 35, solids: 1000, carrier: 1000, expected: 0.35 },
  ])(
    'when solids are $wt wt % at $solids kg/m³ in $carrier kg/m³, then φv = $expected',
    ({ wt, solids, carrier, expected }) => {
      const phi = solidsVolumeFraction({
        solidsWtPercent: wt,
        solidsDensityKgPerM3: solids,
        carrierDensityKgPerM3: carrier,
      });
      expect(phi).toBeCloseTo(expected, 5);
    },
  );
});

describe('filmThicknessUm', () => {
  it('when 10 pL drops fill a 25.4 µm grid of 20 wt % silver ink, then wet is 15.50 µm and dry 0.3608 µm', () => {
    // REFERENCES §3.2: h_wet = 15.50 µm, φv = 0.023280, h_dry = 0.3608 µm (±0.1 %)
    const r = filmThicknessUm({
      dropVolumePl: 10,
      dropSpacingUm: 25.4,
      solidsVolumeFraction: 0.02328,
    });
    expectRelativelyClose(r.wetUm, 15.5, 0.001);
    expectRelativelyClose(r.dryUm, 0.3608, 0.001);
  });

  it.each([
    // REFERENCES §3.1: h_wet = V/(px·py), so halving the spacing quadruples the wet film
    { p: 25.4, factor: 1 },
    { p: 12.7, factor: 4 },
  ])('when the grid is $p µm, then the wet film is $factor × the 25.4 µm film', ({ p, factor }) => {
    const base = filmThicknessUm({
      dropVolumePl: 10,
      dropSpacingUm: 25.4,
      solidsVolumeFraction: 0.1,
    }).wetUm;
    const r = filmThicknessUm({ dropVolumePl: 10, dropSpacingUm: p, solidsVolumeFraction: 0.1 });
    expect(r.wetUm / base).toBeCloseTo(factor, 9);
  });

  it.each([
    {
      field: 'solidsVolumeFraction',
      input: { dropVolumePl: 10, dropSpacingUm: 25.4, solidsVolumeFraction: 1.2 },
    },
    {
      field: 'dropSpacingUm',
      input: { dropVolumePl: 10, dropSpacingUm: -1, solidsVolumeFraction: 0.1 },
    },
    {
      field: 'dropVolumePl',
      input: { dropVolumePl: Number.NaN, dropSpacingUm: 25.4, solidsVolumeFraction: 0.1 },
    },
  ])('when $field is out of range, then ProcessInputError names it', ({ field, input }) => {
    expect(() => filmThicknessUm(input)).toThrow(expect.objectContaining({ field }));
    expect(() => filmThicknessUm(input)).toThrow(ProcessInputError);
  });

  it.each([
    { field: 'solidsWtPercent', wt: 101, solids: 10490, carrier: 1000 },
    { field: 'solidsDensityKgPerM3', wt: 20, solids: 0, carrier: 1000 },
    { field: 'carrierDensityKgPerM3', wt: 20, solids: 10490, carrier: -1 },
  ])(
    'when $field is not physical, then solidsVolumeFraction throws naming it',
    ({ field, wt, solids, carrier }) => {
      const call = () =>
        solidsVolumeFraction({
          solidsWtPercent: wt,
          solidsDensityKgPerM3: solids,
          carrierDensityKgPerM3: carrier,
        });
      expect(call).toThrow(expect.objectContaining({ field }));
    },
  );
});
