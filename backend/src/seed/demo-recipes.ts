import type { z } from 'zod';

import type { DraftContentSchema, SolventSchema } from '@tracewright/shared';

// Demo data only, for the fictional Larkspur Soft Circuits Lab: invented processes, settings and
// limits that look plausible with the demo materials. They are never check values.

type DemoContent = z.input<typeof DraftContentSchema>;
type DemoStep = NonNullable<DemoContent['steps']>[number];

/** Database ids of the demo records the recipes point at, found by name when seeding. */
export interface DemoIds {
  inks: { silver: number; polymer: number; dielectric: number; graphic: number };
  substrates: { pet: number; tpu: number; paper: number };
  printers: { north: number; south: number };
  heat: { oven: number; hotPlate: number };
  treaters: { plasma: number; wipe: number };
}

const ISOPROPANOL: z.input<typeof SolventSchema> = {
  name: 'Isopropanol',
  casNumber: '67-63-0',
  hazardCodes: ['H225', 'H319', 'H336'],
  pictograms: ['GHS02', 'GHS07'],
  signalWord: 'Danger',
};

/** TOUCH-4K v1: silver key electrodes on PET, cured, with a connector tail. Released in the demo. */
export function touchStripV1(ids: DemoIds): DemoContent {
  return {
    substrateId: ids.substrates.pet,
    printerId: ids.printers.north,
    channelPlan: [{ channel: 'Ag conductor', inkId: ids.inks.silver }],
    heatSourceIds: [ids.heat.hotPlate, ids.heat.oven],
    treaterIds: [ids.treaters.wipe],
    changeNote: 'First issue for the pilot batch of 40 strips.',
    steps: [
      {
        id: 'wipe-pet',
        kind: 'surface-treatment',
        title: 'Wipe the PET sheet',
        instructions: 'Two strokes, one direction, with a fresh lint-free wipe each time. Let it flash off for 2 minutes.',
        params: { method: 'solvent-wipe', treaterId: ids.treaters.wipe, settings: 'Isopropanol, two strokes', maxWaitBeforePrintMinutes: 30, solvent: ISOPROPANOL },
      },
      {
        id: 'print-keys',
        kind: 'print-pass',
        title: 'Print the key electrodes and traces',
        instructions: 'Run the nozzle check first. Align the sheet to the corner stops, print side up.',
        params: { inkId: ids.inks.silver, channel: 'Ag conductor', dpi: 1270, passes: 2, platenTempC: 35, printedAreaFraction: 0.18, pieceAreaMm2: 12_000 },
      },
      { id: 'dry-keys', kind: 'dry', title: 'Dry on the hot plate', minMinutes: 5, maxMinutes: 10, params: { method: 'hot-plate', heatSourceId: ids.heat.hotPlate, temperatureC: 60 } },
      { id: 'cure-keys', kind: 'cure', title: 'Cure the silver', instructions: 'Middle shelf, logger probe beside the sheet.', params: { heatSourceId: ids.heat.oven, temperatureC: 110, minutes: 200, rampCPerMinute: 5 } },
      {
        id: 'attach-tail',
        kind: 'attach-parts',
        title: 'Fit the connector tail',
        params: { method: 'z-axis-tape', parts: [{ name: '6-way flat flex tail, 0.5 mm pitch', quantity: 1, placement: 'Connector pads at the strip end' }] },
      },
      {
        id: 'inspect-keys',
        kind: 'inspect',
        title: 'Inspect and measure',
        params: { lookFor: 'Breaks, bridges between keys, silver in the key gaps.', measure: 'Each key trace, pad to connector; then key-to-key isolation.' },
        readingSpecs: [
          { id: 'r-key-1', name: 'Key 1 trace resistance', unit: 'Ω', target: 5.4, lowerLimit: 3, upperLimit: 9, perPiece: true, traceLengthMm: 120, traceWidthMm: 1 },
          { id: 'r-key-4', name: 'Key 4 trace resistance', unit: 'Ω', target: 8.1, lowerLimit: 5, upperLimit: 12, perPiece: true, traceLengthMm: 180, traceWidthMm: 1 },
          { id: 'iso-keys', name: 'Key-to-key isolation', unit: 'MΩ', lowerLimit: 20, perPiece: true },
        ],
      },
    ],
  };
}

/** TOUCH-4K v2 (draft): v1 plus a printed dielectric cover that leaves the connector pads bare. */
export function touchStripV2(ids: DemoIds): DemoContent {
  const v1 = touchStripV1(ids);
  const steps = v1.steps ?? [];
  const cover: DemoStep[] = [
    {
      id: 'print-cover',
      kind: 'print-pass',
      title: 'Print the dielectric cover',
      instructions: 'Cover artwork only: the connector pads must stay bare.',
      params: { inkId: ids.inks.dielectric, channel: 'Cover dielectric', dpi: 1270, passes: 2, printedAreaFraction: 0.7, pieceAreaMm2: 12_000 },
    },
    { id: 'cure-cover', kind: 'cure', title: 'Cure the cover', params: { heatSourceId: ids.heat.oven, temperatureC: 110, minutes: 70, rampCPerMinute: 5 } },
  ];
  const afterCure = steps.findIndex((s) => s.id === 'cure-keys') + 1;
  return {
    ...v1,
    channelPlan: [...(v1.channelPlan ?? []), { channel: 'Cover dielectric', inkId: ids.inks.dielectric }],
    changeNote: 'Adds a printed dielectric cover over the traces; the connector pads stay bare.',
    steps: [...steps.slice(0, afterCure), ...cover, ...steps.slice(afterCure)],
  };
}

