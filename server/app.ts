// The Express application: API under /api/v1, then the exported web app with a fallback to its
// HTML for client-side routes.
import express, { type RequestHandler } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import pg from 'pg';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { AppContext } from './context';
import { sessionMiddleware } from './auth/session';
import { configurePassport } from './auth/passport';
import { csrf } from './auth/csrf';
import { createRateLimits } from './auth/rate-limits';
import { apiNotFound, errorHandler } from './http/errors';
import { currentUser } from './http/require-user';
import { healthRoutes } from './routes/health';
import { authRoutes } from './routes/auth';
import { accountRoutes } from './routes/account';
import { teamRoutes } from './routes/teams';
import { invitationRoutes } from './routes/invitations';
import { adminRoutes } from './routes/admin';
import { devRoutes } from './routes/dev';
import { studyAreaRoutes, teamStudyAreaRoutes } from './routes/study-areas';
import { runRoutes, scenarioRunRoutes, studyAreaRunRoutes } from './routes/runs';
import { noticeRoutes } from './routes/notices';
import { createRunQueue } from './jobs/run-queue';
import { scenarioRoutes, studyAreaScenarioRoutes } from './routes/scenarios';
import { studyAreaSurveyRoutes, surveyRoutes } from './routes/surveys';
import { downloadRoutes } from './routes/downloads';

export type App = { app: express.Express; close(): Promise<void> };

const requireSignIn: RequestHandler = (req, _res, next) => {
  currentUser(req);
  next();
};

export function createApp(ctx: AppContext): App {
  const { config, logger } = ctx;
  const app = express();
  const pool = new pg.Pool({ connectionString: config.databaseUrl, max: 5 });
  const auth = configurePassport();
  const limits = createRateLimits();
  const runQueue = createRunQueue(config.databaseUrl, logger);

  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'script-src': ["'self'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          // Over plain http (development on a LAN address) upgrading would break every request.
          'upgrade-insecure-requests': config.env === 'production' ? [] : null,
        },
      },
    }),
  );
  // Successful requests log at debug, so the console shows problems, not traffic.
  app.use(pinoHttp({ logger, autoLogging: config.env !== 'test', customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'debug') }));

  const api = express.Router();
  api.use(express.json({ limit: '100kb' }));
  api.use('/health', healthRoutes(ctx));
  api.use(sessionMiddleware(config, pool));
  api.use(auth.initialize());
  api.use(auth.session());
  api.use(csrf.csrfSynchronisedProtection);
  api.use('/auth', authRoutes(ctx, auth, limits));
  api.use('/invitations', invitationRoutes(ctx));
  api.use('/account', requireSignIn, accountRoutes());
  api.use('/teams', requireSignIn, teamRoutes(ctx));
  api.use('/teams/:teamId/study-areas', requireSignIn, teamStudyAreaRoutes(ctx));
  api.use('/study-areas/:studyAreaId/scenarios', requireSignIn, studyAreaScenarioRoutes(ctx));
  api.use('/study-areas/:studyAreaId/surveys', requireSignIn, studyAreaSurveyRoutes(ctx));
  api.use('/study-areas', requireSignIn, studyAreaRoutes(ctx));
  api.use('/scenarios', requireSignIn, scenarioRoutes(ctx));
  api.use('/surveys', requireSignIn, surveyRoutes());
  api.use('/scenarios/:scenarioId/runs', requireSignIn, scenarioRunRoutes(ctx, runQueue));
  api.use('/study-areas/:studyAreaId/runs', requireSignIn, studyAreaRunRoutes());
  api.use('/runs', requireSignIn, runRoutes(ctx, runQueue));
  api.use('/notices', requireSignIn, noticeRoutes());
  api.use('/admin', requireSignIn, adminRoutes(ctx));
  api.use(downloadRoutes());
  if (config.outboxEnabled) api.use('/dev', requireSignIn, devRoutes(ctx));
  api.use(apiNotFound);
  app.use('/api/v1', api);

  const indexHtml = path.join(config.webDir, 'index.html');
  if (existsSync(indexHtml)) {
    app.use(express.static(config.webDir, { index: false, maxAge: '1h' }));
    // Client-side routes (Expo Router) all load the same HTML.
    app.use((req, res, next) => (req.method === 'GET' ? res.sendFile(indexHtml) : next()));
  }
  app.use(errorHandler(logger));

  return {
    app,
    close: async () => {
      await runQueue.stop();
      await pool.end();
    },
  };
}
