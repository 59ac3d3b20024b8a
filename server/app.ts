import express, { type Express } from 'express';
import { randomUUID } from 'node:crypto';
import path from 'node:path';
import { existsSync } from 'node:fs';
import helmet from 'helmet';
import session from 'express-session';
import connectSessionSequelize from 'connect-session-sequelize';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { pinoHttp } from 'pino-http';
import { env, isProduction } from './config/env';
import { sequelize, databaseAnswers } from './config/database';
import './models';
import { sessionUser, verifyCredentials, toSessionUser } from './services/auth';
import { sameOrigin } from './middlewares/same-origin';
import { useSignInLimiter } from './middlewares/rate-limit';
import { errorHandler, notFoundHandler } from './middlewares/error-handler';
import { apiRouters } from './routes';
import { devMailRouter } from './dev/mail-page';

/** Idle timeout: a session unused this long ends. */
export const SESSION_IDLE_MS = 8 * 60 * 60 * 1000;
/** Absolute timeout: a session ends this long after sign-in, however busy. */
export const SESSION_ABSOLUTE_MS = 24 * 60 * 60 * 1000;
export const SESSION_COOKIE = isProduction ? '__Host-kettlewright' : 'kettlewright.sid';

const SequelizeStore = connectSessionSequelize(session.Store);

passport.use(
  new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
    verifyCredentials(email, password).then(
      (user) => done(null, user ? toSessionUser(user) : false),
      (err) => done(err),
    );
  }),
);
passport.serializeUser((user, done) => done(null, user.id));
passport.deserializeUser((id: number, done) => {
  sessionUser(id).then((user) => done(null, user), done);
});

export function createApp(options: { serveClient?: boolean } = {}): Express {
  const app = express();
  app.disable('x-powered-by');
  if (isProduction) app.set('trust proxy', 1);
  useSignInLimiter(app);

  app.use(
    pinoHttp({
      level: env.LOG_LEVEL,
      genReqId: (_req, res) => {
        const id = randomUUID();
        res.setHeader('x-request-id', id);
        return id;
      },
      autoLogging: env.NODE_ENV !== 'test',
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
  app.use(
    session({
      name: SESSION_COOKIE,
      secret: env.SESSION_SECRET,
      store: new SequelizeStore({
        db: sequelize,
        table: 'Session',
        expiration: SESSION_IDLE_MS,
        checkExpirationInterval: env.NODE_ENV === 'test' ? 0 : 15 * 60 * 1000,
        // The session is re-saved once a minute (lastSeenAt below) instead of touched on every request.
        // (A store option its type definitions omit.)
        ...({ disableTouch: true } as object),
        extendDefaultFields: (defaults: object, data: { passport?: { user?: number } }) => ({
          ...defaults,
          userId: data.passport?.user ?? null,
        }),
      }),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      proxy: isProduction,
      cookie: { httpOnly: true, sameSite: 'lax', secure: isProduction, maxAge: SESSION_IDLE_MS, path: '/' },
    }),
  );
  app.use(passport.initialize());
  app.use(passport.session());
  app.use((req, _res, next) => {
    if (!req.user) return next();
    // Idle and absolute timeouts, checked on the server (a copied cookie does not outlive them).
    const now = Date.now();
    const { signedInAt, lastSeenAt } = req.session;
    const idle = lastSeenAt !== undefined && now - lastSeenAt > SESSION_IDLE_MS;
    const expired = signedInAt !== undefined && now - signedInAt > SESSION_ABSOLUTE_MS;
    if (idle || expired) {
      req.logout(() => req.session.destroy(() => next()));
      return;
    }
    // Saved at most once a minute: keeps the row's expiry fresh without a write per request.
    if (lastSeenAt === undefined || now - lastSeenAt > 60_000) req.session.lastSeenAt = now;
    next();
  });

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
