import express, { type RequestHandler } from 'express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import type { Env } from './config/env';
import { AppError } from './errors/app-error';
import { errorHandler } from './errors/error-handler';
import { createSessionLayer } from './modules/session/session-middleware';
import { sessionRouter } from './modules/session/session.router';
import { healthRouter } from './modules/health/health.router';
import { apiRouters } from './routes';
import { tilesRouter } from './modules/tiles/tiles.router';
import { osrmRoadDistance } from './modules/calc/routing-service';
import { calendarFileRouter } from './modules/moves/calendar-feed';
import { JobQueue } from './modules/jobs/job-queue';
import { respondRouter } from './modules/proposals/respond.router';
import { paymentsWebhookRouter } from './modules/payments/payments.router';

export interface AppOptions {
  db: DataSource;
  env: Env;
  log?: (error: unknown) => void;
  /** The job queue requests enqueue into (e-mail); a send-only one over `db` when not given. */
  jobs?: JobQueue;
}

/** The Express app: security headers, sessions, CSRF, the API, the client build, errors. */
export function createApp({ db, env, log, jobs = new JobQueue(db, { log }) }: AppOptions) {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', env.TRUST_PROXY_HOPS);
  app.set('query parser', 'simple');

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          workerSrc: ["'self'", 'blob:'],
          manifestSrc: ["'self'"],
          objectSrc: ["'none'"],
          baseUri: ["'none'"],
          formAction: ["'self'"],
          frameAncestors: ["'none'"],
          ...(env.HTTPS === 'true' ? { upgradeInsecureRequests: [] } : {}),
        },
      },
      strictTransportSecurity: env.HTTPS === 'true',
    }),
  );

  app.use('/api/health', healthRouter(db));
  // The provider's signed events need the raw bytes: before the JSON parser, outside CSRF.
  const paymentsWebhook = paymentsWebhookRouter({ db, env });
  app.use('/api/payments', paymentsWebhook);
  // E-mailed proposal links: public pages outside /api (no session, no CSRF; the token is the key).
  app.use('/respond', respondRouter({ db, env, jobs, log }));

  const api = express.Router();
  api.use(express.json({ limit: '1mb', strict: true }));
  const sessions = createSessionLayer(db, env);
  api.use(...sessions.middleware);
  api.use(sessions.csrfProtection as RequestHandler);
  const mounted: Array<[string, express.Router]> = [
    ['/session', sessionRouter(db, sessions)],
    ...apiRouters(db, env.ROUTING_URL ? osrmRoadDistance(env.ROUTING_URL) : null, { env, jobs }),
  ];
  for (const [mount, router] of mounted) api.use(mount, router);
  // Every API route as "METHOD /api/path", for the authorization matrix test and docs.
  app.locals.apiRoutes = [
    'GET /api/health',
    ...routesOf('/api/payments', paymentsWebhook),
    ...mounted.flatMap(([mount, router]) => routesOf(`/api${mount}`, router)),
  ];
  api.use((req) => {
    throw new AppError(404, 'not_found', `No API route ${req.method} ${req.path}.`);
  });
  app.use('/api', api);

  // Secret per-user calendar feeds (no session: the token in the URL is the key).
  app.use('/calendar', calendarFileRouter(db));

  // Map tiles carry no tenant data: public, cacheable, outside the session and CSRF layers.
  app.use('/tiles', tilesRouter({ mbtilesPath: env.MBTILES_PATH }));

  const dist = path.resolve(env.CLIENT_DIST);
  if (existsSync(path.join(dist, 'index.html'))) {
    app.use(express.static(dist, { index: false, maxAge: '1h', setHeaders: immutableAssets }));
    app.get('/{*splat}', (_req, res) => res.sendFile(path.join(dist, 'index.html')));
  }

  app.use(errorHandler(log));
  return app;
}

function routesOf(prefix: string, router: express.Router): string[] {
  return router.stack.flatMap((layer) => {
    const route = layer.route as { path: string; methods: Record<string, boolean> } | undefined;
    if (!route) return [];
    const path = route.path === '/' ? prefix : `${prefix}${route.path}`;
    return Object.keys(route.methods).map((method) => `${method.toUpperCase()} ${path}`);
  });
}

// Vite fingerprints files under /assets: cache them for a year.
function immutableAssets(res: express.Response, filePath: string) {
  if (filePath.includes(`${path.sep}assets${path.sep}`))
    res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
}
