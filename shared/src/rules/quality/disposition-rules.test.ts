import { describe, expect, it } from 'vitest';

import { dispositionCoverage, dispositionIssues, isLotRelated, type DispositionContext, type DispositionRequest } from './disposition-rules';

describe('isLotRelated', () => {
  it.each([
    { rule: 'expired-lot', sourceType: 'lot', related: true },
    { rule: 'lot-past-pot-life', sourceType: 'lot', related: true },
    { rule: 'calibration-overdue', sourceType: 'heat-source', related: false },
    { rule: 'reading-out-of-limits', sourceType: 'reading', related: false },
    { rule: 'reported', sourceType: null, related: false },
    { rule: 'reported', sourceType: 'lot', related: true },
  ] as const)('when the rule is $rule from a $sourceType, then lot-related is $related', ({ rule, sourceType, related }) => {
    expect(isLotRelated({ rule, sourceType })).toBe(related);
  });
});

describe('dispositionCoverage', () => {
  it.each([
    { name: 'nothing is chosen and nothing decided', inQuestion: [1, 2, 3], decided: [], chosen: [], pieces: [1, 2, 3], remaining: [], complete: true },
    { name: 'nothing is chosen and piece 1 is decided', inQuestion: [1, 2, 3], decided: [1], chosen: [], pieces: [2, 3], remaining: [], complete: true },
    { name: 'piece 2 is chosen', inQuestion: [1, 2, 3], decided: [], chosen: [2], pieces: [2], remaining: [1, 3], complete: false },
    { name: 'the last open piece is chosen', inQuestion: [1, 2, 3], decided: [1, 3], chosen: [2], pieces: [2], remaining: [], complete: true },
    { name: 'a piece is chosen twice', inQuestion: [1, 2], decided: [], chosen: [2, 2], pieces: [2], remaining: [1], complete: false },
  ])('when $name, then it decides $pieces and leaves $remaining', ({ inQuestion, decided, chosen, pieces, remaining, complete }) => {
    const coverage = dispositionCoverage(inQuestion, decided, chosen);
    expect(coverage).toMatchObject({ pieceIds: pieces, remaining, isComplete: complete, outside: [], alreadyDecided: [] });
  });

  it('when a chosen piece is not in question or already decided, then it is reported and not decided again', () => {
    expect(dispositionCoverage([1, 2, 3], [1], [1, 2, 9])).toEqual({ pieceIds: [2], remaining: [3], isComplete: false, outside: [9], alreadyDecided: [1] });
  });
});

const context = (overrides: Partial<DispositionContext> = {}): DispositionContext => ({
  deviationId: 8,
  rule: 'reading-out-of-limits',
  sourceType: 'reading',
  coverage: dispositionCoverage([1, 2], [], []),
  versionStepIds: ['plasma-1', 'print-ag-1', 'cure-ag-1'],
  ...overrides,
});
const request = (overrides: Partial<DispositionRequest> = {}): DispositionRequest => ({ disposition: 'use-as-is', pieceIds: [], reworkStepIds: [], ...overrides });

describe('dispositionIssues', () => {
  it.each([
    { name: 'use as is for every piece', req: request(), ctx: context(), fields: [] },
    { name: 'rework with two steps of the version', req: request({ disposition: 'rework', reworkStepIds: ['print-ag-1', 'cure-ag-1'] }), ctx: context(), fields: [] },
    { name: 'rework without steps', req: request({ disposition: 'rework' }), ctx: context(), fields: ['reworkStepIds'] },
    { name: 'rework with a step the version lacks', req: request({ disposition: 'rework', reworkStepIds: ['dry-9'] }), ctx: context(), fields: ['reworkStepIds'] },
    { name: 'scrap naming steps to repeat', req: request({ disposition: 'scrap', reworkStepIds: ['cure-ag-1'] }), ctx: context(), fields: ['reworkStepIds'] },
    { name: 'return to supplier on a reading deviation', req: request({ disposition: 'return-to-supplier' }), ctx: context(), fields: ['disposition'] },
    { name: 'return to supplier on an expired lot', req: request({ disposition: 'return-to-supplier' }), ctx: context({ rule: 'expired-lot', sourceType: 'lot' }), fields: [] },
    { name: 'a piece outside the deviation', req: request({ pieceIds: [7] }), ctx: context({ coverage: dispositionCoverage([1, 2], [], [7]) }), fields: ['pieceIds'] },
    { name: 'every piece already decided', req: request(), ctx: context({ coverage: dispositionCoverage([1, 2], [1, 2], []) }), fields: ['pieceIds'] },
  ])('when the request is $name, then the fields at fault are $fields', ({ req, ctx, fields }) => {
    expect(dispositionIssues(req, ctx).map((i) => i.field)).toEqual(fields);
  });

  it('when return to supplier is asked on a reported problem, then the message says it is for lot deviations', () => {
    const [issue] = dispositionIssues(request({ disposition: 'return-to-supplier' }), context({ rule: 'reported', sourceType: null }));
    expect(issue?.message).toBe('Return to supplier is only for deviations about a material lot; pick another disposition.');
  });
});
