import express, { type NextFunction, type Request, type Response } from 'express';
import { Grants, OAuthError } from './grants.js';
import { avatarSvg, emailPattern, nameFromEmail, profileFor, type DemoIdentity } from './identities.js';
import { pickerPage, problemPage } from './picker-page.js';

export interface OAuthAppOptions {
  clientId: string;
  clientSecret: string;
  redirectUris: string[];
  identities: DemoIdentity[];
  grants: Grants;
  /** Our public base URL and the loopback URL of oauth2-mock-server, known once both listen. */
  urls: { issuer: string; internal: string };
}

const pagePolicy =
  "default-src 'none'; style-src 'unsafe-inline'; img-src 'self' data:; base-uri 'none'; frame-ancestors 'none'";

/** The provider's public face: our picker at /authorize, our checks at /token, the rest handed to the mock. */
export function createOAuthApp(options: OAuthAppOptions) {
  const app = express();
  app.disable('x-powered-by');
  const form = express.urlencoded({ extended: false, limit: '16kb' });

  app.get('/authorize', async (req, res) => {
    const query = req.originalUrl.split(/\?(.*)/s)[1] ?? '';
    const request = readAuthorizeRequest(query, options);
    // Tests go straight through with login_hint; people get the page.
    if (request.loginHint)
      return complete(res, query, request, identityFor(request.loginHint, undefined, options.identities), options);
    return sendPage(res, 200, pickerPage(query, options.identities));
  });

  app.post('/authorize', form, async (req, res) => {
    const query = String(req.body?.query ?? '');
    const request = readAuthorizeRequest(query, options);
    const email = String(req.body?.email ?? '').trim();
    if (!emailPattern.test(email))
      return sendPage(
        res,
        400,
        pickerPage(query, options.identities, 'Enter an e-mail address like name@example.test.'),
      );
    return complete(res, query, request, identityFor(email, String(req.body?.name ?? ''), options.identities), options);
  });

  app.post('/token', form, async (req, res) => {
    const body: Record<string, string | undefined> = { ...req.body, ...basicAuthClient(req.headers.authorization) };
    try {
      options.grants.redeem(body, { id: options.clientId, secret: options.clientSecret });
      const answer = await fetch(`${options.urls.internal}/token`, {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
        body: new URLSearchParams(
          Object.entries(body).filter((entry): entry is [string, string] => typeof entry[1] === 'string'),
        ),
      });
      res
        .status(answer.status)
        .set('Cache-Control', 'no-store')
        .type('json')
        .send(await answer.text());
    } finally {
      options.grants.finishRedeeming(String(body.code ?? ''), undefined);
    }
  });

  for (const path of ['/userinfo', '/jwks', '/.well-known/openid-configuration']) {
    app.get(path, async (req, res) => {
      const headers: Record<string, string> = req.headers.authorization
        ? { authorization: req.headers.authorization }
        : {};
      const query = req.originalUrl.split(/\?(.*)/s)[1];
      const answer = await fetch(`${options.urls.internal}${path}${query ? `?${query}` : ''}`, { headers });
      res
        .status(answer.status)
        .type('json')
        .send(await answer.text());
    });
  }

  app.get('/avatars/:file', (req, res) => {
    const sub = /^(\d{1,30})\.svg$/.exec(req.params.file)?.[1];
    if (!sub) return res.status(404).end();
    return res
      .type('image/svg+xml')
      .set('Cache-Control', 'public, max-age=86400')
      .send(avatarSvg(sub, String(req.query.name ?? '?')));
  });

  app.use((error: unknown, req: Request, res: Response, _next: NextFunction) => {
    const problem = error instanceof OAuthError ? error : new OAuthError(500, 'server_error', String(error));
    if (req.path === '/authorize') return sendPage(res, problem.status, problemPage(problem.message));
    return res.status(problem.status).json({ error: problem.code, error_description: problem.message });
  });
  return app;
}

interface AuthorizeRequest {
  clientId: string;
  redirectUri: string;
  codeChallenge: string;
  loginHint?: string;
}

function readAuthorizeRequest(query: string, options: OAuthAppOptions): AuthorizeRequest {
  const params = new URLSearchParams(query);
  const clientId = params.get('client_id') ?? '';
  const redirectUri = params.get('redirect_uri') ?? '';
  // Never redirect to an unregistered address: these problems are shown on our own page instead.
  if (clientId !== options.clientId)
    throw new OAuthError(400, 'unauthorized_client', `Unknown client_id "${clientId}".`);
  if (!options.redirectUris.includes(redirectUri))
    throw new OAuthError(400, 'invalid_request', `redirect_uri "${redirectUri}" is not registered for this client.`);
  if (params.get('response_type') !== 'code')
    throw new OAuthError(400, 'unsupported_response_type', 'Only response_type=code is offered.');
  const codeChallenge = params.get('code_challenge') ?? '';
  if (!codeChallenge || params.get('code_challenge_method') !== 'S256') {
    throw new OAuthError(
      400,
      'invalid_request',
      'PKCE is required: send code_challenge with code_challenge_method=S256.',
    );
  }
  const loginHint = params.get('login_hint')?.trim();
  if (loginHint && !emailPattern.test(loginHint))
    throw new OAuthError(400, 'invalid_request', 'login_hint must be an e-mail address.');
  return { clientId, redirectUri, codeChallenge, loginHint: loginHint || undefined };
}

function identityFor(email: string, typedName: string | undefined, identities: DemoIdentity[]): DemoIdentity {
  const known = identities.find((identity) => identity.email.toLowerCase() === email.toLowerCase());
  const name = typedName?.trim() || known?.name || nameFromEmail(email);
  return { email, name, role: known?.role };
}

/** Lets oauth2-mock-server issue the code and redirect, and remembers who that code is for. */
async function complete(
  res: Response,
  query: string,
  request: AuthorizeRequest,
  identity: DemoIdentity,
  options: OAuthAppOptions,
) {
  const answer = await fetch(`${options.urls.internal}/authorize?${query}`, { redirect: 'manual' });
  const location = answer.headers.get('location');
  const code = location ? new URL(location).searchParams.get('code') : null;
  if (!location || !code)
    throw new OAuthError(502, 'server_error', `The OAuth server did not issue a code (status ${answer.status}).`);
  const profile = profileFor(identity, options.urls.issuer);
  profile.picture += `?name=${encodeURIComponent(profile.name)}`;
  options.grants.issueCode(code, {
    profile,
    clientId: request.clientId,
    redirectUri: request.redirectUri,
    codeChallenge: request.codeChallenge,
  });
  res.redirect(302, location);
}

function basicAuthClient(header: string | undefined): { client_id?: string; client_secret?: string } {
  const encoded = /^Basic (.+)$/i.exec(header ?? '')?.[1];
  if (!encoded) return {};
  const [id, secret] = Buffer.from(encoded, 'base64').toString('utf8').split(/:(.*)/s);
  return { client_id: decodeURIComponent(id), client_secret: decodeURIComponent(secret ?? '') };
}

function sendPage(res: Response, status: number, html: string) {
  return res.status(status).set('Content-Security-Policy', pagePolicy).type('html').send(html);
}
