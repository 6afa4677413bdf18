import { describe, expect, it } from 'vitest';

import { aContent, PRINT_STEP } from '../testing/run-fixtures';
import { lotSlotsOf, machineSlotsOf, planChoices, planDefaults } from './plan-form-values';

describe('plan form values', () => {
  it('when a version prints two inks and names a receiving substrate, then one lot slot each, inks first', () => {
    const content = aContent({ receivingSubstrateId: 4, steps: [PRINT_STEP, { ...PRINT_STEP, id: 'print-cover', params: { ...PRINT_STEP.params, inkId: 2 } }] });

    expect(lotSlotsOf(content).map((s) => `${s.materialType}:${s.materialId}`)).toEqual(['ink:1', 'ink:2', 'substrate:1', 'substrate:4']);
  });

  it('when a version names machines, then each slot starts as the version’s own machine', () => {
    expect(machineSlotsOf(aContent({ heatSourceIds: [1, 3], treaterIds: [5] })).map((s) => `${s.kind}:${s.id}`)).toEqual([
      'printer:1',
      'heat-source:1',
      'heat-source:3',
      'surface-treater:5',
    ]);
  });

  it('when choices are made, then the request lists them with blank reasons as null, and each entry knows its field', () => {
    const values = planDefaults(aContent(), [6, 7]);
    values.lots = values.lots.map((slot, i) => ({ ...slot, lotId: String(10 + i), reason: i === 0 ? '  Only lot left.  ' : '  ' }));
    values.instruments = [
      { id: 6, chosen: false, reason: '' },
      { id: 7, chosen: true, reason: 'Due tomorrow; checked against the reference.' },
    ];

    expect(planChoices(values)).toEqual({
      lots: [
        { lotId: 10, reason: 'Only lot left.' },
        { lotId: 11, reason: null },
      ],
      equipment: [
        { kind: 'printer', id: 1, reason: null },
        { kind: 'heat-source', id: 1, reason: null },
        { kind: 'instrument', id: 7, reason: 'Due tomorrow; checked against the reference.' },
      ],
      paths: { lots: ['lots.0', 'lots.1'], equipment: ['machines.0', 'machines.1', 'instruments.1'] },
    });
  });
});
