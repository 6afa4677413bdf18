import type { DEVIATION_STATES } from '../../schemas/run.schema';

export type DeviationState = (typeof DEVIATION_STATES)[number];

/** What quality does to a deviation; each is allowed only in some states. */
export const DEVIATION_ACTIONS = ['assign', 'change-severity', 'comment', 'disposition', 'close'] as const;
export type DeviationAction = (typeof DEVIATION_ACTIONS)[number];

/**
 * The states each action is allowed in. A disposition may be given straight from `open` (the
 * person deciding has reviewed it by then); a closed deviation is a final record, so nothing
 * is allowed on it, not even a comment.
 */
export const DEVIATION_ACTION_STATES: Readonly<Record<DeviationAction, readonly DeviationState[]>> = {
  assign: ['open', 'in-review'],
  'change-severity': ['open', 'in-review'],
  comment: ['open', 'in-review', 'dispositioned'],
  disposition: ['open', 'in-review'],
  close: ['dispositioned'],
};

const DOING: Record<DeviationAction, string> = {
  assign: 'assigned',
  'change-severity': 'given another severity',
  comment: 'commented on',
  disposition: 'dispositioned',
  close: 'closed',
};

const WHY: Record<DeviationState, string> = {
  open: 'is still open: disposition it first',
  'in-review': 'is in review and not yet dispositioned',
  dispositioned: 'is already dispositioned; what is left is to verify and close it',
  closed: 'is closed, and a closed deviation is a final record',
};

/**
 * Whether an action is allowed on a deviation in this state.
 * @example canActOnDeviation('dispositioned', 'close') // → true
 * @example canActOnDeviation('closed', 'comment') // → false
 */
export function canActOnDeviation(state: DeviationState, action: DeviationAction): boolean {
  return DEVIATION_ACTION_STATES[action].includes(state);
}

/**
 * Why an action is refused in this state, in plain words; null when it is allowed.
 * @example deviationActionRefusal('closed', 'assign', 12)
 * // → 'Deviation 12 is closed, and a closed deviation is a final record, so it cannot be assigned.'
 */
export function deviationActionRefusal(state: DeviationState, action: DeviationAction, id: number): string | null {
  if (canActOnDeviation(state, action)) return null;
  return `Deviation ${id} ${WHY[state]}, so it cannot be ${DOING[action]}.`;
}

/**
 * The state a deviation moves to after an allowed action. Assigning opens the review; a
 * disposition settles it only once every piece in question has one (`isFullyDispositioned`).
 * @example deviationStateAfter('open', 'assign') // → 'in-review'
 * @example deviationStateAfter('open', 'disposition', { isFullyDispositioned: false }) // → 'in-review'
 */
export function deviationStateAfter(state: DeviationState, action: DeviationAction, options: { isFullyDispositioned?: boolean } = {}): DeviationState {
  if (!canActOnDeviation(state, action)) throw new RangeError(`A deviation that ${WHY[state]} cannot be ${DOING[action]}.`);
  switch (action) {
    case 'assign':
      return 'in-review';
    case 'disposition':
      return options.isFullyDispositioned === false ? 'in-review' : 'dispositioned';
    case 'close':
      return 'closed';
    default:
      return state;
  }
}
