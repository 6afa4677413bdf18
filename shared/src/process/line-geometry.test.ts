import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import {
  beadCrossSectionAreaUm2,
  beadWidthUm,
  contactAngleBracket,
  dropDiameterUm,
  dropSpacingUm,
  dropVolumePl,
  equilibriumFootprintUm,
} from './line-geometry';
import { ProcessInputError } from './process-input-error';
import { expectRelativelyClose } from './test-support';

// All check values: REFERENCES §3.2 worked examples (derived there), tolerance ±0.1 %.
const REL = 0.001;

describe('dropSpacingUm', () => {
  it.each([
    // REFERENCES §3.2: p = 25 400 µm / dpi
    { dpi: 600, expected: 42.333 },
    { dpi: 1000, expected: 25.4 },
    { dpi: 1270, expected: 20 },
    { dpi: 2540, expected: 10 },
  ])('when printing at $dpi dpi, then drops are $expected µm apart', ({ dpi, expected }) => {
    expectRelativelyClose(dropSpacingUm(dpi), expected, REL);
  });
});

describe('dropVolumePl and dropDiameterUm', () => {
  it.each([
    // REFERENCES §3.2: V = π d₀³/6, 1 pL = 1000 µm³
    { d: 30, v: 14.137 },
    { d: 21, v: 4.849 },
  ])('when a drop is $d µm across, then it holds $v pL', ({ d, v }) => {
    expectRelativelyClose(dropVolumePl(d), v, REL);
  });

  it('when a drop holds 10 pL, then it is 26.730 µm across', () => {
    // REFERENCES §3.2: d₀ = (6V/π)^⅓
    expectRelativelyClose(dropDiameterUm(10), 26.73, REL);
  });

  it('when converting volume to diameter and back, then the volume is unchanged', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 1000, noNaN: true }), (v) => {
        expect(dropVolumePl(dropDiameterUm(v)) / v).toBeCloseTo(1, 12);
      }),
    );
  });
});

describe('contactAngleBracket', () => {
  it.each([
    // REFERENCES §3.2: θ/sin²θ − cosθ/sinθ
    { theta: 30, expected: 0.36234 },
    { theta: 45, expected: Math.PI / 2 - 1 },
    { theta: 90, expected: Math.PI / 2 },
  ])('when θ = $theta°, then the bracket is $expected', ({ theta, expected }) => {
    expectRelativelyClose(contactAngleBracket(theta), expected, REL);
  });
});

describe('beadWidthUm', () => {
  it.each([
    // REFERENCES §3.2: Stringer & Derby 2010 bead width, d₀ = 30 µm
    { p: 25, theta: 30, expected: 79.01 },
    { p: 20, theta: 30, expected: 88.34 },
    { p: 25, theta: 60, expected: 52.56 },
    { p: 25, theta: 90, expected: 37.95 },
  ])(
    'when 30 µm drops land $p µm apart at θ = $theta°, then the bead is $expected µm wide',
    ({ p, theta, expected }) => {
      const w = beadWidthUm({
        dropVolumePl: dropVolumePl(30),
        dropSpacingUm: p,
        contactAngleDeg: theta,
      });
      expectRelativelyClose(w, expected, REL);
    },
  );

  it.each([
    // REFERENCES §3.2 identity: bead cross-section × spacing = drop volume (volume conservation)
    { v: 14.137, p: 25, theta: 30 },
    { v: 4.849, p: 10, theta: 90 },
  ])(
    'when a bead forms from $v pL at $p µm, θ = $theta°, then area × spacing = drop volume',
    ({ v, p, theta }) => {
      const widthUm = beadWidthUm({ dropVolumePl: v, dropSpacingUm: p, contactAngleDeg: theta });
      const area = beadCrossSectionAreaUm2({ widthUm, contactAngleDeg: theta });
      expect((area * p) / 1000).toBeCloseTo(v, 9);
    },
  );

  it('when any bead forms, then a circular segment of that chord and angle holds one drop per spacing', () => {
    // REFERENCES §3.1: bead width follows from A·p = π d₀³/6. The area here uses the textbook
    // segment formula R²(φ − sin φ)/2 with R = w/(2 sin θ) and φ = 2θ, independent of our bracket.
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 200, noNaN: true }),
        fc.double({ min: 2, max: 200, noNaN: true }),
        fc.double({ min: 2, max: 178, noNaN: true }),
        (v, p, thetaDeg) => {
          const w = beadWidthUm({ dropVolumePl: v, dropSpacingUm: p, contactAngleDeg: thetaDeg });
          const theta = (thetaDeg * Math.PI) / 180;
          const radius = w / (2 * Math.sin(theta));
          const segmentArea = (radius ** 2 * (2 * theta - Math.sin(2 * theta))) / 2;
          expect((segmentArea * p) / 1000 / v).toBeCloseTo(1, 9);
        },
      ),
    );
  });

  it('when drops land closer together, then the bead gets wider (same volume over shorter length)', () => {
    // REFERENCES §3.2: 79.01 µm at 25 µm spacing, 88.34 µm at 20 µm
    const at = (p: number) =>
      beadWidthUm({ dropVolumePl: 14.137, dropSpacingUm: p, contactAngleDeg: 30 });
    expect(at(20)).toBeGreaterThan(at(25));
  });
});

