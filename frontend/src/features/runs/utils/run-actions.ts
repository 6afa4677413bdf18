import { canTransition, may, PERMISSIONS, type Role, type RunState } from '@tracewright/shared';

export type RunAction = 'hold' | 'resume' | 'cancel';

/** Who plans runs from the desk; the API checks again on every call. */
export const RUN_PLANNERS: readonly Role[] = PERMISSIONS.planRuns;

// The API admits the planners to all three; an operator stops work by reporting a problem.
const ACTIONS: Record<RunAction, { to: RunState; from?: RunState; roles: readonly Role[] }> = {
  hold: { to: 'on-hold', roles: RUN_PLANNERS },
  resume: { to: 'in-progress', from: 'on-hold', roles: RUN_PLANNERS },
  cancel: { to: 'cancelled', roles: RUN_PLANNERS },
};

export const RUN_ACTION_ORDER: readonly RunAction[] = ['hold', 'resume', 'cancel'];

/**
 * The state changes a person may offer on a run now: the move must be allowed by the run rules
 * (`canTransition`) and the person's role must be among the action's.
 * @example availableRunActions('on-hold', 'quality') // → ['resume', 'cancel']
 */
export function availableRunActions(state: RunState, role: Role): RunAction[] {
  return RUN_ACTION_ORDER.filter((action) => {
    const { to, from, roles } = ACTIONS[action];
    return (from === undefined || from === state) && canTransition(state, to) && roles.includes(role);
  });
}

/** Only quality staff sign a run's record off (the shared permission table; the API checks again). */
export const canSignOffRuns = (role: Role): boolean => may(role, 'decideQuality');
