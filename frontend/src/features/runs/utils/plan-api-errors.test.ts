import { describe, expect, it } from 'vitest';

import { ApiError } from '../../../lib/api-error';
import { placePlanError } from './plan-api-errors';

const SENT = {
  input: {
    lots: [{ lotId: 7, reason: null }],
    equipment: [
      { kind: 'heat-source' as const, id: 2, reason: null },
      { kind: 'instrument' as const, id: 6, reason: null },
    ],
  },
  paths: { lots: ['lots.1'], equipment: ['machines.0', 'instruments.2'] },
};

describe('placePlanError', () => {
  it('when a 400 names lots and machines that need a reason, then each message goes to that choice’s reason field', () => {
    const error = new ApiError(400, 'VALIDATION_FAILED', 'Reasons needed.', {
      issues: [
        { kind: 'lot', id: 7, message: 'Lot AN9-2611 expired.' },
        { kind: 'instrument', id: 6, message: 'Bench meter 1 is overdue.' },
      ],
    });

    expect(placePlanError(error, SENT)).toEqual({
      fields: [
        { path: 'lots.1.reason', message: 'Lot AN9-2611 expired.' },
        { path: 'instruments.2.reason', message: 'Bench meter 1 is overdue.' },
      ],
      root: null,
      checks: [],
    });
  });

  it('when a 400 carries flattened field errors, then plain fields and dotted entries land in place and the rest on top', () => {
    const error = new ApiError(400, 'VALIDATION_FAILED', 'Check the form.', {
      formErrors: ['Version 11 is retired.'],
      fieldErrors: { quantity: ['At most 500 pieces per run.'], 'equipment.0.reason': ['Give a reason.'], 'lots.0.lotId': ['No such lot.'], equipment: ['Too many.'] },
    });

    expect(placePlanError(error, SENT)).toEqual({
      fields: [
        { path: 'quantity', message: 'At most 500 pieces per run.' },
        { path: 'machines.0.reason', message: 'Give a reason.' },
        { path: 'lots.1.lotId', message: 'No such lot.' },
      ],
      root: 'Version 11 is retired. Too many.',
      checks: [],
    });
  });

  it('when a 422 carries checks, then only the blocking ones are kept and the message goes on top', () => {
    const check = { id: 'heat:1', family: 'heat', stepId: null, title: 'Too hot', numbers: '185 °C', why: 'Film shrinks.' };
    const error = new ApiError(422, 'UNPROCESSABLE', 'A check blocks.', { checks: [{ ...check, status: 'blocked' }, { ...check, id: 'heat:2', status: 'warning' }] });

    const placed = placePlanError(error, SENT);

    expect(placed.checks.map((c) => c.id)).toEqual(['heat:1']);
    expect(placed.root).toBe('A check blocks.');
  });

  it('when something other than the API fails, then a plain apology goes on top', () => {
    expect(placePlanError(new TypeError('boom'), SENT).root).toMatch(/^Something went wrong on our side/);
  });

  it('when a 400 carries both field errors and the same issues, then each field gets one message, the field error’s', () => {
    const error = new ApiError(400, 'VALIDATION_FAILED', 'A reason is needed.', {
      formErrors: [],
      fieldErrors: { 'lots.0.reason': ['Lot AN9-2611 expired. Say why it is used anyway.'] },
      issues: [{ kind: 'lot', id: 7, message: 'Lot AN9-2611 expired.' }],
    });

    expect(placePlanError(error, SENT)).toEqual({
      fields: [{ path: 'lots.1.reason', message: 'Lot AN9-2611 expired. Say why it is used anyway.' }],
      root: null,
      checks: [],
    });
  });
});
