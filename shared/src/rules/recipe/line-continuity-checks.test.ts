import { describe, expect, it } from 'vitest';

import { dropVolumePl } from '../../process/line-geometry';
import { checksOf, makeInk, makeInput, makePrinter, makeSubstrate, steps } from './test-fixtures';

// REFERENCES §3.2 [D]: d₀ = 30 µm is 14.137 pL; at θ = 30° the spread drop's footprint is 64.02 µm;
// bead width (Stringer & Derby 2010) at p = 25 µm is 79.01 µm, at p = 20 µm 88.34 µm; at θ = 60° and
// p = 25 µm 52.56 µm; at θ = 90° 37.95 µm.
const D0_30_UM_PL = dropVolumePl(30);

/**
 * An all-dispersive ink (40 mN/m) and an all-dispersive film chosen so OWRK predicts the angle θ:
 * cos θ = 2√(γSd·γLd)/γL − 1 ⇒ γSd = (γL(1 + cos θ)/2)² / γLd (REFERENCES §2.1, inverted here).
 */
function inputAtAngle(thetaDeg: number, dpi: number) {
  const gammaL = 40;
  const solidDispersive = (gammaL * (1 + Math.cos((thetaDeg * Math.PI) / 180)) / 2) ** 2 / gammaL;
  return makeInput({
    inks: [makeInk({ surfaceTensionMilliNPerM: gammaL, surfaceTensionDispersiveMilliNPerM: gammaL, surfaceTensionPolarMilliNPerM: 0 })],
    substrates: [makeSubstrate({ surfaceEnergyDispersiveMilliNPerM: solidDispersive, surfaceEnergyPolarMilliNPerM: 0, waterContactAngleDeg: null, diiodomethaneContactAngleDeg: null })],
    printers: [makePrinter({ dropVolumePl: D0_30_UM_PL })],
    steps: [steps.print('print-1', { dpi })],
  });
}

describe('lineContinuityChecks', () => {
  // prettier-ignore
  it.each([
    // spacing 25 400/dpi straddles the 64.02 µm footprint at θ = 30° (REFERENCES §3.2): 63.9 µm joins, 64.2 µm does not
    { theta: 30, dpi: 25_400 / 63.9, status: 'pass', shows: 'footprint 64 µm' },
    { theta: 30, dpi: 25_400 / 64.2, status: 'blocked', shows: 'footprint 64 µm' },
    // REFERENCES §3.2: bead width at p = 25 µm (1016 dpi) 79.01 µm; at p = 20 µm (1270 dpi) 88.34 µm
    { theta: 30, dpi: 1016, status: 'pass', shows: 'expected line width 79 µm' },
    { theta: 30, dpi: 1270, status: 'pass', shows: 'expected line width 88.3 µm' },
    // REFERENCES §3.2: θ = 60° → 52.56 µm; θ = 90° → 37.95 µm (footprint 30 × 2^⅓ = 37.80 µm > 25 µm)
    { theta: 60, dpi: 1016, status: 'pass', shows: 'expected line width 52.6 µm' },
    { theta: 90, dpi: 1016, status: 'pass', shows: 'expected line width 37.9 µm' }, // 37.95 in §3.2 is √1440 = 37.947
    // REFERENCES §3.2: at θ = 90° the footprint is 37.80 µm, so 40 µm spacing (635 dpi) leaves beads
    { theta: 90, dpi: 635, status: 'blocked', shows: 'footprint 37.8 µm' },
  ])('when θ = $theta° and the dpi is $dpi, then the line check is $status', ({ theta, dpi, status, shows }) => {
    const [check] = checksOf('line-continuity', inputAtAngle(theta, dpi));
    expect(check).toMatchObject({ id: 'line-continuity:print-1', status });
    expect(check?.numbers).toContain(shows);
  });

  it('when the drops stay apart, then the reason names the dpi that would join them', () => {
    // 25 400 / 64.02 µm = 396.7 dpi (REFERENCES §3.2 footprint)
    const [check] = checksOf('line-continuity', inputAtAngle(30, 300));
    expect(check?.why).toContain('Drops stay separate beads');
    expect(check?.why).toContain('above 397 dpi');
  });

  it('when the ink spreads fully (OWRK cos θ ≥ 1), then the line passes', () => {
    // REFERENCES §2.3 spreading case: ink 28.0 (26.0 + 2.0) on the 45.414 + 4.945 mN/m solid → θ = 0°
    const input = makeInput({
      inks: [makeInk({ surfaceTensionMilliNPerM: 28, surfaceTensionDispersiveMilliNPerM: 26, surfaceTensionPolarMilliNPerM: 2 })],
      steps: [steps.print('print-1', { dpi: 100 })],
    });
    const [check] = checksOf('line-continuity', input);
    expect(check?.status).toBe('pass');
    expect(check?.numbers).toContain('θ 0°');
  });

  // prettier-ignore
  it.each([
    { name: "the ink's parts are unknown", ink: makeInk({ surfaceTensionDispersiveMilliNPerM: null, surfaceTensionPolarMilliNPerM: null }), film: makeSubstrate() },
    { name: "the film's energy is unknown", ink: makeInk(), film: makeSubstrate({ waterContactAngleDeg: null, diiodomethaneContactAngleDeg: null }) },
  ])('when $name, then the angle cannot be predicted and the check warns', ({ ink, film }) => {
    const [check] = checksOf('line-continuity', makeInput({ inks: [ink], substrates: [film], steps: [steps.print('print-1')] }));
    expect(check?.status).toBe('warning');
    expect(check?.why).toMatch(/Can't predict the contact angle/);
  });

  it('when a treatment sets only a total, then the parts are estimated and the numbers say so', () => {
    const input = makeInput({ steps: [steps.treatment('plasma', { targetSurfaceEnergyMilliNPerM: 60 }), steps.print('print-1')] });
    expect(checksOf('line-continuity', input)[0]?.numbers).toContain('parts estimated');
  });
});