/** LENS-HEAT (in review): a silver heater trace on plasma-treated TPU under a dielectric cover. */
export function lensHeater(ids: DemoIds): DemoContent {
  return {
    substrateId: ids.substrates.tpu,
    printerId: ids.printers.north,
    channelPlan: [
      { channel: 'Ag conductor', inkId: ids.inks.silver },
      { channel: 'Cover dielectric', inkId: ids.inks.dielectric },
    ],
    heatSourceIds: [ids.heat.hotPlate, ids.heat.oven],
    treaterIds: [ids.treaters.plasma],
    changeNote: 'First issue: heater for the anti-fog lens wrap.',
    steps: [
      {
        id: 'plasma-tpu',
        kind: 'surface-treatment',
        title: 'Plasma-treat the TPU',
        instructions: 'TPU taped flat on its glass carrier. Print within the hour.',
        params: { method: 'plasma', treaterId: ids.treaters.plasma, settings: '2 passes at 10 mm/s, 8 mm stand-off', targetSurfaceEnergyMilliNPerM: 52, targetWaterContactAngleDeg: 45, maxWaitBeforePrintMinutes: 60 },
        readingSpecs: [{ id: 'ca-water', name: 'Water contact angle after plasma', unit: '°', target: 45, upperLimit: 55 }],
      },
      { id: 'print-heater', kind: 'print-pass', title: 'Print the heater trace', params: { inkId: ids.inks.silver, channel: 'Ag conductor', dpi: 1270, passes: 3, printedAreaFraction: 0.12, pieceAreaMm2: 6_000 } },
      { id: 'dry-heater', kind: 'dry', title: 'Dry on the hot plate', minMinutes: 5, maxMinutes: 10, params: { method: 'hot-plate', heatSourceId: ids.heat.hotPlate, temperatureC: 60 } },
      { id: 'cure-heater', kind: 'cure', title: 'Cure the silver', params: { heatSourceId: ids.heat.oven, temperatureC: 100, minutes: 300, rampCPerMinute: 3 } },
      { id: 'print-hcover', kind: 'print-pass', title: 'Print the cover', instructions: 'Leave the two lead pads bare.', params: { inkId: ids.inks.dielectric, channel: 'Cover dielectric', dpi: 1270, passes: 2, printedAreaFraction: 0.5, pieceAreaMm2: 6_000 } },
      { id: 'cure-hcover', kind: 'cure', title: 'Cure the cover', params: { heatSourceId: ids.heat.oven, temperatureC: 100, minutes: 120, rampCPerMinute: 3 } },
      {
        id: 'attach-leads',
        kind: 'attach-parts',
        title: 'Attach the lead wires',
        params: { method: 'z-axis-tape', parts: [{ name: 'Silicone lead wire, 30 AWG, 150 mm', quantity: 2, placement: 'One on each lead pad' }] },
      },
      {
        id: 'inspect-heater',
        kind: 'inspect',
        title: 'Measure the heater',
        params: { measure: 'Heater resistance across the lead pads; surface temperature at 5 V after 2 minutes.' },
        safetyNotes: ['Worn near the face: power the heater at 5 V at most during the test, and only with its cover intact.'],
        readingSpecs: [
          { id: 'r-heater', name: 'Heater resistance', unit: 'Ω', target: 6, lowerLimit: 4.5, upperLimit: 8, perPiece: true, traceLengthMm: 400, traceWidthMm: 2 },
          { id: 't-surface', name: 'Surface temperature at 5 V, 2 min', unit: '°C', target: 38, upperLimit: 43, perPiece: true },
        ],
      },
    ],
  };
}

/** HUMID-LBL (draft): conductive-polymer interdigitated electrodes and a printed legend on coated paper. */
export function humidityLabel(ids: DemoIds): DemoContent {
  return {
    substrateId: ids.substrates.paper,
    printerId: ids.printers.south,
    channelPlan: [
      { channel: 'Polymer conductor', inkId: ids.inks.polymer },
      { channel: 'Graphic black', inkId: ids.inks.graphic },
    ],
    heatSourceIds: [ids.heat.hotPlate, ids.heat.oven],
    changeNote: 'Work in progress: finger pitch still being tuned.',
    steps: [
      { id: 'print-idt', kind: 'print-pass', title: 'Print the interdigitated electrodes', params: { inkId: ids.inks.polymer, channel: 'Polymer conductor', dpi: 600, passes: 3, printedAreaFraction: 0.35, pieceAreaMm2: 1_500 } },
      { id: 'dry-idt', kind: 'dry', title: 'Dry on the hot plate', minMinutes: 5, maxMinutes: 10, params: { method: 'hot-plate', heatSourceId: ids.heat.hotPlate, temperatureC: 70 } },
      { id: 'print-legend', kind: 'print-pass', title: 'Print the legend and marks', params: { inkId: ids.inks.graphic, channel: 'Graphic black', dpi: 600, passes: 1, printedAreaFraction: 0.05, pieceAreaMm2: 1_500 } },
      { id: 'cure-label', kind: 'cure', title: 'Cure the label', params: { heatSourceId: ids.heat.oven, temperatureC: 110, minutes: 20 } },
      {
        id: 'inspect-label',
        kind: 'inspect',
        title: 'Measure the sensor',
        params: { lookFor: 'Fingers separate along their whole length.', measure: 'Comb resistance pad to far finger tip; capacitance in the 50 % RH box.' },
        readingSpecs: [
          { id: 'r-comb', name: 'Comb resistance', unit: 'Ω', target: 8800, lowerLimit: 5000, upperLimit: 14_000, traceLengthMm: 60, traceWidthMm: 0.5 },
          { id: 'c-50rh', name: 'Capacitance at 50 % RH', unit: 'pF', target: 12, lowerLimit: 8, upperLimit: 16, perPiece: true },
        ],
      },
    ],
  };
}
