import express, { type RequestHandler } from 'express';
import { errorHandler } from '../../../../server/errors/error-handler';
import { createSessionLayer } from '../../../../server/modules/session/session-middleware';
import { sessionRouter } from '../../../../server/modules/session/session.router';
import { atlasRouter, siteBoundaryRouter } from '../../../../server/modules/atlas/atlas.router';
import { startTestApp, type TestApp } from '../../../support/test-app';

/**
 * The real app when it mounts the Atlas routes; until then the same session, CSRF and error
 * layers around the Atlas routers alone, so these tests run either way.
 */
export async function startAtlasTestApp(): Promise<TestApp> {
  const t = await startTestApp();
  if ((t.app.locals.apiRoutes as string[]).includes('GET /api/atlas')) return t;
  const app = express();
  const api = express.Router();
  api.use(express.json({ limit: '1mb', strict: true }));
  const sessions = createSessionLayer(t.db, t.env);
  api.use(...sessions.middleware);
  api.use(sessions.csrfProtection as RequestHandler);
  api.use('/session', sessionRouter(t.db, sessions));
  api.use('/atlas', atlasRouter(t.db));
  api.use('/sites', siteBoundaryRouter(t.db));
  app.use('/api', api);
  app.use(errorHandler(() => undefined));
  return { ...t, app: app as unknown as TestApp['app'] };
}
