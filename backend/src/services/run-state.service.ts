import { allowedRunTransitions, canTransition, stateInWords, type RunDetail, type RunState } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { conflict } from '../errors/app-error';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { loadRun } from './run-content';
import { getRun } from './run-detail.service';
import { runRecord } from './run-dto';

export type RunStateAction = 'hold' | 'resume' | 'cancel';

const MOVES: Record<RunStateAction, { to: RunState; verb: string; doing: string }> = {
  hold: { to: 'on-hold', verb: 'held', doing: 'put on hold' },
  resume: { to: 'in-progress', verb: 'resumed', doing: 'resumed' },
  cancel: { to: 'cancelled', verb: 'cancelled', doing: 'cancelled' },
};

/**
 * Holds, resumes or cancels a run with the reason given, when the shared transitions allow the
 * move (409 saying where it can go otherwise). A hold keeps its reason for the tablets to show.
 */
export async function changeRunState(ctx: AppContext, actor: UserModel, id: number, action: RunStateAction, reason: string): Promise<RunDetail> {
  const move = MOVES[action];
  await ctx.sequelize.transaction(async (transaction) => {
    const run = await loadRun(id, transaction, true);
    if (!canTransition(run.state, move.to)) {
      const options = allowedRunTransitions(run.state);
      const next = options.length > 0 ? `From ${stateInWords(run.state)} it can go to ${options.map(stateInWords).join(' or ')}.` : `A ${stateInWords(run.state)} run cannot move on.`;
      throw conflict(`Run ${run.code} is ${stateInWords(run.state)}, so it cannot be ${move.doing}. ${next}`, { state: run.state, allowed: options });
    }
    const before = runRecord(run);
    await run.update({ state: move.to, version: run.version + 1, holdReason: action === 'hold' ? reason : null }, { transaction });
    await recordAudit(ctx, { actorId: actor.id, action: `run.${move.verb}`, entityType: 'run', entityId: run.id, before, after: runRecord(run), reason }, transaction);
  });
  return getRun(ctx, id);
}
