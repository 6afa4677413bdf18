import { describe, expect, it } from 'vitest';

import { checksOf, makeInk, makeInput, makeSetup, steps } from './test-fixtures';

// Channel-plan rules are product rules (a cartridge holds one ink), no source needed. The fixture
// printer has channels C1–C4; ink 1 is silver, ink 2 a dielectric (invented).
const inks = [makeInk({ id: 1, name: 'Silver' }), makeInk({ id: 2, name: 'Cover', function: 'dielectric' })];
const judge = (channelPlan: { channel: string; inkId: number }[], passes: ReturnType<typeof steps.print>[]) =>
  checksOf('channel-plan', makeInput({ inks, setup: makeSetup({ channelPlan }), steps: passes }));

describe('channelPlanChecks', () => {
  // prettier-ignore
  it.each([
    { name: 'the pass prints the planned ink', plan: [{ channel: 'C1', inkId: 1 }], pass: { inkId: 1, channel: 'C1' }, status: 'pass', title: 'Channel C1 carries Silver' },
    { name: 'channel names differ only in case', plan: [{ channel: 'c1', inkId: 1 }], pass: { inkId: 1, channel: 'C1' }, status: 'pass', title: 'Channel C1 carries Silver' },
    { name: 'the channel is not in the plan', plan: [{ channel: 'C1', inkId: 1 }], pass: { inkId: 2, channel: 'C2' }, status: 'blocked', title: 'Channel C2 not in the plan' },
    { name: 'the plan loads another ink on the channel', plan: [{ channel: 'C1', inkId: 2 }], pass: { inkId: 1, channel: 'C1' }, status: 'blocked', title: 'Wrong ink on channel C1' },
    { name: 'the printer has no such channel', plan: [{ channel: 'C1', inkId: 1 }], pass: { inkId: 1, channel: 'C9' }, status: 'blocked', title: 'Printer has no channel C9' },
  ])('when $name, then the pass is $status', ({ plan, pass, status, title }) => {
    const check = judge(plan, [steps.print('p', pass)]).find((c) => c.stepId === 'p');
    expect(check).toMatchObject({ id: 'channel-plan:p', status, title });
  });

  it('when one channel carries two inks, then the plan is blocked', () => {
    const checks = judge([{ channel: 'C1', inkId: 1 }, { channel: 'C1', inkId: 2 }], []);
    expect(checks).toEqual([expect.objectContaining({ id: 'channel-plan:c1:two-inks', stepId: null, status: 'blocked', numbers: 'C1: Silver and Cover' })]);
  });

  it('when the plan names a channel the printer lacks, then the plan is blocked', () => {
    const checks = judge([{ channel: 'C7', inkId: 1 }], []);
    expect(checks).toEqual([expect.objectContaining({ id: 'channel-plan:c7:unknown', status: 'blocked' })]);
  });

  it('when the same channel appears twice with the same ink, then that is not a conflict', () => {
    expect(judge([{ channel: 'C1', inkId: 1 }, { channel: 'C1', inkId: 1 }], [])).toEqual([]);
  });
});
