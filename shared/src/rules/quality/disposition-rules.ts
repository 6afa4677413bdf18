import type { Disposition } from '../../schemas/deviation.schema';
import type { DeviationRule } from '../../schemas/run.schema';

/** A problem with one field of a request, in the words the form shows beside it. */
export interface FieldIssue {
  field: string;
  message: string;
}

/** Rules whose deviation is about a material lot, so the material can go back to its supplier. */
export const LOT_RULES: readonly DeviationRule[] = ['expired-lot', 'lot-past-pot-life'];

/**
 * Whether a deviation is about a material lot: raised by a lot rule, or pointing at a lot record.
 * A hand-reported problem names no lot, so it is not lot-related even when it mentions one.
 * @example isLotRelated({ rule: 'expired-lot', sourceType: 'lot' }) // → true
 * @example isLotRelated({ rule: 'reported', sourceType: null }) // → false
 */
export function isLotRelated(deviation: { rule: DeviationRule; sourceType: string | null }): boolean {
  return LOT_RULES.includes(deviation.rule) || deviation.sourceType === 'lot';
}

export interface PieceCoverage {
  /** The pieces this disposition decides. */
  pieceIds: number[];
  /** Pieces in question that still have no disposition after this one. */
  remaining: number[];
  isComplete: boolean;
  /** Chosen pieces that are not in question, or already decided: the request names them wrongly. */
  outside: number[];
  alreadyDecided: number[];
}

const unique = (ids: readonly number[]) => [...new Set(ids)].sort((a, b) => a - b);

/**
 * Which pieces a disposition decides. The pieces in question are those the deviation names, or
 * every piece of the run when it names none. Choosing none decides every piece still open;
 * choosing some decides only those, so each piece can get its own disposition.
 * @example dispositionCoverage([1, 2, 3], [1], []) // → { pieceIds: [2, 3], remaining: [], isComplete: true, outside: [], alreadyDecided: [] }
 * @example dispositionCoverage([1, 2, 3], [], [2]) // → { pieceIds: [2], remaining: [1, 3], isComplete: false, … }
 */
export function dispositionCoverage(inQuestion: readonly number[], decided: readonly number[], chosen: readonly number[]): PieceCoverage {
  const all = unique(inQuestion);
  const done = new Set(decided);
  const open = all.filter((id) => !done.has(id));
  const picked = unique(chosen);
  const outside = picked.filter((id) => !all.includes(id));
  const alreadyDecided = picked.filter((id) => all.includes(id) && done.has(id));
  const pieceIds = picked.length === 0 ? open : picked.filter((id) => open.includes(id));
  const remaining = open.filter((id) => !pieceIds.includes(id));
  return { pieceIds, remaining, isComplete: remaining.length === 0, outside, alreadyDecided };
}

export interface DispositionRequest {
  disposition: Disposition;
  pieceIds: readonly number[];
  reworkStepIds: readonly string[];
}

export interface DispositionContext {
  deviationId: number;
  rule: DeviationRule;
  sourceType: string | null;
  coverage: PieceCoverage;
  /** Step ids of the version the run follows, in order. */
  versionStepIds: readonly string[];
}

/**
 * Everything wrong with a disposition request, per field; empty when it may be signed. Rework
 * needs the steps to repeat (steps of the run's version); return to supplier needs a lot-related
 * deviation; named pieces must be in question and not yet decided.
 * @example dispositionIssues({ disposition: 'return-to-supplier', pieceIds: [], reworkStepIds: [] }, { rule: 'reported', … })
 * // → [{ field: 'disposition', message: 'Return to supplier is only for deviations about a material lot; …' }]
 */
export function dispositionIssues(request: DispositionRequest, context: DispositionContext): FieldIssue[] {
  const issues: FieldIssue[] = [];
  const { coverage } = context;
  if (request.disposition === 'return-to-supplier' && !isLotRelated(context)) {
    issues.push({ field: 'disposition', message: 'Return to supplier is only for deviations about a material lot; pick another disposition.' });
  }
  if (coverage.outside.length > 0) {
    issues.push({ field: 'pieceIds', message: `Pieces ${coverage.outside.join(', ')} are not in question in deviation ${context.deviationId}. Pick from its pieces.` });
  }
  if (coverage.alreadyDecided.length > 0) {
    issues.push({ field: 'pieceIds', message: `Pieces ${coverage.alreadyDecided.join(', ')} already have a disposition. Pick only pieces still undecided.` });
  }
  if (coverage.pieceIds.length === 0 && coverage.outside.length === 0 && coverage.alreadyDecided.length === 0) {
    issues.push({ field: 'pieceIds', message: `Every piece of deviation ${context.deviationId} already has a disposition.` });
  }
  issues.push(...reworkStepIssues(request, context.versionStepIds));
  return issues;
}

function reworkStepIssues(request: DispositionRequest, versionStepIds: readonly string[]): FieldIssue[] {
  const field = 'reworkStepIds';
  if (request.disposition !== 'rework') {
    return request.reworkStepIds.length > 0 ? [{ field, message: 'Steps to repeat are only for a rework disposition.' }] : [];
  }
  if (request.reworkStepIds.length === 0) return [{ field, message: 'Pick the steps the rework repeats.' }];
  const unknown = request.reworkStepIds.filter((id) => !versionStepIds.includes(id));
  return unknown.length > 0 ? [{ field, message: `Steps ${unknown.map((id) => `“${id}”`).join(', ')} are not steps of the run's recipe version.` }] : [];
}
