import { describe, expect, it } from 'vitest';

import { ProcessInputError } from './process-input-error';
import { wettingMargin } from './wetting-margin';

describe('wettingMargin', () => {
  it.each([
    // REFERENCES §2.3 PET-like solid 50.359 mN/m vs a 28 mN/m ink; 10 mN/m default is common practice, no source
    { ink: 28, substrate: 50.359, required: undefined, margin: 22.359, ok: true },
    // REFERENCES §2.4 practice page: substrate should exceed the ink by roughly 8–10 mN/m
    { ink: 30, substrate: 38, required: undefined, margin: 8, ok: false },
    { ink: 30, substrate: 38, required: 8, margin: 8, ok: true },
    { ink: 30, substrate: 40, required: undefined, margin: 10, ok: true },
    // REFERENCES §2.5: PTFE γc 19.4 mN/m is below a 28 mN/m ink: negative margin
    { ink: 28, substrate: 19.4, required: undefined, margin: -8.6, ok: false },
  ])(
    'when ink is $ink and substrate $substrate mN/m (required $required), then margin is $margin and ok is $ok',
    ({ ink, substrate, required, margin, ok }) => {
      const r = wettingMargin({
        inkSurfaceTensionMilliNPerM: ink,
        substrateSurfaceEnergyMilliNPerM: substrate,
        requiredMarginMilliNPerM: required,
      });
      expect(r.marginMilliNPerM).toBeCloseTo(margin, 9);
      expect(r.ok).toBe(ok);
    },
  );

  it.each([
    { field: 'inkSurfaceTensionMilliNPerM', value: -28 },
    { field: 'substrateSurfaceEnergyMilliNPerM', value: Number.NaN },
    { field: 'requiredMarginMilliNPerM', value: -1 },
  ])('when $field is $value, then ProcessInputError names it', ({ field, value }) => {
    const call = () =>
      wettingMargin({
        inkSurfaceTensionMilliNPerM: 28,
        substrateSurfaceEnergyMilliNPerM: 40,
        [field]: value,
      });
    expect(call).toThrow(ProcessInputError);
    expect(call).toThrow(expect.objectContaining({ field }));
  });
});
