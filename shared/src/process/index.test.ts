import { describe, expect, it } from 'vitest';

import * as processLibrary from './index';

describe('process library entry', () => {
  it.each([
    'jettability',
    'minimumEjectionVelocityMetresPerSecond',
    'zWindowPosition',
    'owrkSurfaceEnergy',
    'predictedContactAngleDeg',
    'wettingMargin',
    'dropSpacingUm',
    'dropDiameterUm',
    'dropVolumePl',
    'contactAngleBracket',
    'beadWidthUm',
    'equilibriumFootprintUm',
    'filmThicknessUm',
    'solidsVolumeFraction',
    'traceResistanceOhm',
    'resistanceAtReferenceOhm',
    'stretchedResistanceOhm',
    'gaugeFactor',
    'arrheniusEquivalentMinutes',
    'cureDoseMinutes',
    'holdsEquivalentMinutes',
    'individualsChart',
    'capability',
  ])('when importing the library, then %s is an exported function', (name) => {
    expect(typeof (processLibrary as Record<string, unknown>)[name]).toBe('function');
  });

  it('when importing the library, then the error class and chart constants are exported', () => {
    expect(new processLibrary.ProcessInputError('x', 'y').field).toBe('x');
    expect(Object.keys(processLibrary.JETTING_WINDOWS)).toEqual(['reis-derby', 'jang-kim-moon']);
    expect(processLibrary.OWRK_PROBE_LIQUIDS.water.totalMilliNPerM).toBe(72.8);
  });

  it('when importing the library, then test-only helpers stay private', () => {
    expect('expectRelativelyClose' in processLibrary).toBe(false);
  });
});
