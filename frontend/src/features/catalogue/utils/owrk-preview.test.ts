import { describe, expect, it } from 'vitest';

import { owrkPreview } from './owrk-preview';

describe('owrkPreview', () => {
  it('when both angles are typed, then it gives the shared OWRK result (worked example of owrkSurfaceEnergy)', () => {
    const preview = owrkPreview('72,5', '27');
    expect(preview).toHaveProperty('energy');
    if (!('energy' in preview)) return;
    // The shared function's own doc example: 72.5° / 27° → 45.414 + 4.945 = 50.359 mN/m.
    expect(preview.energy.totalMilliNPerM).toBeCloseTo(50.359, 2);
  });

  it.each([
    ['', '27', 'Type both angles to see the surface energy.'],
    ['wet', '27', 'Angles are numbers of degrees, e.g. 72.5.'],
    ['190', '27', 'Contact angles run from 0° to 180°.'],
  ])('when the angles are %j and %j, then it says %j', (water, diiodomethane, problem) => {
    expect(owrkPreview(water, diiodomethane)).toEqual({ problem });
  });
});
