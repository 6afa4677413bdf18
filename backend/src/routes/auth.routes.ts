import {
  OneTimeTokenSchema,
  PasswordResetRequestSchema,
  PinSwitchInputSchema,
  SetPasswordWithTokenSchema,
  SetPinInputSchema,
  SignInInputSchema,
} from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { unauthenticated } from '../errors/app-error';
import { verifyDevice } from '../lib/session-token';
import { currentUser } from '../middleware/authenticate';
import { pinLimiter, resetLimiter, signInLimiter } from '../middleware/rate-limits';
import { DEVICE_COOKIE, endSession, startSession } from '../middleware/session-cookies';
import { UserModel } from '../models/user.model';
import * as auth from '../services/auth.service';
import { toSessionUser } from '../services/user-dto';
import { route, type RouteSpec } from './route-table';

export function authRoutes(ctx: AppContext): RouteSpec[] {
  return [
    route('post', '/api/auth/sign-in', 'public', async (req, res) => {
      const user = await auth.signIn(ctx, SignInInputSchema.parse(req.body), req.ip ?? null);
      res.json(startSession(ctx, res, user, { trustDevice: true }));
    }, [signInLimiter(ctx)]),

    route('get', '/api/auth/session', 'signed-in', (req, res) => {
      res.json({ user: toSessionUser(currentUser(req)), csrfToken: req.csrfToken });
    }),

    route('post', '/api/auth/sign-out', 'signed-in', async (req, res) => {
      await auth.signOut(ctx, currentUser(req).id, req.ip ?? null);
      endSession(ctx, res);
      res.status(204).end();
    }),

    route('get', '/api/auth/pin-users', 'public', async (req, res) => {
      if (!verifyDevice(ctx.env.JWT_SECRET, req.cookies?.[DEVICE_COOKIE])) {
        throw unauthenticated('PIN switching works on a tablet where someone has signed in with a password once.');
      }
      const users = await UserModel.findAll({ where: { status: 'active' }, order: [['name', 'ASC']] });
      res.json({ users: users.filter((u) => u.pinHash).map((u) => ({ id: u.id, name: u.name, role: u.role })) });
    }),

    route('post', '/api/auth/pin-switch', 'public', async (req, res) => {
      if (!verifyDevice(ctx.env.JWT_SECRET, req.cookies?.[DEVICE_COOKIE])) {
        throw unauthenticated('PIN switching works on a tablet where someone has signed in with a password once.');
      }
      const user = await auth.pinSwitch(ctx, PinSwitchInputSchema.parse(req.body), req.ip ?? null);
      res.json(startSession(ctx, res, user, { trustDevice: false }));
    }, [pinLimiter(ctx)]),

    route('put', '/api/auth/pin', 'signed-in', async (req, res) => {
      await auth.setPin(ctx, currentUser(req).id, SetPinInputSchema.parse(req.body));
      res.status(204).end();
    }),

    route('post', '/api/auth/password-reset', 'public', async (req, res) => {
      await auth.requestPasswordReset(ctx, PasswordResetRequestSchema.parse(req.body), req.ip ?? null);
      res.status(202).json({ message: 'If that address belongs to someone here, a reset link is on its way.' });
    }, [resetLimiter(ctx)]),

    route('get', '/api/auth/tokens/:token', 'public', async (req, res) => {
      res.json(await auth.previewToken(ctx, OneTimeTokenSchema.parse(req.params.token)));
    }),

    route('post', '/api/auth/tokens/complete', 'public', async (req, res) => {
      const user = await auth.completeWithToken(ctx, SetPasswordWithTokenSchema.parse(req.body), req.ip ?? null);
      res.json(startSession(ctx, res, user, { trustDevice: true }));
    }, [resetLimiter(ctx)]),
  ];
}
