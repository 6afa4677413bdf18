import { LabSettingsSchema, PERMISSIONS } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/authenticate';
import { getLabSettings, updateLabSettings } from '../services/settings.service';
import { route, type RouteSpec } from './route-table';

export function settingsRoutes(ctx: AppContext): RouteSpec[] {
  return [
    route('get', '/api/settings', 'signed-in', async (_req, res) => {
      res.json(await getLabSettings());
    }),
    route('put', '/api/settings', PERMISSIONS.manageSettings, async (req, res) => {
      res.json(await updateLabSettings(ctx, currentUser(req).id, LabSettingsSchema.parse(req.body)));
    }),
  ];
}
