import type { z } from 'zod';

import { deviationStateAfter, type AssignDeviationInputSchema, type CommentInputSchema, type DeviationDetail } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { fieldProblem } from '../errors/app-error';
import { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { getDeviation } from './deviation-detail.service';
import { addDeviationEvent, assertDeviationAllows, changeDeviation, deviationRecord, loadDeviation } from './deviation-record';

type AssignInput = z.infer<typeof AssignDeviationInputSchema>;

/** Deviations are owned by quality: the assignee must be an active quality person. */
async function qualityPerson(id: number) {
  const person = await UserModel.findOne({ where: { id, role: 'quality', status: 'active' }, attributes: ['id', 'name'] });
  if (!person) throw fieldProblem('assigneeId', 'Pick an active quality person to own this deviation.');
  return person;
}

/**
 * Assigns an open or in-review deviation to a quality person (it is then in review), optionally
 * with another severity. History lines and the audit row land with the change; asking for what
 * is already so writes nothing.
 */
export async function assignDeviation(ctx: AppContext, actor: UserModel, id: number, input: AssignInput): Promise<DeviationDetail> {
  await ctx.sequelize.transaction(async (transaction) => {
    const row = await loadDeviation(id, transaction, true);
    assertDeviationAllows(row, 'assign');
    const assignee = await qualityPerson(input.assigneeId);
    const severity = input.severity ?? row.severity;
    const state = deviationStateAfter(row.state, 'assign');
    const isReassigned = row.assigneeId !== assignee.id || row.state !== state;
    if (!isReassigned && severity === row.severity) return;
    const before = deviationRecord(row);
    const now = ctx.clock.now();
    await changeDeviation(ctx, row, { assigneeId: assignee.id, assignedAt: isReassigned ? now : row.assignedAt, severity, state }, transaction);
    if (isReassigned) await addDeviationEvent(ctx, { deviationId: id, kind: 'assigned', text: `Assigned to ${assignee.name}.`, byId: actor.id }, transaction);
    if (severity !== before.severity) {
      await addDeviationEvent(ctx, { deviationId: id, kind: 'severity-changed', text: `Severity changed from ${before.severity} to ${severity}.`, byId: actor.id }, transaction);
    }
    await recordAudit(ctx, { actorId: actor.id, action: 'deviation.assigned', entityType: 'deviation', entityId: id, before, after: deviationRecord(row) }, transaction);
  });
  return getDeviation(ctx, id);
}

/** A comment on a deviation that is not closed; it joins the history and the audit trail. */
export async function commentOnDeviation(ctx: AppContext, actor: UserModel, id: number, input: z.infer<typeof CommentInputSchema>): Promise<DeviationDetail> {
  await ctx.sequelize.transaction(async (transaction) => {
    const row = await loadDeviation(id, transaction, true);
    assertDeviationAllows(row, 'comment');
    await addDeviationEvent(ctx, { deviationId: id, kind: 'comment', text: input.text, byId: actor.id }, transaction);
    await recordAudit(ctx, { actorId: actor.id, action: 'deviation.commented', entityType: 'deviation', entityId: id, after: { text: input.text } }, transaction);
  });
  return getDeviation(ctx, id);
}
