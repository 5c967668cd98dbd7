import { randomUUID } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { configurePassport } from './auth/passport';
import { requireSameOrigin } from './auth/same-origin';
import { SESSION_COOKIE, sessionMiddleware } from './auth/session';
import { env, type Env } from './env';
import { AppError, errorHandler } from './errors';
import { logger } from './lib/logger';
import { apiRouter } from './routes/index';

/** Builds the Express app without listening, so tests mount it on port 0. */
export function createApp(e: Env = env()): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', e.TRUST_PROXY ? 1 : false);
  app.set('query parser', 'extended');

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          'default-src': ["'self'"],
          'script-src': ["'self'"],
          // Toast and table libraries set style elements at run time; scripts stay strictly same-origin.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'"],
          'connect-src': ["'self'"],
          'form-action': ["'self'"],
          'frame-ancestors': ["'none'"],
          'base-uri': ["'self'"],
          'object-src': ["'none'"],
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  // Every response names its request, so a report can be matched to the log.
  app.use((req, res, next) => {
    const incoming = req.headers['x-request-id'];
    const id = typeof incoming === 'string' && /^[\w-]{8,64}$/.test(incoming) ? incoming : randomUUID();
    (req as typeof req & { id: string }).id = id;
    res.setHeader('X-Request-Id', id);
    next();
  });
  // With logging off (tests, benchmarks), the per-request logger would only cost time.
  if (logger.level !== 'silent') {
    app.use(
      pinoHttp({
        logger,
        genReqId: (req) => (req as typeof req & { id: string }).id,
        autoLogging: { ignore: (req) => !req.url?.startsWith('/api') },
      }),
    );
  }

  const api = express.Router();
  const origins = [e.APP_ORIGIN, ...e.EXTRA_ORIGINS.split(',').map((s) => s.trim()).filter(Boolean)];
  api.use(requireSameOrigin(origins, ['/webhooks/stripe']));
  // The Stripe webhook needs the raw bytes for its signature check, so it is mounted before the JSON parser.
  api.use('/webhooks/stripe', express.raw({ type: '*/*', limit: '1mb' }));
  api.use(express.json({ limit: '1mb' }));
  api.use(express.urlencoded({ extended: false, limit: '100kb' }));
  const sessions = sessionMiddleware(e);
  const passport = configurePassport();
  const passportSession = passport.session();
  api.use(passport.initialize());
  // A reading request without our session cookie is anonymous: it needs no session (nothing to load, and an
  // unsaved one would only be generated and dropped). Everything else, sign-in included, gets one.
  const cookieMark = `${SESSION_COOKIE}=`;
  api.use((req, res, next) => {
    if ((req.method === 'GET' || req.method === 'HEAD') && !req.headers.cookie?.includes(cookieMark)) return next();
    sessions(req, res, (err?: unknown) => (err ? next(err) : passportSession(req, res, next)));
  });
  api.use(apiRouter);
  api.use((req, _res, next) => next(new AppError(404, 'not_found', `No API route for ${req.method} ${req.baseUrl}${req.path}`)));
  app.use('/api', api);

  // Listing photos in the local folder (S3 serves its own). Keys are unique per upload, so they cache forever.
  if (!e.S3_BUCKET?.trim()) {
    app.use('/media', express.static(path.resolve(e.MEDIA_DIR), { index: false, dotfiles: 'deny', immutable: true, maxAge: '1y', fallthrough: false }));
  }

  const clientDir = path.resolve(e.CLIENT_DIST);
  if (existsSync(path.join(clientDir, 'index.html'))) {
    app.use('/assets', express.static(path.join(clientDir, 'assets'), { immutable: true, maxAge: '1y', fallthrough: false }));
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // Client-side routes: every other GET gets the app shell, held in memory (it is read on every first visit;
    // a new build restarts the server).
    const shell = readFileSync(path.join(clientDir, 'index.html'));
    app.get(/^(?!\/api\/|\/media\/).*/, (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.type('html').send(shell);
    });
  }
  app.use(errorHandler);
  return app;
}
