import type { Lot } from '../../schemas/material.schema';
import type { EQUIPMENT_KINDS, PlanRunInput } from '../../schemas/run.schema';
import { calibrationStatus, lotStatus } from '../material-status';
import { numberText } from './text-format';

type EquipmentKind = (typeof EQUIPMENT_KINDS)[number];
export type ChoiceIssueRule = 'expired-lot' | 'lot-past-pot-life' | 'calibration-overdue';

/** A lot or machine chosen for a run that needs a typed reason (and then raises a deviation). */
export interface ChoiceIssue {
  kind: 'lot' | EquipmentKind;
  id: number;
  rule: ChoiceIssueRule;
  message: string;
}

export interface LotChoice {
  lot: Pick<Lot, 'id' | 'lotNumber' | 'materialName' | 'expiresOn' | 'openedOn'>;
  /** The material's pot life after opening, h (inks carry one; null when unknown or not relevant). */
  potLifeHours: number | null;
}

export interface EquipmentChoice {
  kind: EquipmentKind;
  id: number;
  name: string;
  /** Printers carry no calibration date: leave it null or out. */
  calibrationDueOn?: string | null;
}

const KIND_WORDS: Record<EquipmentKind, string> = {
  printer: 'printer',
  'heat-source': 'heat source',
  'surface-treater': 'surface treater',
  instrument: 'instrument',
};

/**
 * Lots that are expired (the day after their expiry date, in the lab's calendar) or past their
 * pot life (counted from the start of the day they were opened, as `lotStatus` does). One issue
 * per flag, so a lot can raise both.
 *
 * @example
 * lotChoiceIssues([{ lot: { id: 4, lotNumber: 'AG-118', materialName: 'Silver ink', expiresOn: '2026-11-30', openedOn: null }, potLifeHours: null }],
 *   { today: '2026-12-02', now: new Date('2026-12-02T10:00:00Z') })
 * // → [{ kind: 'lot', id: 4, rule: 'expired-lot', message: 'Lot AG-118 of Silver ink expired on 2026-11-30.' }]
 */
export function lotChoiceIssues(lots: readonly LotChoice[], context: { today: string; now: Date }): ChoiceIssue[] {
  return lots.flatMap(({ lot, potLifeHours }) => {
    const { flags } = lotStatus(lot, { ...context, potLifeHours });
    const name = `Lot ${lot.lotNumber} of ${lot.materialName}`;
    const issues: ChoiceIssue[] = [];
    if (flags.includes('expired')) {
      issues.push({ kind: 'lot', id: lot.id, rule: 'expired-lot', message: `${name} expired on ${lot.expiresOn}.` });
    }
    if (flags.includes('past-pot-life')) {
      const message = `${name} is past its pot life: opened ${lot.openedOn}, usable for ${numberText(potLifeHours as number)} h after opening.`;
      issues.push({ kind: 'lot', id: lot.id, rule: 'lot-past-pot-life', message });
    }
    return issues;
  });
}

/**
 * Machines whose calibration is overdue (the day after the due date). Due soon, no date on
 * record and printers (which carry none) raise nothing here.
 *
 * @example
 * equipmentChoiceIssues([{ kind: 'heat-source', id: 2, name: 'Oven A', calibrationDueOn: '2026-12-01' }], '2026-12-02')
 * // → [{ kind: 'heat-source', id: 2, rule: 'calibration-overdue', message: 'Oven A (heat source) was due for calibration on 2026-12-01.' }]
 */
export function equipmentChoiceIssues(equipment: readonly EquipmentChoice[], today: string): ChoiceIssue[] {
  return equipment.flatMap((item) => {
    const dueOn = item.calibrationDueOn ?? null;
    if (calibrationStatus(dueOn, today).state !== 'overdue') return [];
    const message = `${item.name} (${KIND_WORDS[item.kind]}) was due for calibration on ${dueOn}.`;
    return [{ kind: item.kind, id: item.id, rule: 'calibration-overdue' as const, message }];
  });
}

/**
 * The issues whose choice carries no reason: the API refuses the plan (400) naming each. A lot
 * or machine that is used but not listed among the choices (a machine the version names) has
 * nowhere to hold a reason, so its issue counts as missing one too; a blank reason is no reason.
 *
 * @example
 * missingReasons([expiredLot4], { lots: [{ lotId: 4, reason: null }], equipment: [] }) // → [expiredLot4]
 * missingReasons([expiredLot4], { lots: [{ lotId: 4, reason: 'Only lot left; tested today.' }], equipment: [] }) // → []
 */
export function missingReasons(
  issues: readonly ChoiceIssue[],
  choices: Pick<PlanRunInput, 'lots' | 'equipment'>,
): ChoiceIssue[] {
  const reasonOf = (issue: ChoiceIssue): string | null | undefined =>
    issue.kind === 'lot'
      ? choices.lots.find((c) => c.lotId === issue.id)?.reason
      : choices.equipment.find((c) => c.kind === issue.kind && c.id === issue.id)?.reason;
  return issues.filter((issue) => (reasonOf(issue) ?? '').trim() === '');
}
