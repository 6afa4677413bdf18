import type { AppContext } from '../app-context';
import { route, type RouteSpec } from './route-table';

export function healthRoutes(ctx: AppContext): RouteSpec[] {
  return [
    route('get', '/api/health', 'public', async (_req, res) => {
      await ctx.sequelize.query('SELECT 1');
      res.json({ status: 'ok' });
    }),
  ];
}
