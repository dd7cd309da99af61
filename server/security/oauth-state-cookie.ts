import { createCipheriv, createDecipheriv, createHash, randomBytes } from 'node:crypto';
import type { Request } from 'express';

const cookieName = 'gradepass.oauth';
const lifetimeMs = 10 * 60 * 1000;
const retry = 'The sign-in took too long or was started again in another tab. Please try again.';

interface Sealed {
  h: string;
  v: string;
  s?: unknown;
  e: number;
}
type Verified = (error: Error | null, verifier: string | false, stateOrInfo?: unknown) => void;

function readCookie(req: Request, name: string): string | undefined {
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const [key, ...value] = part.trim().split('=');
    if (key === name) return value.join('=');
  }
  return undefined;
}

/**
 * Keeps the OAuth state and PKCE verifier between the start of a sign-in and the provider's redirect back in a
 * short-lived encrypted cookie instead of the session, so nobody gets a session row (or a database write) before
 * the provider has said who they are. AES-GCM both hides the verifier and refuses a cookie that was tampered with.
 * Passport's state-store interface: store(req, verifier, state, meta, cb) and verify(req, state, cb).
 */
export class OAuthStateCookieStore {
  private readonly key: Buffer;
  private readonly cookie: { httpOnly: true; sameSite: 'lax'; secure: boolean; path: string; maxAge: number };

  constructor(secret: string, secure: boolean) {
    this.key = createHash('sha256').update(`oauth-state:${secret}`).digest();
    // Lax, because the provider sends the browser back with a top-level cross-site GET.
    this.cookie = { httpOnly: true, sameSite: 'lax', secure, path: '/auth/google', maxAge: lifetimeMs };
  }

  store(
    req: Request,
    verifier: string,
    state: unknown,
    _meta: unknown,
    done: (error: Error | null, handle?: string) => void,
  ) {
    const handle = randomBytes(18).toString('base64url');
    req.res!.cookie(
      cookieName,
      this.seal({ h: handle, v: verifier, s: state, e: Date.now() + lifetimeMs }),
      this.cookie,
    );
    done(null, handle);
  }

  verify(req: Request, providedState: string, done: Verified) {
    const sealed = readCookie(req, cookieName);
    req.res!.clearCookie(cookieName, { ...this.cookie, maxAge: undefined });
    const state = sealed ? this.open(sealed) : null;
    if (!state || state.e < Date.now() || state.h !== providedState) {
      done(null, false, { message: retry });
      return;
    }
    done(null, state.v, state.s);
  }

  private seal(value: Sealed): string {
    const iv = randomBytes(12);
    const cipher = createCipheriv('aes-256-gcm', this.key, iv);
    const body = Buffer.concat([cipher.update(JSON.stringify(value), 'utf8'), cipher.final()]);
    return Buffer.concat([iv, cipher.getAuthTag(), body]).toString('base64url');
  }

  private open(text: string): Sealed | null {
    try {
      const raw = Buffer.from(text, 'base64url');
      const decipher = createDecipheriv('aes-256-gcm', this.key, raw.subarray(0, 12));
      decipher.setAuthTag(raw.subarray(12, 28));
      const json = Buffer.concat([decipher.update(raw.subarray(28)), decipher.final()]).toString('utf8');
      return JSON.parse(json) as Sealed;
    } catch {
      return null;
    }
  }
}
