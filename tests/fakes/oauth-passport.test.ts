import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import express from 'express';
import session from 'express-session';
import { Passport } from 'passport';
import { Strategy as GoogleStrategy, type Profile, type VerifyCallback } from 'passport-google-oauth20';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { startOAuthStandIn, type OAuthStandIn } from '../../fakes/oauth/start-oauth.js';
import { client, identities } from './oauth-helpers.js';

// The app's own wiring in miniature: passport-google-oauth20 with state and PKCE, pointed at the stand-in.
let oauth: OAuthStandIn;
let app: Server;
let appUrl: string;

beforeAll(async () => {
  const web = express();
  const passport = new Passport();
  web.use(session({ secret: 'test-only', resave: false, saveUninitialized: false }));
  web.get('/login', (req, res, next) =>
    passport.authenticate('google', { scope: ['profile', 'email'], loginHint: String(req.query.hint) } as object)(
      req,
      res,
      next,
    ),
  );
  web.get('/auth/callback', passport.authenticate('google', { session: false }), (req, res) => {
    res.json(req.user);
  });
  app = createServer(web);
  await new Promise<void>((resolve) => app.listen(0, '127.0.0.1', resolve));
  appUrl = `http://127.0.0.1:${(app.address() as AddressInfo).port}`;
  oauth = await startOAuthStandIn({
    clientId: client.clientId,
    clientSecret: client.clientSecret,
    redirectUris: [`${appUrl}/auth/callback`],
    identities,
  });
  passport.use(
    new GoogleStrategy(
      {
        clientID: client.clientId,
        clientSecret: client.clientSecret,
        callbackURL: `${appUrl}/auth/callback`,
        authorizationURL: oauth.authorizationUrl,
        tokenURL: oauth.tokenUrl,
        userProfileURL: oauth.userinfoUrl,
        state: true,
        pkce: true,
      },
      (_accessToken: string, _refreshToken: string, profile: Profile, done: VerifyCallback) =>
        done(null, profile as unknown as Express.User),
    ),
  );
});

afterAll(async () => {
  await oauth?.stop();
  await new Promise((resolve) => app?.close(resolve));
  app?.closeAllConnections();
});

it('signs a passport-google-oauth20 app in as the hinted identity', async () => {
  const login = await fetch(`${appUrl}/login?hint=${encodeURIComponent(identities[2].email)}`, { redirect: 'manual' });
  expect(login.status).toBe(302);
  const cookie = login.headers.get('set-cookie')!.split(';')[0];
  const toProvider = new URL(login.headers.get('location')!);
  expect(`${toProvider.origin}${toProvider.pathname}`).toBe(oauth.authorizationUrl);
  expect(toProvider.searchParams.get('code_challenge_method')).toBe('S256');

  const back = await fetch(toProvider, { redirect: 'manual' });
  expect(back.status).toBe(302);
  const callback = await fetch(back.headers.get('location')!, { headers: { cookie }, redirect: 'manual' });
  expect(callback.status).toBe(200);
  const profile = (await callback.json()) as Profile;
  expect(profile).toMatchObject({
    provider: 'google',
    displayName: 'Cal Brook',
    name: { givenName: 'Cal', familyName: 'Brook' },
    emails: [{ value: identities[2].email, verified: true }],
  });
  expect(profile.photos?.[0].value).toContain(`${oauth.issuer}/avatars/`);
});
