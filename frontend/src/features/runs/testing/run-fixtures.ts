import type { DraftContent, ReadingView, RecipeStep, RecipeStepOf, RunDetail } from '@tracewright/shared';

import { aDraftContent, BLANK_STEP_FIELDS } from '../../../../test/draft-content';
import { aRunSummary, ROBIN } from '../../../../test/run-summary';
import { aHeatSource, anInk } from './catalogue-records';

// An invented run of a silver trace label: print on PET, cure in an oven, measure the trace.

export const PRINT_STEP: RecipeStepOf<'print-pass'> = {
  ...BLANK_STEP_FIELDS,
  id: 'print-silver',
  kind: 'print-pass',
  title: 'Print silver traces',
  params: { inkId: 1, channel: 'C1', artworkFileId: null, dpi: 1000, passes: 2, platenTempC: null, nozzleCheckRequired: true, printedAreaFraction: null, pieceAreaMm2: null },
};

export const CURE_STEP: RecipeStep = {
  ...BLANK_STEP_FIELDS,
  id: 'cure-silver',
  kind: 'cure',
  title: 'Cure silver',
  minMinutes: 30,
  maxMinutes: 40,
  safetyNotes: ['Unload the oven with heat-resistant gloves.'],
  params: { heatSourceId: 1, temperatureC: 150, minutes: 30, rampCPerMinute: null },
};

export const INSPECT_STEP: RecipeStep = {
  ...BLANK_STEP_FIELDS,
  id: 'inspect-trace',
  kind: 'inspect',
  title: 'Measure the heater trace',
  readingSpecs: [
    { id: 'trace-ohm', name: 'Trace resistance', unit: 'Ω', target: 10, lowerLimit: 8, upperLimit: 12, required: true, perPiece: true, traceLengthMm: null, traceWidthMm: null },
  ],
  params: { lookFor: 'Breaks and bridges', measure: 'End-to-end resistance' },
};

export function aContent(overrides: Partial<DraftContent> = {}): DraftContent {
  return aDraftContent([PRINT_STEP, CURE_STEP, INSPECT_STEP], overrides);
}

// The runs list's record lives in test/ (the home page's tests use it too).
export { aRunSummary, ROBIN };
export const MIKA = { id: 2, name: 'Mika Sato' };

export function aReading(overrides: Partial<ReadingView> = {}): ReadingView {
  return {
    id: 1,
    stepId: 'inspect-trace',
    specId: 'trace-ohm',
    pieceId: 501,
    value: 10.4,
    unit: 'Ω',
    correctedValue: null,
    ambientTempC: null,
    instrumentId: null,
    outOfLimits: false,
    recordedAt: '2026-12-02T11:00:00Z',
    recordedBy: MIKA,
    supersededById: null,
    correctionReason: null,
    ...overrides,
  };
}

export function aRunDetail(overrides: Partial<RunDetail> = {}): RunDetail {
  const summary = aRunSummary(overrides);
  return {
    ...summary,
    notes: '',
    holdReason: null,
    content: aContent(),
    pieces: [
      { id: 501, code: `${summary.code}-01`, number: 1 },
      { id: 502, code: `${summary.code}-02`, number: 2 },
    ],
    lots: [{ lotId: 7, lotNumber: 'AN9-2611', materialType: 'ink', materialId: 1, materialName: 'Argent nano A9', flags: [], reason: null }],
    equipment: [{ kind: 'heat-source', id: 1, name: aHeatSource().name, calibrationDueOn: '2099-06-01', reason: null }],
    steps: [],
    timers: [],
    readings: [],
    deviations: [],
    safetyNotes: {},
    inks: [anInk()],
    instruments: [],
    serverTime: '2026-12-02T12:00:00Z',
    travellerUrl: `https://lab.example/run/${summary.id}`,
    ...overrides,
  };
}
