import { createHash, randomBytes } from 'node:crypto';

export const client = {
  clientId: 'gradepass-test',
  clientSecret: 'test-secret',
  redirectUri: 'http://127.0.0.1:5170/auth/google/callback',
};

export const identities = [
  { email: 'avery.admin@gradepass.test', name: 'Avery Stone', role: 'admin' },
  { email: 'olive.office@gradepass.test', name: 'Olive Marsh', role: 'staff' },
  { email: 'cal.crew@gradepass.test', name: 'Cal Brook', role: 'crew' },
];

/** What passport-oauth2 puts on the authorization URL when state and pkce are on. */
export function authorizeQuery(extra: Record<string, string> = {}) {
  const verifier = randomBytes(32).toString('base64url');
  const state = randomBytes(12).toString('base64url');
  const params = new URLSearchParams({
    response_type: 'code',
    redirect_uri: client.redirectUri,
    scope: 'profile email',
    state,
    code_challenge: createHash('sha256').update(verifier).digest('base64url'),
    code_challenge_method: 'S256',
    client_id: client.clientId,
    ...extra,
  });
  return { query: params.toString(), verifier, state };
}

export async function redeem(tokenUrl: string, code: string, verifier: string, overrides: Record<string, string> = {}) {
  return fetch(tokenUrl, {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({
      grant_type: 'authorization_code',
      code,
      redirect_uri: client.redirectUri,
      client_id: client.clientId,
      client_secret: client.clientSecret,
      code_verifier: verifier,
      ...overrides,
    }),
  });
}
