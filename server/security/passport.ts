import passport from 'passport';
import {
  Strategy as GoogleStrategy,
  type Profile,
  type StrategyOptions,
  type VerifyCallback,
} from 'passport-google-oauth20';
import type { AppContext } from '../config/context';
import type { Request } from 'express';
import { OAuthStateCookieStore } from './oauth-state-cookie';
import { personReadWithSession } from './session-store';
import { findSessionUser, signInWithProfile, SignInTurnedOffError } from '../services/users/users.service';

export const callbackPath = '/auth/google/callback';
const uuidPattern = /^[0-9a-f]{8}-([0-9a-f]{4}-){3}[0-9a-f]{12}$/i;

/**
 * Google sign-in. The same strategy talks to the local stand-in or to Google: only the three URL variables differ.
 */
export function configurePassport({ env, db }: Pick<AppContext, 'env' | 'db'>) {
  const strategy = new GoogleStrategy(
    {
      clientID: env.GOOGLE_CLIENT_ID,
      clientSecret: env.GOOGLE_CLIENT_SECRET,
      callbackURL: new URL(callbackPath, env.APP_ORIGIN).toString(),
      // Left undefined, passport-google-oauth20 uses Google's own endpoints.
      ...(env.GOOGLE_AUTHORIZATION_URL ? { authorizationURL: env.GOOGLE_AUTHORIZATION_URL } : {}),
      ...(env.GOOGLE_TOKEN_URL ? { tokenURL: env.GOOGLE_TOKEN_URL } : {}),
      ...(env.GOOGLE_USERINFO_URL ? { userProfileURL: env.GOOGLE_USERINFO_URL } : {}),
      scope: ['openid', 'email', 'profile'],
      state: true,
      pkce: true,
      // passport-oauth2 calls a five-argument store when PKCE is on; its types know only the older forms.
      store: new OAuthStateCookieStore(
        env.SESSION_SECRET,
        env.APP_ORIGIN.startsWith('https://'),
      ) as unknown as StrategyOptions['store'],
    } as StrategyOptions,
    (_accessToken: string, _refreshToken: string, profile: Profile, done: VerifyCallback) => {
      const email = profile.emails?.[0]?.value;
      const verified = profile.emails?.[0]?.verified !== false;
      if (!email || !verified) {
        done(null, false, { message: 'The sign-in provider did not give a verified e-mail address.' });
        return;
      }
      signInWithProfile(db, { sub: profile.id, email, name: profile.displayName ?? email })
        .then((user) => done(null, user))
        .catch((error: Error) =>
          // A turned-off person is told so plainly on the sign-in page, naming the company that did it.
          error instanceof SignInTurnedOffError
            ? done(null, false, { message: new SignInTurnedOffError(env.COMPANY_NAME).message })
            : done(error),
        );
    },
  );
  const instance = new passport.Passport();
  instance.use('google', strategy);
  instance.serializeUser((user, done) => done(null, user.id));
  // The person is usually read with the session already (session-store.ts); otherwise, by id here.
  instance.deserializeUser((req: Request, id: string, done: (error: unknown, user?: Express.User | false) => void) => {
    const read = personReadWithSession.get(req);
    if (read !== undefined) return done(null, read && read.id === id ? read : false);
    if (!uuidPattern.test(id)) return done(null, false);
    findSessionUser(db, id)
      .then((user) => done(null, user ?? false))
      .catch((error: unknown) => done(error));
  });
  return instance;
}

export type PassportInstance = ReturnType<typeof configurePassport>;
