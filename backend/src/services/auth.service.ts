import type {
  PasswordResetRequest,
  PinSwitchInput,
  SetPasswordWithToken,
  SetPinInput,
  SignInInput,
} from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { AppError, unauthenticated } from '../errors/app-error';
import { hashSecret, verifySecret } from '../lib/secret-hashing';
import { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { passwordResetMail } from './mail-templates';
import { findUsableToken, issueOneTimeToken } from './one-time-token.service';

const BAD_SIGN_IN = 'E-mail or password is wrong. Check both and try again.';

export async function signIn(ctx: AppContext, input: SignInInput, ip: string | null): Promise<UserModel> {
  const user = await UserModel.findOne({ where: { email: input.email } });
  const ok = await verifySecret(user?.passwordHash, input.password);
  if (!user || !ok || user.status !== 'active') {
    await recordAudit(ctx, {
      actorId: user?.id ?? null,
      action: 'auth.sign-in-failed',
      entityType: 'user',
      entityId: user?.id ?? null,
      after: { email: input.email, reason: !user || !ok ? 'bad credentials' : `account ${user.status}` },
      ip,
    });
    if (user && ok && user.status === 'deactivated') {
      throw unauthenticated('This account has been deactivated. Ask an admin.');
    }
    throw unauthenticated(BAD_SIGN_IN);
  }
  return markSignedIn(ctx, user, 'auth.sign-in', ip);
}

export async function pinSwitch(ctx: AppContext, input: PinSwitchInput, ip: string | null): Promise<UserModel> {
  const user = await UserModel.findByPk(input.userId);
  const ok = await verifySecret(user?.pinHash, input.pin);
  if (!user || !ok || user.status !== 'active') {
    await recordAudit(ctx, {
      actorId: user?.id ?? null,
      action: 'auth.pin-failed',
      entityType: 'user',
      entityId: input.userId,
      ip,
    });
    throw unauthenticated('That PIN is not right. Try again, or sign in with your password.');
  }
  return markSignedIn(ctx, user, 'auth.pin-switch', ip);
}

async function markSignedIn(ctx: AppContext, user: UserModel, action: string, ip: string | null) {
  return ctx.sequelize.transaction(async (transaction) => {
    await user.update({ lastSignInAt: ctx.clock.now() }, { transaction });
    await recordAudit(ctx, { actorId: user.id, action, entityType: 'user', entityId: user.id, ip }, transaction);
    return user;
  });
}

/** Signing out bumps the token version, so every copy of the old token stops working at once. */
export async function signOut(ctx: AppContext, userId: number, ip: string | null): Promise<void> {
  await ctx.sequelize.transaction(async (transaction) => {
    await UserModel.increment('tokenVersion', { where: { id: userId }, transaction });
    await recordAudit(ctx, { actorId: userId, action: 'auth.sign-out', entityType: 'user', entityId: userId, ip }, transaction);
  });
}

export async function setPin(ctx: AppContext, userId: number, input: SetPinInput): Promise<void> {
  const user = await UserModel.findByPk(userId);
  if (!user || !(await verifySecret(user.passwordHash, input.password))) {
    throw new AppError(400, 'VALIDATION_FAILED', 'Your password is not right.', {
      formErrors: [],
      fieldErrors: { password: ['Your password is not right.'] },
    });
  }
  const pinHash = await hashSecret(input.pin);
  await ctx.sequelize.transaction(async (transaction) => {
    await user.update({ pinHash }, { transaction });
    await recordAudit(ctx, { actorId: userId, action: 'user.pin-set', entityType: 'user', entityId: userId }, transaction);
  });
}

/** Always answers the same way, so the form cannot be used to learn who has an account. */
export async function requestPasswordReset(ctx: AppContext, input: PasswordResetRequest, ip: string | null) {
  const user = await UserModel.findOne({ where: { email: input.email } });
  if (!user || user.status !== 'active') return;
  const token = await ctx.sequelize.transaction(async (transaction) => {
    const issued = await issueOneTimeToken(ctx, user.id, 'password-reset', transaction);
    await recordAudit(ctx, { actorId: null, action: 'auth.reset-requested', entityType: 'user', entityId: user.id, ip }, transaction);
    return issued;
  });
  await ctx.mailer.send(
    passwordResetMail({ to: user.email, name: user.name, link: `${ctx.env.PUBLIC_URL}/set-password/${token}` }),
  );
}

export async function previewToken(ctx: AppContext, token: string) {
  const { record, user } = await findUsableToken(ctx, token);
  return { email: user.email, name: user.name, purpose: record.purpose };
}

/** Sets the password from an invitation or reset link; an invited person becomes active. */
export async function completeWithToken(ctx: AppContext, input: SetPasswordWithToken, ip: string | null) {
  const passwordHash = await hashSecret(input.password);
  return ctx.sequelize.transaction(async (transaction) => {
    const { record, user } = await findUsableToken(ctx, input.token, transaction);
    const now = ctx.clock.now();
    await record.update({ usedAt: now }, { transaction });
    const before = { status: user.status };
    await user.update(
      { passwordHash, status: 'active', tokenVersion: user.tokenVersion + 1, lastSignInAt: now },
      { transaction },
    );
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: record.purpose === 'invitation' ? 'user.invitation-accepted' : 'user.password-reset',
        entityType: 'user',
        entityId: user.id,
        before,
        after: { status: user.status },
        ip,
      },
      transaction,
    );
    return user;
  });
}
