import { describe, expect, it } from 'vitest';

import { buildRecipeContext, substratesAt } from './recipe-context';
import { makeInput, makeSetup, makeSubstrate, steps } from './test-fixtures';

const input = makeInput({
  setup: makeSetup({ receivingSubstrateId: 2 }),
  substrates: [makeSubstrate({ id: 1, name: 'Carrier' }), makeSubstrate({ id: 2, name: 'Receiver' })],
  steps: [steps.print('p'), steps.cure('c'), steps.transfer('t'), steps.cure('after')],
});

describe('buildRecipeContext', () => {
  it('when the setup names records, then they are resolved and the first transfer is found', () => {
    const ctx = buildRecipeContext(input);
    expect(ctx.substrate?.name).toBe('Carrier');
    expect(ctx.receiving?.name).toBe('Receiver');
    expect(ctx.printer?.id).toBe(1);
    expect(ctx.firstTransferIndex).toBe(2);
  });

  it('when a named record is missing, then it resolves to null', () => {
    const ctx = buildRecipeContext({ ...input, setup: makeSetup({ substrateId: 9, printerId: 9 }) });
    expect([ctx.substrate, ctx.printer]).toEqual([null, null]);
  });
});

describe('substratesAt', () => {
  // prettier-ignore
  it.each([
    { index: 1, expected: ['print-substrate:Carrier'] },
    { index: 2, expected: ['print-substrate:Carrier', 'receiving-substrate:Receiver'] },
    { index: 3, expected: ['receiving-substrate:Receiver'] },
  ])('when at step index $index, then the heated substrates are $expected', ({ index, expected }) => {
    expect(substratesAt(buildRecipeContext(input), index).map((s) => `${s.role}:${s.substrate.name}`)).toEqual(expected);
  });

  it('when there is no transfer, then every step sits on the print substrate', () => {
    const ctx = buildRecipeContext(makeInput({ steps: [steps.print('p'), steps.cure('c')] }));
    expect(substratesAt(ctx, 1).map((s) => s.role)).toEqual(['print-substrate']);
  });
});
