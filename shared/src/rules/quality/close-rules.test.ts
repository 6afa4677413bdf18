import { describe, expect, it } from 'vitest';

import { closeBlockers, type CloseContext } from './close-rules';

const base: CloseContext = { deviationId: 4, hasCorrectiveAction: false, verificationNote: '', reworkRuns: [] };

describe('closeBlockers', () => {
  it.each([
    { name: 'no corrective action and no rework', ctx: base, blockers: [] },
    { name: 'a corrective action with its verification', ctx: { ...base, hasCorrectiveAction: true, verificationNote: 'Oven re-profiled; three cures logged in window.' }, blockers: [] },
    { name: 'a corrective action without verification', ctx: { ...base, hasCorrectiveAction: true, verificationNote: '  ' }, blockers: ['verificationNote'] },
    { name: 'a completed rework run', ctx: { ...base, reworkRuns: [{ code: 'R-2026-0009', state: 'completed' as const }] }, blockers: [] },
    { name: 'a signed-off rework run', ctx: { ...base, reworkRuns: [{ code: 'R-2026-0009', state: 'closed' as const }] }, blockers: [] },
    { name: 'a rework run still planned', ctx: { ...base, reworkRuns: [{ code: 'R-2026-0009', state: 'planned' as const }] }, blockers: ['(state)'] },
    { name: 'a cancelled rework run', ctx: { ...base, reworkRuns: [{ code: 'R-2026-0009', state: 'cancelled' as const }] }, blockers: ['(state)'] },
  ])('when closing with $name, then the blockers are $blockers', ({ ctx, blockers }) => {
    expect(closeBlockers(ctx).map((b) => b.field ?? '(state)')).toEqual(blockers);
  });

  it('when the rework run is in progress, then the blocker names it', () => {
    expect(closeBlockers({ ...base, reworkRuns: [{ code: 'R-2026-0011', state: 'in-progress' }] })[0]?.message).toBe(
      'Rework run R-2026-0011 is in progress; close the deviation once the rework is completed.',
    );
  });
});
