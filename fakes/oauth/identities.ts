import { createHash } from 'node:crypto';
import { escapeHtml } from '../lib/html.js';

export interface DemoIdentity {
  email: string;
  name: string;
  role?: string;
}

/** What Google's OpenID userinfo endpoint answers, which passport-google-oauth20 turns into a profile. */
export interface OpenIdProfile {
  sub: string;
  email: string;
  email_verified: true;
  name: string;
  given_name: string;
  family_name: string;
  picture: string;
}

export const emailPattern = /^[^\s@<>"]+@[^\s@<>"]+\.[^\s@<>"]+$/;

/** A numeric subject like Google's, derived from the e-mail so the same person keeps the same id across runs. */
export function subjectFor(email: string): string {
  const hex = createHash('sha256').update(email.trim().toLowerCase()).digest('hex');
  return `1${(BigInt(`0x${hex.slice(0, 16)}`) % 10n ** 20n).toString().padStart(20, '0')}`;
}

/** "jane.q-public@x" becomes "Jane Q Public", for people who type only an e-mail. */
export function nameFromEmail(email: string): string {
  const local = email.split('@')[0] ?? email;
  return local
    .split(/[._+-]+/)
    .filter(Boolean)
    .map((part) => part[0].toUpperCase() + part.slice(1))
    .join(' ');
}

export function profileFor(identity: DemoIdentity, issuer: string): OpenIdProfile {
  const email = identity.email.trim().toLowerCase();
  const name = identity.name.trim() || nameFromEmail(email);
  const [given, ...family] = name.split(/\s+/);
  const sub = subjectFor(email);
  return {
    sub,
    email,
    email_verified: true,
    name,
    given_name: given,
    family_name: family.join(' '),
    picture: `${issuer}/avatars/${sub}.svg`,
  };
}

const palette = ['#1f5130', '#2f6b4f', '#5b4a1f', '#23405f', '#6b2f3f'];

/** A plain initials badge, served by the stand-in so a profile picture never reaches outside the machine. */
export function avatarSvg(sub: string, name: string): string {
  const initials = name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((word) => word[0].toUpperCase())
    .join('');
  const colour = palette[Number(BigInt(sub) % BigInt(palette.length))];
  return `<svg xmlns="http://www.w3.org/2000/svg" width="96" height="96" viewBox="0 0 96 96" role="img" aria-label="${escapeHtml(name)}">
<rect width="96" height="96" rx="48" fill="${colour}"/>
<text x="48" y="58" text-anchor="middle" font-family="Georgia, serif" font-size="34" fill="#fff">${escapeHtml(initials)}</text>
</svg>`;
}
