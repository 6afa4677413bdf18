import type { InviteUserInput, UpdateUserInput, User } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { AppError, conflict, notFound } from '../errors/app-error';
import { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { invitationMail } from './mail-templates';
import { issueOneTimeToken } from './one-time-token.service';
import { getLabSettings } from './settings.service';
import { auditableUser, toUserDto } from './user-dto';

export async function listUsers(): Promise<User[]> {
  const users = await UserModel.findAll({ order: [['name', 'ASC']] });
  return users.map(toUserDto);
}

export async function inviteUser(ctx: AppContext, actor: UserModel, input: InviteUserInput): Promise<User> {
  const existing = await UserModel.findOne({ where: { email: input.email } });
  if (existing) throw conflict(`${input.email} already has an account (${existing.status}).`);
  const { user, token } = await ctx.sequelize.transaction(async (transaction) => {
    const created = await UserModel.create({ ...input, status: 'invited' }, { transaction });
    const issued = await issueOneTimeToken(ctx, created.id, 'invitation', transaction);
    await recordAudit(
      ctx,
      { actorId: actor.id, action: 'user.invited', entityType: 'user', entityId: created.id, after: auditableUser(created) },
      transaction,
    );
    return { user: created, token: issued };
  });
  await sendInvitation(ctx, actor, user, token);
  return toUserDto(user);
}

export async function resendInvitation(ctx: AppContext, actor: UserModel, userId: number): Promise<void> {
  const user = await UserModel.findByPk(userId);
  if (!user) throw notFound('Person', userId);
  if (user.status !== 'invited') throw conflict(`${user.name} has already accepted the invitation.`);
  const token = await ctx.sequelize.transaction(async (transaction) => {
    const issued = await issueOneTimeToken(ctx, user.id, 'invitation', transaction);
    await recordAudit(ctx, { actorId: actor.id, action: 'user.invitation-resent', entityType: 'user', entityId: user.id }, transaction);
    return issued;
  });
  await sendInvitation(ctx, actor, user, token);
}

async function sendInvitation(ctx: AppContext, actor: UserModel, user: UserModel, token: string) {
  const settings = await getLabSettings();
  await ctx.mailer.send(
    invitationMail({
      to: user.email,
      name: user.name,
      labName: settings.labName,
      invitedBy: actor.name,
      link: `${ctx.env.PUBLIC_URL}/set-password/${token}`,
    }),
  );
}

/**
 * Role and status changes bump the token version: the person's open sessions end at once
 * and the next sign-in carries the new rights.
 */
export async function updateUser(ctx: AppContext, actor: UserModel, userId: number, input: UpdateUserInput): Promise<User> {
  return ctx.sequelize.transaction(async (transaction) => {
    const user = await UserModel.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw notFound('Person', userId);
    if (user.id === actor.id && (input.status === 'deactivated' || (input.role && input.role !== 'admin'))) {
      throw new AppError(409, 'CONFLICT', 'You cannot remove your own admin rights or deactivate yourself. Ask another admin.');
    }
    if (input.status === 'active' && user.status === 'invited') {
      throw conflict(`${user.name} has not accepted the invitation yet; resend it instead.`);
    }
    const before = auditableUser(user);
    const rightsChange = (input.role && input.role !== user.role) || (input.status && input.status !== user.status);
    await user.update(
      { ...input, tokenVersion: rightsChange ? user.tokenVersion + 1 : user.tokenVersion },
      { transaction },
    );
    await recordAudit(
      ctx,
      { actorId: actor.id, action: 'user.updated', entityType: 'user', entityId: user.id, before, after: auditableUser(user) },
      transaction,
    );
    return toUserDto(user);
  });
}
