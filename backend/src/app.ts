import { existsSync } from 'node:fs';
import { join } from 'node:path';

import cookieParser from 'cookie-parser';
import compression from 'compression';
import express, { type Express } from 'express';
import helmet from 'helmet';

import type { AppContext } from './app-context';
import { notFound } from './errors/app-error';
import { limitJsonDepth } from './lib/json-depth';
import { requestLog } from './lib/request-log';
import { refuseBrokenText } from './lib/well-formed-text';
import { strictTransportSecurity } from './lib/transport-security';
import { errorHandler } from './middleware/error-handler';
import { auditRoutes } from './routes/audit.routes';
import { authRoutes } from './routes/auth.routes';
import { calibratedEquipmentRoutes } from './routes/calibrated-equipment.routes';
import { devMailRoutes } from './routes/dev-mail.routes';
import { deviationRoutes } from './routes/deviations.routes';
import { fileRoutes } from './routes/files.routes';
import { healthRoutes } from './routes/health.routes';
import { inkRoutes } from './routes/inks.routes';
import { lotRoutes } from './routes/lots.routes';
import { printerRoutes } from './routes/printers.routes';
import { recipeVersionRoutes } from './routes/recipe-versions.routes';
import { recipeRoutes } from './routes/recipes.routes';
import { runRecordRoutes } from './routes/run-records.routes';
import { runSignOffRoutes } from './routes/run-sign-off.routes';
import { runStepRoutes } from './routes/run-steps.routes';
import { mountRoutes } from './routes/route-table';
import { runRoutes } from './routes/runs.routes';
import { settingsRoutes } from './routes/settings.routes';
import { substrateRoutes } from './routes/substrates.routes';
import { trendRoutes } from './routes/trends.routes';
import { userRoutes } from './routes/users.routes';

/** Builds the Express app (middleware, routes, error handler) without listening. */
export function createApp(ctx: AppContext): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', parseTrustProxy(ctx.env.TRUST_PROXY));
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'script-src': ["'self'"],
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'connect-src': ["'self'"],
          'worker-src': ["'self'", 'blob:'],
          'frame-ancestors': ["'none'"],
          'upgrade-insecure-requests': null,
        },
      },
      // Sent below, per request: only a response that travelled over TLS may carry it.
      strictTransportSecurity: false,
    }),
  );
  app.use(strictTransportSecurity);
  // gzip for text answers (JS, CSS, JSON): a tablet on weak Wi-Fi loads the run view several times faster.
  app.use(compression());
  // Read per request, so a test (or a reload) may swap the logger on the context.
  app.use('/api', requestLog(() => ctx.logger));
  app.use(express.json({ limit: '200kb' }));
  app.use(limitJsonDepth);
  app.use(refuseBrokenText);
  app.use(cookieParser());

  mountRoutes(app, ctx, [
    ...healthRoutes(ctx),
    ...authRoutes(ctx),
    ...userRoutes(ctx),
    ...settingsRoutes(ctx),
    ...auditRoutes(ctx),
    ...inkRoutes(ctx),
    ...substrateRoutes(ctx),
    ...lotRoutes(ctx),
    ...printerRoutes(ctx),
    ...calibratedEquipmentRoutes(ctx),
    ...recipeRoutes(ctx),
    ...recipeVersionRoutes(ctx),
    ...runRoutes(ctx),
    ...runStepRoutes(ctx),
    ...runRecordRoutes(ctx),
    ...runSignOffRoutes(ctx),
    ...deviationRoutes(ctx),
    ...trendRoutes(ctx),
    ...fileRoutes(ctx),
    ...devMailRoutes(ctx),
  ]);

  app.use('/api', () => {
    throw notFound('API route');
  });
  serveFrontend(app, ctx.env.STATIC_DIR);
  app.use(errorHandler(ctx));
  return app;
}

function serveFrontend(app: Express, dir: string | undefined) {
  if (!dir || !existsSync(join(dir, 'index.html'))) return;
  app.use(express.static(dir, { index: false, maxAge: '1h' }));
  // Client-side routes (/runs/12, /set-password/…) all load the single page.
  app.get('/{*splat}', (_req, res) => {
    res.set('Cache-Control', 'no-cache').sendFile(join(dir, 'index.html'));
  });
}

function parseTrustProxy(value: string): boolean | number | string {
  if (value === 'false' || value === '') return false;
  if (value === 'true') return true;
  const hops = Number(value);
  return Number.isInteger(hops) ? hops : value;
}
