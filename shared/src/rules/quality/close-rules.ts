import type { RunState } from '../../schemas/run.schema';
import { stateInWords } from '../state-words';

/** A reason closing is refused: with a field it is the form's to fix (422), without it the record's state (409). */
export interface CloseBlocker {
  field?: string;
  message: string;
}

export interface CloseContext {
  deviationId: number;
  /** Whether any disposition carries a corrective action, which closing marks verified. */
  hasCorrectiveAction: boolean;
  verificationNote: string;
  /** Rework runs the dispositions started, with where they stand. */
  reworkRuns: readonly { code: string; state: RunState }[];
}

/** A rework run has done its work once completed (or signed off); a cancelled one never will. */
const REWORK_DONE: readonly RunState[] = ['completed', 'closed'];

/**
 * What stops a dispositioned deviation from being closed: a corrective action needs its
 * verification written down, and a rework run must have finished (a cancelled one needs a new
 * disposition, which a closed record could no longer take). Empty when it may be signed closed.
 * @example closeBlockers({ deviationId: 4, hasCorrectiveAction: true, verificationNote: '', reworkRuns: [] })
 * // → [{ field: 'verificationNote', message: 'Deviation 4 has a corrective action: say how it was verified before closing.' }]
 */
export function closeBlockers(context: CloseContext): CloseBlocker[] {
  const blockers: CloseBlocker[] = [];
  if (context.hasCorrectiveAction && context.verificationNote.trim().length === 0) {
    blockers.push({ field: 'verificationNote', message: `Deviation ${context.deviationId} has a corrective action: say how it was verified before closing.` });
  }
  for (const run of context.reworkRuns) {
    if (REWORK_DONE.includes(run.state)) continue;
    blockers.push({ message: `Rework run ${run.code} is ${stateInWords(run.state)}; close the deviation once the rework is completed.` });
  }
  return blockers;
}
