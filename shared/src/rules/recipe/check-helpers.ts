import { ProcessInputError } from '../../process/process-input-error';
import type { RecipeStep } from '../../schemas/recipe-step.schema';
import type { CheckFamily, ProcessCheck } from './process-check';

// Small helpers every check family shares (not part of the public surface).

/**
 * How a step is named in a sentence: its 1-based position and title.
 * @example stepLabel(2, { title: 'Print silver' }) // → 'step 3 “Print silver”'
 */
export function stepLabel(index: number, step: Pick<RecipeStep, 'title'>): string {
  return `step ${index + 1} “${step.title}”`;
}

/**
 * Runs one family's work for one step; a stored value no real material has (it slipped past the
 * forms) becomes a Warning on that step instead of breaking the whole panel.
 *
 * @example
 * guarded({ id: 'wetting:s1', family: 'wetting', stepId: 's1', title: 'Wetting' }, () => [check])
 * // → [check], or [{ status: 'warning', why: "Can't check this: … Correct the record." }] on bad input
 */
export function guarded(
  identity: Pick<ProcessCheck, 'id' | 'family' | 'stepId' | 'title'>,
  compute: () => ProcessCheck[],
): ProcessCheck[] {
  try {
    return compute();
  } catch (error) {
    if (!(error instanceof ProcessInputError)) throw error;
    return [{ ...identity, status: 'warning', numbers: '', why: `Can't check this: ${error.message} Correct the record.` }];
  }
}

/**
 * Builder with the family fixed, so each check reads as one line in the family files.
 * @example checkMaker('heat')({ id: 'heat:s1:print-substrate', stepId: 's1', status: 'pass', title: 'Heat', numbers: '', why: '' })
 */
export function checkMaker(family: CheckFamily) {
  return (check: Omit<ProcessCheck, 'family'>): ProcessCheck => ({ ...check, family });
}
