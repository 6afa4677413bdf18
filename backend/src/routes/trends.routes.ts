import { FreezeLimitsInputSchema, TrendPointNoteInputSchema, TrendQuerySchema, PERMISSIONS } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/authenticate';
import { getQualityDashboard, getQualityWaiting } from '../services/quality-dashboard.service';
import { freezeLimits, getTrend, listTrendSpecs, notePoint } from '../services/trend.service';
import { route, type RouteSpec } from './route-table';

/** Trends per reading spec, their curation, and the quality dashboard built on them. */
export function trendRoutes(ctx: AppContext): RouteSpec[] {
  return [
    route('get', '/api/trends/specs', PERMISSIONS.readQuality, async (_req, res) => {
      res.json(await listTrendSpecs(ctx));
    }),
    route('get', '/api/trends', PERMISSIONS.readQuality, async (req, res) => {
      res.json(await getTrend(TrendQuerySchema.parse(req.query)));
    }),
    route('post', '/api/trends/points', PERMISSIONS.decideQuality, async (req, res) => {
      res.json(await notePoint(ctx, currentUser(req), TrendPointNoteInputSchema.parse(req.body)));
    }),
    route('post', '/api/trends/freeze', PERMISSIONS.decideQuality, async (req, res) => {
      res.json(await freezeLimits(ctx, currentUser(req), FreezeLimitsInputSchema.parse(req.body)));
    }),
    route('get', '/api/quality/dashboard', PERMISSIONS.readQuality, async (_req, res) => {
      res.json(await getQualityDashboard(ctx));
    }),
    route('get', '/api/quality/waiting', PERMISSIONS.readQuality, async (_req, res) => {
      res.json(await getQualityWaiting(ctx));
    }),
  ];
}
