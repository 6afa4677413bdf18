import { IdParamsSchema, InviteUserInputSchema, UpdateUserInputSchema, PERMISSIONS } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/authenticate';
import * as users from '../services/user.service';
import { route, type RouteSpec } from './route-table';

export function userRoutes(ctx: AppContext): RouteSpec[] {
  return [
    route('get', '/api/users', PERMISSIONS.managePeople, async (_req, res) => {
      res.json({ users: await users.listUsers() });
    }),
    route('post', '/api/users', PERMISSIONS.managePeople, async (req, res) => {
      res.status(201).json(await users.inviteUser(ctx, currentUser(req), InviteUserInputSchema.parse(req.body)));
    }),
    route('patch', '/api/users/:id', PERMISSIONS.managePeople, async (req, res) => {
      const { id } = IdParamsSchema.parse(req.params);
      res.json(await users.updateUser(ctx, currentUser(req), id, UpdateUserInputSchema.parse(req.body)));
    }),
    route('post', '/api/users/:id/invitation', PERMISSIONS.managePeople, async (req, res) => {
      const { id } = IdParamsSchema.parse(req.params);
      await users.resendInvitation(ctx, currentUser(req), id);
      res.status(202).json({ message: 'Invitation sent again.' });
    }),
  ];
}
