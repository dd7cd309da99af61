import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { subjectFor } from '../../fakes/oauth/identities.js';
import { startOAuthStandIn, type OAuthStandIn } from '../../fakes/oauth/start-oauth.js';
import { authorizeQuery, client, identities, redeem } from './oauth-helpers.js';

let oauth: OAuthStandIn;

beforeAll(async () => {
  oauth = await startOAuthStandIn({
    port: 0,
    clientId: client.clientId,
    clientSecret: client.clientSecret,
    redirectUris: [client.redirectUri],
    identities,
  });
});

afterAll(async () => {
  await oauth?.stop();
});

function codeFrom(response: Response) {
  expect(response.status).toBe(302);
  const location = new URL(response.headers.get('location')!);
  expect(`${location.origin}${location.pathname}`).toBe(client.redirectUri);
  return { code: location.searchParams.get('code')!, state: location.searchParams.get('state') };
}

function choose(query: string, fields: Record<string, string>) {
  return fetch(oauth.authorizationUrl, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ query, ...fields }),
  });
}

async function userinfoFor(code: string, verifier: string) {
  const tokens = (await (await redeem(oauth.tokenUrl, code, verifier)).json()) as {
    access_token: string;
    id_token: string;
  };
  const response = await fetch(oauth.userinfoUrl, { headers: { authorization: `Bearer ${tokens.access_token}` } });
  expect(response.status).toBe(200);
  return { profile: (await response.json()) as Record<string, unknown>, tokens };
}

describe('OAuth stand-in', () => {
  it('publishes URLs that passport-google-oauth20 can use', async () => {
    expect(oauth.userinfoUrl.endsWith('/userinfo')).toBe(true);
    const discovery = (await (await fetch(`${oauth.issuer}/.well-known/openid-configuration`)).json()) as Record<
      string,
      string
    >;
    expect(discovery).toMatchObject({
      issuer: oauth.issuer,
      authorization_endpoint: oauth.authorizationUrl,
      token_endpoint: oauth.tokenUrl,
      userinfo_endpoint: oauth.userinfoUrl,
    });
  });

  it('shows a picker listing every demo identity and a field for a new e-mail', async () => {
    const response = await fetch(`${oauth.authorizationUrl}?${authorizeQuery().query}`);
    expect(response.status).toBe(200);
    const html = await response.text();
    expect(html).toContain('<h1>Choose a demo identity</h1>');
    for (const identity of identities) {
      expect(html).toContain(`<button type="submit" name="email" value="${identity.email}">`);
      expect(html).toContain(identity.name);
    }
    for (const label of ['Administrator', 'Office staff', 'Crew lead'])
      expect(html).toContain(`<span class="role">${label}</span>`);
    expect(html).toMatch(/<label for="new-email">E-mail<\/label>\s*<input id="new-email" name="email" type="email"/);
    // Nothing fetched from elsewhere: no script, and the only link is the icon drawn inline.
    expect(html).not.toMatch(/<script\b|<link\b(?![^>]*href="data:)|src="http/);
  });

  it('completes an authorization-code round trip with PKCE for the chosen identity', async () => {
    const { query, verifier, state } = authorizeQuery();
    const chosen = codeFrom(await choose(query, { email: identities[1].email }));
    expect(chosen.state).toBe(state);
    const { profile, tokens } = await userinfoFor(chosen.code, verifier);
    expect(profile).toEqual({
      sub: subjectFor(identities[1].email),
      email: identities[1].email,
      email_verified: true,
      name: 'Olive Marsh',
      given_name: 'Olive',
      family_name: 'Marsh',
      picture: expect.stringMatching(new RegExp(`^${oauth.issuer}/avatars/\\d+\\.svg`)),
    });
    const idClaims = JSON.parse(Buffer.from(tokens.id_token.split('.')[1], 'base64url').toString());
    expect(idClaims).toMatchObject({
      iss: oauth.issuer,
      aud: client.clientId,
      email: identities[1].email,
      sub: profile.sub,
    });
    const picture = await fetch(String(profile.picture));
    expect(picture.headers.get('content-type')).toContain('image/svg+xml');
  });

  it('signs in a typed new e-mail under the typed name', async () => {
    const { query, verifier } = authorizeQuery();
    const { code } = codeFrom(await choose(query, { email: 'Pat.Newcomer@Example.test', name: 'Pat Q. Newcomer' }));
    const { profile } = await userinfoFor(code, verifier);
    expect(profile).toMatchObject({
      email: 'pat.newcomer@example.test',
      name: 'Pat Q. Newcomer',
      given_name: 'Pat',
      family_name: 'Q. Newcomer',
    });
  });

  it('skips the page when login_hint names an e-mail', async () => {
    const { query, verifier } = authorizeQuery({ login_hint: 'river.applicant@example.test' });
    const response = await fetch(`${oauth.authorizationUrl}?${query}`, { redirect: 'manual' });
    const { profile } = await userinfoFor(codeFrom(response).code, verifier);
    expect(profile).toMatchObject({
      email: 'river.applicant@example.test',
      name: 'River Applicant',
      sub: subjectFor('river.applicant@example.test'),
    });
  });

  it('refuses a wrong code_verifier, a reused code and a wrong client secret', async () => {
    const first = authorizeQuery({ login_hint: identities[0].email });
    const a = codeFrom(await fetch(`${oauth.authorizationUrl}?${first.query}`, { redirect: 'manual' }));
    const wrongVerifier = await redeem(oauth.tokenUrl, a.code, 'x'.repeat(43));
    expect(wrongVerifier.status).toBe(400);
    expect(await wrongVerifier.json()).toMatchObject({ error: 'invalid_grant' });
    expect((await redeem(oauth.tokenUrl, a.code, first.verifier)).status).toBe(400);

    const second = authorizeQuery({ login_hint: identities[0].email });
    const b = codeFrom(await fetch(`${oauth.authorizationUrl}?${second.query}`, { redirect: 'manual' }));
    expect((await redeem(oauth.tokenUrl, b.code, second.verifier, { client_secret: 'nope' })).status).toBe(401);
  });

  it('refuses an unknown client, an unregistered redirect_uri and a request without PKCE, without redirecting', async () => {
    const cases = [
      authorizeQuery({ client_id: 'someone-else' }).query,
      authorizeQuery({ redirect_uri: 'http://evil.test/callback' }).query,
      authorizeQuery({ code_challenge_method: 'plain' }).query,
    ];
    for (const query of cases) {
      const response = await fetch(`${oauth.authorizationUrl}?${query}`, { redirect: 'manual' });
      expect(response.status).toBe(400);
      expect(response.headers.get('location')).toBeNull();
      expect(await response.text()).toContain('Sign-in problem');
    }
  });

  it('refuses userinfo for an unknown token', async () => {
    const response = await fetch(oauth.userinfoUrl, { headers: { authorization: 'Bearer made-up' } });
    expect(response.status).toBe(401);
  });
});
