import { PERMISSIONS } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { notFound } from '../errors/app-error';
import { listCapturedMails } from '../dev/captured-mail';
import { route, type RouteSpec } from './route-table';

/** Development helper: the mails the local SMTP fake caught, so a person can click an invitation link. */
export function devMailRoutes(ctx: AppContext): RouteSpec[] {
  return [
    route('get', '/api/dev/mails', PERMISSIONS.readOutgoingMail, async (_req, res) => {
      const dir = ctx.env.MAIL_CAPTURE_DIR;
      if (!dir) throw notFound('Mail capture');
      res.json({ mails: await listCapturedMails(dir) });
    }),
  ];
}
