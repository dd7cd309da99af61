import { createServer } from 'node:http';
import { OAuth2Server } from 'oauth2-mock-server';
import { close, defaultHost, listen, urlFor } from '../lib/listen.js';
import { Grants } from './grants.js';
import type { DemoIdentity } from './identities.js';
import { createOAuthApp } from './oauth-app.js';

export interface OAuthStandInOptions {
  host?: string;
  port?: number;
  clientId: string;
  clientSecret: string;
  redirectUris: string[];
  identities: DemoIdentity[];
}

export interface OAuthStandIn {
  issuer: string;
  authorizationUrl: string;
  tokenUrl: string;
  userinfoUrl: string;
  stop(): Promise<void>;
}

/** oauth2-mock-server on a private loopback port, fronted by our identity picker and token checks. */
export async function startOAuthStandIn(options: OAuthStandInOptions): Promise<OAuthStandIn> {
  const host = options.host ?? defaultHost;
  const grants = new Grants();
  const mock = new OAuth2Server();
  await mock.issuer.keys.generate('RS256');
  fillInIdentities(mock, grants);
  await mock.start(0, '127.0.0.1');
  const urls = { issuer: '', internal: `http://127.0.0.1:${mock.address().port}` };
  const server = createServer(createOAuthApp({ ...options, grants, urls }));
  try {
    const port = await listen(server, options.port ?? 0, host);
    urls.issuer = urlFor(host, port);
  } catch (error) {
    await mock.stop();
    throw error;
  }
  // Tokens and discovery must name the public address, not the loopback port the mock happens to use.
  mock.issuer.url = urls.issuer;
  return {
    issuer: urls.issuer,
    authorizationUrl: `${urls.issuer}/authorize`,
    tokenUrl: `${urls.issuer}/token`,
    userinfoUrl: `${urls.issuer}/userinfo`,
    async stop() {
      await close(server);
      await mock.stop();
    },
  };
}

function fillInIdentities(mock: OAuth2Server, grants: Grants): void {
  mock.service.on('beforeTokenSigning', (token, req) => {
    const profile = grants.redeemingProfile(req.body?.code);
    if (profile) Object.assign(token.payload, profile);
  });
  mock.service.on('beforeResponse', (response, req) => {
    const body = response.body as { access_token?: string };
    grants.finishRedeeming(String(req.body?.code ?? ''), body.access_token);
  });
  mock.service.on('beforeUserinfo', (response, req) => {
    // passport-google-oauth20 sends the token as ?access_token=, other clients as a Bearer header; Google takes both.
    const fromQuery = new URL(req.url ?? '/', 'http://x').searchParams.get('access_token');
    const profile = grants.profileForToken(fromQuery ?? bearerToken(req.headers.authorization));
    if (profile) {
      response.body = { ...profile };
    } else {
      response.statusCode = 401;
      response.body = { error: 'invalid_token', error_description: 'The access token is unknown or expired.' };
    }
  });
}

function bearerToken(header: string | undefined): string | undefined {
  return /^Bearer (.+)$/i.exec(header ?? '')?.[1];
}
