import type { RunState } from '../../schemas/run.schema';
import { stateInWords } from '../state-words';
import type { DeviationState } from './deviation-transitions';

/** A deviation counts as decided for sign-off once it has a disposition (closing may come later). */
export const DECIDED_DEVIATION_STATES: readonly DeviationState[] = ['dispositioned', 'closed'];

export interface SignOffCheck {
  canSignOff: boolean;
  /** Why not, in plain words; null when it may be signed. */
  refusal: string | null;
  undecided: { id: number; title: string; state: DeviationState }[];
}

/**
 * Whether quality may sign a run's record off: the run is completed and every one of its
 * deviations has a disposition. The refusal names each undecided deviation.
 * @example runSignOffCheck({ code: 'R-2026-0007', state: 'completed' }, [{ id: 9, title: 'Timer ended early at step 3 “Dry”', state: 'open' }])
 * // → { canSignOff: false, refusal: 'Run R-2026-0007 cannot be signed off: 1 deviation has no disposition yet (#9 “Timer ended early at step 3 “Dry”” is open).', undecided: [ … ] }
 */
export function runSignOffCheck(
  run: { code: string; state: RunState },
  deviations: readonly { id: number; title: string; state: DeviationState }[],
): SignOffCheck {
  const undecided = deviations.filter((d) => !DECIDED_DEVIATION_STATES.includes(d.state)).map(({ id, title, state }) => ({ id, title, state }));
  if (run.state === 'closed') return { canSignOff: false, refusal: `Run ${run.code} is already signed off.`, undecided };
  if (run.state !== 'completed') {
    return { canSignOff: false, refusal: `Run ${run.code} is ${stateInWords(run.state)}; only a completed run can be signed off.`, undecided };
  }
  if (undecided.length === 0) return { canSignOff: true, refusal: null, undecided };
  const count = undecided.length === 1 ? '1 deviation has' : `${undecided.length} deviations have`;
  const list = undecided.map((d) => `#${d.id} “${d.title}” is ${stateInWords(d.state)}`).join('; ');
  return { canSignOff: false, refusal: `Run ${run.code} cannot be signed off: ${count} no disposition yet (${list}).`, undecided };
}