describe('equilibriumFootprintUm', () => {
  it.each([
    // REFERENCES §3.2: spherical-cap spread factor β = d_eq/d₀
    { theta: 30, beta: 2.1341 },
    { theta: 60, beta: 1.6079 },
    { theta: 90, beta: 2 ** (1 / 3) },
  ])(
    'when a 30 µm drop rests at θ = $theta°, then its footprint is β = $beta times d₀',
    ({ theta, beta }) => {
      const d = equilibriumFootprintUm({ dropVolumePl: dropVolumePl(30), contactAngleDeg: theta });
      expectRelativelyClose(d / 30, beta, REL);
    },
  );

  it('when a 30 µm drop rests at 30°, then its footprint is 64.02 µm', () => {
    // REFERENCES §3.2: d_eq = 64.02 µm
    expectRelativelyClose(
      equilibriumFootprintUm({ dropVolumePl: dropVolumePl(30), contactAngleDeg: 30 }),
      64.02,
      REL,
    );
  });

  it('when any drop rests as a cap, then the cap volume πh(3a² + h²)/6 equals the drop volume', () => {
    // REFERENCES §3.1: the footprint follows from spherical-cap volume conservation; h = a·tan(θ/2)
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 200, noNaN: true }),
        fc.double({ min: 2, max: 178, noNaN: true }),
        (v, thetaDeg) => {
          const a = equilibriumFootprintUm({ dropVolumePl: v, contactAngleDeg: thetaDeg }) / 2;
          const h = a * Math.tan((thetaDeg * Math.PI) / 360);
          const capVolumePl = (Math.PI * h * (3 * a * a + h * h)) / 6 / 1000;
          expect(capVolumePl / v).toBeCloseTo(1, 9);
        },
      ),
    );
  });
});

describe('line geometry: input errors', () => {
  it.each([
    { name: 'dpi 0', call: () => dropSpacingUm(0), field: 'dpi' },
    { name: 'dpi NaN', call: () => dropSpacingUm(Number.NaN), field: 'dpi' },
    { name: 'negative volume', call: () => dropDiameterUm(-1), field: 'dropVolumePl' },
    { name: 'zero diameter', call: () => dropVolumePl(0), field: 'dropDiameterUm' },
    { name: 'angle 0°', call: () => contactAngleBracket(0), field: 'contactAngleDeg' },
    { name: 'angle 180°', call: () => contactAngleBracket(180), field: 'contactAngleDeg' },
    {
      name: 'angle 181°',
      call: () => beadWidthUm({ dropVolumePl: 10, dropSpacingUm: 25, contactAngleDeg: 181 }),
      field: 'contactAngleDeg',
    },
    {
      name: 'zero spacing',
      call: () => beadWidthUm({ dropVolumePl: 10, dropSpacingUm: 0, contactAngleDeg: 30 }),
      field: 'dropSpacingUm',
    },
    {
      name: 'NaN angle',
      call: () => equilibriumFootprintUm({ dropVolumePl: 10, contactAngleDeg: Number.NaN }),
      field: 'contactAngleDeg',
    },
    {
      name: 'negative width',
      call: () => beadCrossSectionAreaUm2({ widthUm: -5, contactAngleDeg: 30 }),
      field: 'widthUm',
    },
  ])('when given $name, then ProcessInputError names $field', ({ call, field }) => {
    expect(call).toThrow(ProcessInputError);
    expect(call).toThrow(expect.objectContaining({ field }));
  });
});
