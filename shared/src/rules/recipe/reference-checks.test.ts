import { describe, expect, it } from 'vitest';

import { checksOf, makeHeatSource, makeInk, makeInput, makeSetup, makeSubstrate, steps } from './test-fixtures';

// Which records must exist is a product rule (the other checks cannot run without them), no source needed.
const statuses = (input: Parameters<typeof checksOf>[1]) => checksOf('references', input).map((c) => `${c.id}=${c.status}`);

describe('referenceChecks', () => {
  // prettier-ignore
  it.each([
    { name: 'every record is found', input: makeInput({ steps: [steps.print('p')] }), expected: ['references:all=pass'] },
    { name: 'the print pass names a missing ink', input: makeInput({ setup: makeSetup({ channelPlan: [] }), steps: [steps.print('p', { inkId: 9 })] }), expected: ['references:p:ink=blocked'] },
    { name: 'the setup names a missing substrate', input: makeInput({ setup: makeSetup({ substrateId: 5 }), steps: [steps.print('p')] }), expected: ['references:substrate=blocked'] },
    { name: 'no substrate is chosen but a cure needs one', input: makeInput({ setup: makeSetup({ substrateId: null }), steps: [steps.cure('c')] }), expected: ['references:substrate=blocked'] },
    { name: 'no substrate is chosen and only an inspection exists', input: makeInput({ setup: makeSetup({ substrateId: null, printerId: null, channelPlan: [] }), steps: [steps.inspect('i')] }), expected: ['references:all=pass'] },
    { name: 'no printer is chosen for a print pass', input: makeInput({ setup: makeSetup({ printerId: null }), steps: [steps.print('p')] }), expected: ['references:printer=blocked'] },
    { name: 'the receiving substrate is missing', input: makeInput({ setup: makeSetup({ receivingSubstrateId: 8 }) }), expected: ['references:receiving-substrate=blocked'] },
    { name: 'a step names a missing heat source', input: makeInput({ steps: [steps.cure('c', { heatSourceId: 4 })] }), expected: ['references:c:heat-source=blocked'] },
    { name: 'the channel plan names a missing ink', input: makeInput({ setup: makeSetup({ channelPlan: [{ channel: 'C2', inkId: 6 }] }) }), expected: ['references:channel-plan:C2=blocked'] },
    { name: 'the setup lists a missing heat source', input: makeInput({ setup: makeSetup({ heatSourceIds: [3] }), heatSources: [makeHeatSource()] }), expected: ['references:heat-source-3=blocked'] },
    { name: 'the ink is archived', input: makeInput({ inks: [makeInk({ archived: true })], steps: [steps.print('p')] }), expected: ['references:channel-plan:C1=warning', 'references:p:ink=warning'] },
    { name: 'the substrate is archived', input: makeInput({ substrates: [makeSubstrate({ archived: true })] }), expected: ['references:substrate=warning'] },
  ])('when $name, then $expected', ({ input, expected }) => {
    expect(statuses(input)).toEqual(expected);
  });

  it('when a record is missing, then the reason says which one and where', () => {
    const [check] = checksOf('references', makeInput({ setup: makeSetup({ channelPlan: [] }), steps: [steps.print('p', { inkId: 9 }, { title: 'Print silver' })] }));
    expect(check?.why).toBe("Ink #9 in step 1 “Print silver” is not in the lab's records (deleted, or not loaded); pick another.");
  });
});
