import type { Request, RequestHandler } from 'express';
import session, { type SessionData } from 'express-session';
import connectSessionSequelize from 'connect-session-sequelize';
import passport from 'passport';
import { QueryTypes } from 'sequelize';
import { env, isProduction } from '../config/env';
import { sequelize } from '../config/database';
import { SESSION_USER_COLUMNS, sessionUser, toSessionUser, type SessionUserRow } from '../services/auth';

/** Idle timeout: a session unused this long ends. */
export const SESSION_IDLE_MS = 8 * 60 * 60 * 1000;
/** Absolute timeout: a session ends this long after sign-in, however busy. */
export const SESSION_ABSOLUTE_MS = 24 * 60 * 60 * 1000;
export const SESSION_COOKIE = isProduction ? '__Host-kettlewright' : 'kettlewright.sid';

const SequelizeStore = connectSessionSequelize(session.Store);
const LOADED_USER = Symbol('loaded user');
type LoadedSession = SessionData & { [LOADED_USER]?: Request['loadedSessionUser'] };

/**
 * Sessions in MariaDB through connect-session-sequelize, whose get() is replaced by one SELECT that also loads
 * the signed-in person and their brewery: a signed-in request costs one statement before its route runs.
 * What was loaded is handed to passport's deserializer on the request (req.loadedSessionUser).
 */
class SessionStore extends SequelizeStore {
  override get(sid: string, callback: (err: unknown, session?: SessionData | null) => void): void {
    sequelize
      .query<SessionUserRow & { data: string | null }>(
        `SELECT s.data, ${SESSION_USER_COLUMNS}
           FROM sessions s LEFT JOIN users u ON u.id = s.user_id LEFT JOIN breweries b ON b.id = u.brewery_id
          WHERE s.sid = ? AND s.expires > UTC_TIMESTAMP()`,
        { type: QueryTypes.SELECT, replacements: [sid] },
      )
      .then(([row]) => {
        if (!row?.data) return callback(null, null);
        const data = JSON.parse(row.data) as LoadedSession;
        if (row.userId !== null) data[LOADED_USER] = { id: row.userId, user: toSessionUser(row) };
        callback(null, data);
      }, callback);
  }

  /** express-session builds req.session here: the person loaded with it moves to the request, not the session. */
  override createSession(req: Request, data: SessionData): session.Session & SessionData {
    const loaded = data as LoadedSession;
    req.loadedSessionUser = loaded[LOADED_USER];
    delete loaded[LOADED_USER];
    return super.createSession(req, data);
  }
}

passport.serializeUser((user, done) => done(null, user.id));
passport.deserializeUser<number, Request>((req, id, done) => {
  const loaded = req.loadedSessionUser;
  if (loaded?.id === id) return done(null, loaded.user);
  sessionUser(id).then((user) => done(null, user), done);
});

/**
 * express-session with the store above. The cookie is re-sent only when the session is saved, which
 * sessionTimeouts does at most once a minute, so its expiry still follows the person's activity.
 */
export function sessionMiddleware(): RequestHandler {
  return session({
    name: SESSION_COOKIE,
    secret: env.SESSION_SECRET,
    store: new SessionStore({
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
    proxy: isProduction,
    cookie: { httpOnly: true, sameSite: 'lax', secure: isProduction, maxAge: SESSION_IDLE_MS, path: '/' },
  });
}

/** Idle and absolute timeouts, checked on the server (a copied cookie does not outlive them). */
export const sessionTimeouts: RequestHandler = (req, _res, next) => {
  if (!req.user) return next();
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
};
