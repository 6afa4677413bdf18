import type { DeviationDetail, DeviationQueue } from '@tracewright/shared';

type QueueItem = DeviationQueue['items'][number];

export const HASH = 'a3f1c09b5e7d2468a3f1c09b5e7d2468a3f1c09b5e7d2468a3f1c09b5e7d2468';

export function aQueueItem(overrides: Partial<QueueItem> = {}): QueueItem {
  return {
    id: 31,
    runId: 41,
    stepId: 'cure-step-01',
    rule: 'reading-out-of-limits',
    severity: 'major',
    state: 'open',
    title: 'Trace resistance above limit',
    expected: 'Trace resistance 8.0–12.0 Ω',
    actual: '14.6 Ω on piece R-2026-0041-02',
    pieceIds: [501, 502],
    photoFileIds: [],
    createdAt: '2026-11-30T09:15:00Z',
    createdBy: null,
    runCode: 'R-2026-0041',
    recipeCode: 'LENS-HEAT-2',
    stepKind: 'cure',
    stepTitle: 'Cure silver trace',
    assignee: null,
    ageDays: 2.3,
    ...overrides,
  };
}

export function aDeviation(overrides: Partial<DeviationDetail> = {}): DeviationDetail {
  return {
    ...aQueueItem(),
    contentHash: HASH,
    run: { id: 41, code: 'R-2026-0041', state: 'completed', recipeCode: 'LENS-HEAT-2', versionNumber: 3 },
    step: { id: 'cure-step-01', kind: 'cure', title: 'Cure silver trace', number: 4 },
    pieces: [
      { id: 501, code: 'R-2026-0041-01' },
      { id: 502, code: 'R-2026-0041-02' },
      { id: 503, code: 'R-2026-0041-03' },
    ],
    lots: [{ lotId: 7, lotNumber: 'AG-2611-04', materialName: 'Silver nano ink A9' }],
    readings: [{ id: 900, specName: 'Trace resistance', value: 14.6, unit: 'Ω', outOfLimits: true, recordedAt: '2026-11-30T09:14:00Z' }],
    events: [{ id: 1, at: '2026-11-30T09:15:00Z', by: null, kind: 'created', text: 'Raised by the reading rule.' }],
    dispositions: [],
    closure: null,
    ...overrides,
  };
}

/** A closed deviation: one signed disposition and the signed closure. */
export function aClosedDeviation(): DeviationDetail {
  const signature = (meaning: string, signedAt: string) => ({ signedBy: 'Robin Vale', meaning, signedAt, contentHash: HASH });
  return aDeviation({
    state: 'closed',
    assignee: { id: 1, name: 'Robin Vale' },
    dispositions: [
      {
        id: 3,
        disposition: 'scrap',
        rationale: 'Resistance far above the limit; the trace cannot be reworked.',
        pieceIds: [502],
        reworkRunId: null,
        correctiveAction: { note: 'Recalibrate the oven probe', owner: { id: 5, name: 'Ada Kerr' }, dueOn: '2026-12-10', verifiedAt: '2026-12-09T10:00:00Z' },
        signature: signature('Dispositioned', '2026-12-01T10:00:00Z'),
      },
    ],
    closure: { verificationNote: 'Probe checked against the reference: within 0.5 °C.', signature: signature('Verified and closed', '2026-12-09T10:05:00Z') },
  });
}
