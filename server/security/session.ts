import type { RequestHandler } from 'express';
import session from 'express-session';
import type { AppContext } from '../config/context';
import { SessionStore } from './session-store';

export const sessionCookieName = 'gradepass.sid';

declare module 'express-session' {
  interface SessionData {
    /** When the person signed in (ms since 1970): the absolute limit counts from here, however busy they are. */
    signedInAt: number;
  }
}

/**
 * Sessions in PostgreSQL, written only once someone has signed in. The cookie and the stored row both expire after
 * SESSION_IDLE_MINUTES without a request (rolling: every request moves the expiry on, and the row is written
 * when it lags by a minute; see session-store.ts); `endOldSessions` adds the
 * absolute limit of SESSION_MAX_DAYS from sign-in.
 */
export function sessionMiddleware(
  { env, pool, logger }: Pick<AppContext, 'env' | 'pool' | 'logger'>,
  secure: boolean,
): RequestHandler[] {
  const maxAgeMs = env.SESSION_MAX_DAYS * 86_400_000;
  const store = new SessionStore({
    pool,
    // A minute, or a tenth of the idle time if that is shorter: how far the stored expiry may lag the cookie's.
    slackMs: Math.min(60_000, env.SESSION_IDLE_MINUTES * 6_000),
    tableName: 'session',
    createTableIfMissing: false,
    // The store's own default logs with console.error; a database outage is already answered 503 by the app.
    errorLog: (...args: unknown[]) => logger.warn({ args }, 'session store error'),
  });
  const endOldSessions: RequestHandler = (req, res, next) => {
    const signedIn = (req.session as { passport?: unknown }).passport !== undefined;
    const signedInAt = req.session.signedInAt;
    if (!signedIn || (signedInAt !== undefined && Date.now() - signedInAt <= maxAgeMs)) return next();
    // Too old, or from before sessions recorded when they began: start again with an empty, unsaved session.
    req.session.regenerate((error) => {
      if (!error) res.clearCookie(sessionCookieName);
      next(error);
    });
  };
  return [
    session({
      name: sessionCookieName,
      secret: env.SESSION_SECRET,
      store,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', secure, maxAge: env.SESSION_IDLE_MINUTES * 60_000 },
    }),
    endOldSessions,
  ];
}
