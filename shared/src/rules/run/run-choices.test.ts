import { describe, expect, it } from 'vitest';

import { equipmentChoiceIssues, lotChoiceIssues, missingReasons, type ChoiceIssue, type LotChoice } from './run-choices';

const context = { today: '2026-12-02', now: new Date('2026-12-02T10:00:00Z') };
const lot = (id: number, expiresOn: string | null, openedOn: string | null, potLifeHours: number | null = null): LotChoice => ({
  lot: { id, lotNumber: `AG-${id}`, materialName: 'Silver ink', expiresOn, openedOn },
  potLifeHours,
});

describe('lotChoiceIssues', () => {
  // prettier-ignore
  it.each([
    { name: 'expired yesterday', choice: lot(1, '2026-12-01', null), rules: ['expired-lot'] },
    { name: 'expiring today', choice: lot(2, '2026-12-02', null), rules: [] },
    { name: 'opened 2 days ago with a 24 h pot life', choice: lot(3, null, '2026-11-30', 24), rules: ['lot-past-pot-life'] },
    { name: 'opened today with a 24 h pot life', choice: lot(4, null, '2026-12-02', 24), rules: [] },
    { name: 'opened long ago with no pot life known', choice: lot(5, null, '2020-01-01'), rules: [] },
    { name: 'expired and past its pot life', choice: lot(6, '2026-01-01', '2025-12-01', 48), rules: ['expired-lot', 'lot-past-pot-life'] },
  ])('when a lot is $name, then the issues are $rules', ({ choice, rules }) => {
    const issues = lotChoiceIssues([choice], context);
    expect(issues.map((i) => i.rule)).toEqual(rules);
    expect(issues.every((i) => i.kind === 'lot' && i.id === choice.lot.id)).toBe(true);
  });

  it('when a lot is flagged, then the message names the lot, the material and the dates', () => {
    const [expired, aged] = lotChoiceIssues([lot(6, '2026-01-01', '2025-12-01', 48)], context);
    expect(expired?.message).toBe('Lot AG-6 of Silver ink expired on 2026-01-01.');
    expect(aged?.message).toBe('Lot AG-6 of Silver ink is past its pot life: opened 2025-12-01, usable for 48 h after opening.');
  });
});

describe('equipmentChoiceIssues', () => {
  it.each([
    { due: '2026-12-01', overdue: true },
    { due: '2026-12-02', overdue: false },
    { due: null, overdue: false },
    { due: undefined, overdue: false },
  ])('when calibration is due on $due (today 2026-12-02), then overdue is $overdue', ({ due, overdue }) => {
    const issues = equipmentChoiceIssues([{ kind: 'heat-source', id: 2, name: 'Oven A', calibrationDueOn: due }], '2026-12-02');
    expect(issues.length).toBe(overdue ? 1 : 0);
  });

  it('when an instrument is overdue, then the issue names it, its kind and its due date', () => {
    const [issue] = equipmentChoiceIssues([{ kind: 'instrument', id: 9, name: 'Meter 3', calibrationDueOn: '2026-11-15' }], '2026-12-02');
    expect(issue).toEqual({ kind: 'instrument', id: 9, rule: 'calibration-overdue', message: 'Meter 3 (instrument) was due for calibration on 2026-11-15.' });
  });
});

describe('missingReasons', () => {
  const expired: ChoiceIssue = { kind: 'lot', id: 4, rule: 'expired-lot', message: '' };
  const oven: ChoiceIssue = { kind: 'heat-source', id: 2, rule: 'calibration-overdue', message: '' };
  const treater: ChoiceIssue = { kind: 'surface-treater', id: 2, rule: 'calibration-overdue', message: '' };
  const reason = 'Only lot in stock; checked its viscosity today.';

  // prettier-ignore
  it.each([
    { name: 'every choice has a reason', lots: [{ lotId: 4, reason }], equipment: [{ kind: 'heat-source' as const, id: 2, reason }], missing: [] },
    { name: 'the lot has no reason', lots: [{ lotId: 4, reason: null }], equipment: [{ kind: 'heat-source' as const, id: 2, reason }], missing: [expired] },
    { name: 'the reason is blank', lots: [{ lotId: 4, reason: '   ' }], equipment: [{ kind: 'heat-source' as const, id: 2, reason }], missing: [expired] },
    { name: 'the oven is not among the choices', lots: [{ lotId: 4, reason }], equipment: [], missing: [oven] },
    { name: 'a reason sits on another kind with the same id', lots: [{ lotId: 4, reason }], equipment: [{ kind: 'surface-treater' as const, id: 2, reason }], missing: [oven] },
  ])('when $name, then the missing ones are returned', ({ lots, equipment, missing }) => {
    expect(missingReasons([expired, oven], { lots, equipment })).toEqual(missing);
  });

  it('when two machines share an id, then each is matched by its kind', () => {
    const choices = { lots: [], equipment: [{ kind: 'surface-treater' as const, id: 2, reason }] };
    expect(missingReasons([oven, treater], choices)).toEqual([oven]);
  });
});
