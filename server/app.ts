import express, { type Express } from 'express';
import { randomUUID } from 'node:crypto';
import path from 'node:path';
import { existsSync } from 'node:fs';
import helmet from 'helmet';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import { env, isProduction } from './config/env';
import { databaseAnswers } from './config/database';
import './models';
import { sessionUser, verifyCredentials } from './services/auth';
import { sessionMiddleware, sessionTimeouts } from './middlewares/session';
import { sameOrigin } from './middlewares/same-origin';
import { useSignInLimiter } from './middlewares/rate-limit';
import { errorHandler, notFoundHandler } from './middlewares/error-handler';
import { wellFormedText } from './middlewares/validate';
import { apiRouters } from './routes';
import { devMailRouter } from './dev/mail-page';
import { logger } from './logger';

passport.use(
  new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
    verifyCredentials(email, password)
      .then((user) => (user ? sessionUser(user.id) : false))
      .then((user) => done(null, user), done);
  }),
);

/** A path as the logs keep it: the secret of a reset or invitation link is never written down. */
const loggedPath = (path: string) => path.replace(/\/(reset|invites)\/[^/?]+/, '/$1/…');

/** `logger` is where request logs and errors go (default: the process's logger, server/logger.ts). */
export function createApp(options: { serveClient?: boolean; logger?: Logger } = {}): Express {
  const app = express();
  app.disable('x-powered-by');
  if (isProduction) app.set('trust proxy', 1);
  useSignInLimiter(app);

  app.use(
    pinoHttp({
      logger: options.logger ?? logger,
      // The whole path: by the time a response finishes, a mounted router may have cut req.url down to its own part.
      customSuccessMessage: (req, res, responseTime) =>
        `${req.method} ${loggedPath((req as express.Request).originalUrl ?? req.url ?? '')} ${res.statusCode} ${Math.round(responseTime)} ms`,
      genReqId: (_req, res) => {
        const id = randomUUID();
        res.setHeader('x-request-id', id);
        return id;
      },
      autoLogging: env.NODE_ENV !== 'test',
      // What a request line records: never its headers (they carry the session cookie), and cheap to build.
      serializers: {
        req: (req: { id: string; method: string; url: string; remoteAddress: string }) => ({
          id: req.id,
          method: req.method,
          url: loggedPath(req.url),
          remoteAddress: req.remoteAddress,
        }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          styleSrc: ["'self'", "'unsafe-inline'"],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          upgradeInsecureRequests: isProduction ? [] : null,
        },
      },
      strictTransportSecurity: isProduction,
    }),
  );

  app.get('/api/health', async (_req, res) => {
    const database = await databaseAnswers();
    res.status(database ? 200 : 503).json({ status: database ? 'ok' : 'degraded', database });
  });

  app.use(express.json({ limit: '1mb' }));
  app.use('/api', wellFormedText);
  app.use(sessionMiddleware());
  app.use(passport.initialize());
  app.use(passport.session());
  app.use(sessionTimeouts);

  app.use('/api', sameOrigin);
  for (const [base, router] of apiRouters) app.use(base, router);
  if (env.NODE_ENV === 'development') app.use('/api/dev/mail', devMailRouter);
  app.use('/api', notFoundHandler);

  if (options.serveClient) {
    const dist = path.resolve('dist');
    if (!existsSync(path.join(dist, 'index.html'))) throw new Error('The client is not built: run `npm run build`');
    app.use(express.static(dist, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => res.sendFile(path.join(dist, 'index.html')));
  }

  app.use(errorHandler);
  return app;
}
