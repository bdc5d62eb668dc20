import type { Request, RequestHandler } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { DataSource } from 'typeorm';
import { csrfSync } from 'csrf-sync';
import type { Env } from '../../config/env';
import { pgPool } from '../../db/data-source';
import { SessionUsers } from './session-users';
import { SignInThrottle } from './sign-in-throttle';
import { verifyPassword } from './passwords';
import type { SessionUser } from '../../../shared/schemas/users';

declare module 'express-session' {
  interface SessionData {
    signedInAt?: number;
    keptAliveAt?: number;
  }
}
declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}

/** Why a sign-in failed, as passport-local's verify callback reports it. */
export interface SignInFailure {
  message: string;
}

/**
 * The user read with the session (see QuietStore.get), carried from the session's data to its
 * request. A symbol, so express-session neither copies it into the session nor saves it.
 */
const userWithSession = Symbol('userWithSession');
type WithLoadedUser = { [userWithSession]?: SessionUser | null };

/** Sessions in PostgreSQL, passport-local sign-in, CSRF tokens and timeouts. */
export function createSessionLayer(db: DataSource, env: Env) {
  const users = new SessionUsers(db);
  const throttle = new SignInThrottle(db);
  const PgStore = connectPgSimple(session);
  // Rolling sessions would otherwise UPDATE the session row on every request. The store's touch
  // is skipped and `keepAlive` re-saves a signed-in session at most once a minute instead, so the
  // idle timeout holds to the minute at a fraction of the writes.
  //
  // Each request would also read its session and then, for passport, its user: two round trips.
  // `get` reads both in one query (the user only while active); `createSession` hands the user to
  // the request and deserializeUser takes it from there, so the user is still fresh every request.
  class QuietStore extends PgStore {
    private pruning = false;

    touch(_sid: string, _session: session.SessionData, callback?: () => void) {
      callback?.();
    }

    get(sid: string, callback: (error: unknown, data?: session.SessionData | null) => void) {
      // The base get starts the prune timer; pruneSessions starts it too, after one prune.
      if (!this.pruning) {
        this.pruning = true;
        this.pruneSessions();
      }
      users.loadSession(sid).then((found) => {
        if (!found) return callback(null, null);
        const data = found.sess as unknown as session.SessionData & WithLoadedUser;
        data[userWithSession] = found.user;
        callback(null, data);
      }, callback);
    }

    createSession(req: Request, data: session.SessionData) {
      const loaded = data as session.SessionData & WithLoadedUser;
      (req as Request & WithLoadedUser)[userWithSession] = loaded[userWithSession];
      delete loaded[userWithSession];
      return super.createSession(req, data);
    }
  }
  const pool = pgPool(db);
  const secure = env.HTTPS === 'true';

  const sessionMiddleware = session({
    name: secure ? '__Host-duskhaul' : 'duskhaul.sid',
    secret: env.SESSION_SECRET,
    store: new QuietStore({
      pool,
      tableName: 'sessions',
      createTableIfMissing: false,
      pruneSessionInterval: 15 * 60,
    }),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure,
      path: '/',
      maxAge: env.SESSION_IDLE_MINUTES * 60_000,
    },
  });

  passport.use(
    new LocalStrategy(
      { usernameField: 'email', passReqToCallback: true },
      async (req, email, password, done) => {
        try {
          const address = req.ip ?? 'unknown';
          await throttle.check(email, address);
          const found = await users.findForSignIn(email);
          const ok = await verifyPassword(found?.passwordHash ?? null, password);
          if (!found || !ok || !found.active) {
            await throttle.recordFailure(email, address);
            // Unknown e-mail, wrong password and deactivated account get the same answer.
            return done(null, false, { message: 'Wrong e-mail or password.' });
          }
          await throttle.recordSuccess(email, address);
          return done(null, found.user);
        } catch (error) {
          return done(error);
        }
      },
    ),
  );
  passport.serializeUser((user, done) => done(null, (user as SessionUser).id));
  passport.deserializeUser(
    (req: Request, id: string, done: (error: unknown, user?: SessionUser | false) => void) => {
      const loaded = (req as Request & WithLoadedUser)[userWithSession];
      if (loaded === null || loaded?.id === id) return done(null, loaded ?? false);
      users.findActive(id).then((user) => done(null, user ?? false), done);
    },
  );

  // Ends a session past its absolute lifetime, however active it has been.
  const absoluteTimeout: RequestHandler = (req, _res, next) => {
    const signedInAt = req.session?.signedInAt;
    if (signedInAt && Date.now() - signedInAt > env.SESSION_ABSOLUTE_HOURS * 3_600_000) {
      // A fresh, empty session: the old one is gone from the store.
      req.session.regenerate((error) => next(error));
      return;
    }
    next();
  };

  const keepAlive: RequestHandler = (req, _res, next) => {
    const signedIn = Boolean(
      (req.session as { passport?: { user?: string } } | undefined)?.passport?.user,
    );
    if (signedIn && Date.now() - (req.session.keptAliveAt ?? 0) > 60_000)
      req.session.keptAliveAt = Date.now();
    next();
  };

  const csrf = csrfSync({ getTokenFromRequest: (req) => req.get('x-csrf-token') });

  return {
    users,
    middleware: [
      sessionMiddleware,
      absoluteTimeout,
      keepAlive,
      passport.initialize(),
      passport.session(),
    ] as RequestHandler[],
    csrfProtection: csrf.csrfSynchronisedProtection,
    generateCsrfToken: csrf.generateToken,
  };
}

export type SessionLayer = ReturnType<typeof createSessionLayer>;
