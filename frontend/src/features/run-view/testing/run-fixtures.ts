import { RunDetailSchema, type RunDetail } from '@tracewright/shared';

import { recordOf } from '../utils/bench-run';

/** Invented demo data: a lens-wrap heater run with a cure and an inspection (values for tests only). */
export const RUN_ID = 7;
export const CURE_STEP_ID = 'cure-step-1';
export const INSPECT_STEP_ID = 'inspect-step-2';
export const RESISTANCE_SPEC_ID = 'spec-resistance';

const step = (id: string, title: string) => ({ id, title, instructions: '', minMinutes: null, maxMinutes: null, handsOnMinutes: null, readingSpecs: [], safetyNotes: [] });

const RAW_RUN = {
  id: RUN_ID,
  code: 'R-2026-0007',
  state: 'in-progress',
  recipeId: 3,
  recipeCode: 'LENS-HEAT',
  recipeName: 'Lens-wrap heater',
  versionId: 31,
  versionNumber: 2,
  quantity: 2,
  dueOn: null,
  doneSteps: 0,
  totalSteps: 2,
  openDeviations: 0,
  createdAt: '2026-12-01T08:00:00.000Z',
  createdBy: { id: 9, name: 'Ada Quill' },
  notes: '',
  holdReason: null,
  content: {
    steps: [
      { ...step(CURE_STEP_ID, 'Cure the silver heater trace'), kind: 'cure', minMinutes: 30, maxMinutes: 40, instructions: 'Lay the sheet flat on the tray.\n\n- Close the door\n- <b>Do not</b> open it early', params: { heatSourceId: null, temperatureC: 150, minutes: 30, rampCPerMinute: null } },
      {
        ...step(INSPECT_STEP_ID, 'Measure the heater trace'),
        kind: 'inspect',
        params: { lookFor: 'Cracks along the bends', measure: 'End-to-end resistance' },
        readingSpecs: [{ id: RESISTANCE_SPEC_ID, name: 'Trace resistance', unit: 'Ω', target: 10, lowerLimit: 8, upperLimit: 12, required: true, perPiece: false, traceLengthMm: null, traceWidthMm: null }],
      },
    ],
  },
  pieces: [
    { id: 101, code: 'R-2026-0007-01', number: 1 },
    { id: 102, code: 'R-2026-0007-02', number: 2 },
  ],
  lots: [],
  equipment: [],
  steps: [],
  timers: [],
  readings: [],
  deviations: [],
  safetyNotes: {
    [CURE_STEP_ID]: [{ code: 'hot-surface', text: 'Hot surface at 150 °C: wear heat-resistant gloves and let parts cool before handling.', severity: 'caution' }],
  },
  inks: [],
  instruments: [{ id: 5, name: 'Bench meter 2', kind: 'multimeter', calibrationDueOn: '2099-01-01' }],
  serverTime: '2026-12-02T10:00:00.000Z',
  travellerUrl: 'https://lab.example/run/7',
};

/** The run as GET /api/runs/7 answers, parsed by the shared schema so fixtures can't drift from it. */
export function aRun(overrides: Partial<RunDetail> = {}): RunDetail {
  return RunDetailSchema.parse({ ...RAW_RUN, ...overrides });
}

type StepRecord = RunDetail['steps'][number];

/** A step's record in a given state, as the server would hold it. */
export function aStepRecord(stepId: string, overrides: Partial<StepRecord> = {}): StepRecord {
  return { ...recordOf({ steps: [] }, stepId), ...overrides };
}

const ROBIN = { id: 1, name: 'Robin Vale' };

/** The cure done and the inspection under way: where reading tests start. */
export function aRunAtInspection(overrides: Partial<RunDetail> = {}): RunDetail {
  return aRun({
    steps: [
      aStepRecord(CURE_STEP_ID, { state: 'done', safetyAcknowledgedAt: '2026-12-02T09:00:00.000Z', safetyAcknowledgedBy: ROBIN, startedAt: '2026-12-02T09:00:00.000Z', startedBy: ROBIN, completedAt: '2026-12-02T09:31:00.000Z', completedBy: ROBIN }),
      aStepRecord(INSPECT_STEP_ID, { state: 'in-progress', startedAt: '2026-12-02T09:40:00.000Z', startedBy: ROBIN }),
    ],
    ...overrides,
  });
}
