import { createHash, timingSafeEqual } from 'node:crypto';
import type { OpenIdProfile } from './identities.js';

export class OAuthError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    description: string,
  ) {
    super(description);
  }
}

interface PendingCode {
  profile: OpenIdProfile;
  clientId: string;
  redirectUri: string;
  codeChallenge: string;
  expiresAt: number;
}

const codeLifetimeMs = 5 * 60 * 1000;
const tokenLifetimeMs = 60 * 60 * 1000;

/**
 * Which person each authorization code and access token stands for. oauth2-mock-server signs everyone in as the
 * same subject; this is what lets the hooks put the chosen identity into tokens and userinfo.
 */
export class Grants {
  private readonly codes = new Map<string, PendingCode>();
  private readonly redeeming = new Map<string, OpenIdProfile>();
  private readonly tokens = new Map<string, { profile: OpenIdProfile; expiresAt: number }>();

  issueCode(code: string, pending: Omit<PendingCode, 'expiresAt'>): void {
    this.codes.set(code, { ...pending, expiresAt: Date.now() + codeLifetimeMs });
  }

  /** Checks a token request the way a real provider would and returns the person the code was issued for. */
  redeem(body: Record<string, string | undefined>, client: { id: string; secret: string }): OpenIdProfile {
    if (body.grant_type !== 'authorization_code')
      throw new OAuthError(400, 'unsupported_grant_type', 'Only authorization_code is offered.');
    if (body.client_id !== client.id || body.client_secret !== client.secret)
      throw new OAuthError(401, 'invalid_client', 'Unknown client or wrong secret.');
    const pending = this.codes.get(body.code ?? '');
    // A code works once, whatever happens next.
    this.codes.delete(body.code ?? '');
    if (!pending || pending.expiresAt < Date.now())
      throw new OAuthError(400, 'invalid_grant', 'The code is unknown, used or expired.');
    if (pending.clientId !== body.client_id)
      throw new OAuthError(400, 'invalid_grant', 'The code was issued to another client.');
    if (pending.redirectUri !== body.redirect_uri)
      throw new OAuthError(400, 'invalid_grant', 'redirect_uri differs from the one used to get the code.');
    if (!body.code_verifier || !s256Matches(body.code_verifier, pending.codeChallenge)) {
      throw new OAuthError(400, 'invalid_grant', 'code_verifier does not match the S256 code_challenge.');
    }
    this.redeeming.set(body.code!, pending.profile);
    return pending.profile;
  }

  /** The person behind a code while oauth2-mock-server is building its tokens. */
  redeemingProfile(code: unknown): OpenIdProfile | undefined {
    return typeof code === 'string' ? this.redeeming.get(code) : undefined;
  }

  finishRedeeming(code: string, accessToken: string | undefined): void {
    const profile = this.redeeming.get(code);
    this.redeeming.delete(code);
    if (profile && accessToken) this.tokens.set(accessToken, { profile, expiresAt: Date.now() + tokenLifetimeMs });
  }

  profileForToken(token: string | undefined): OpenIdProfile | undefined {
    const entry = token ? this.tokens.get(token) : undefined;
    return entry && entry.expiresAt > Date.now() ? entry.profile : undefined;
  }
}

function s256Matches(verifier: string, challenge: string): boolean {
  const computed = Buffer.from(createHash('sha256').update(verifier).digest('base64url'));
  const expected = Buffer.from(challenge);
  return computed.length === expected.length && timingSafeEqual(computed, expected);
}
