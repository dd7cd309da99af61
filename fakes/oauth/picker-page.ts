import { escapeHtml, page } from '../lib/html.js';
import type { DemoIdentity } from './identities.js';

const extraStyles = `
  .identities { list-style: none; padding: 0; display: grid; gap: 0.75rem; }
  .identities button { width: 100%; text-align: left; background: #fff; color: var(--ink); border-color: var(--line);
    display: grid; grid-template-columns: 1fr auto; gap: 0.1rem 1rem; padding: 0.75rem 1rem; }
  .identities button:hover { background: #eef4ef; color: var(--ink); border-color: var(--accent); }
  .who { font-weight: 600; }
  .role { grid-row: span 2; align-self: center; font-size: 0.875rem; color: var(--accent-dark); background: #e3eee6;
    border-radius: 999px; padding: 0.1rem 0.6rem; }
  .email { color: var(--muted); }
  section + section { margin-top: 2rem; border-top: 1px solid var(--line); padding-top: 1rem; }
`;

// Plain words for the app's roles; any other label is shown as given.
const roleLabels: Record<string, string> = {
  applicant: 'Homeowner',
  staff: 'Office staff',
  crew: 'Crew lead',
  admin: 'Administrator',
};

/** The sign-in page people see locally instead of Google's: pick a demo person or type any e-mail. */
export function pickerPage(query: string, identities: DemoIdentity[], error?: string): string {
  const hidden = `<input type="hidden" name="query" value="${escapeHtml(query)}">`;
  const buttons = identities
    .map(
      (identity) => `<li><button type="submit" name="email" value="${escapeHtml(identity.email)}">
  <span class="who">${escapeHtml(identity.name)}</span>
  <span class="role">${escapeHtml(roleLabels[identity.role ?? 'applicant'] ?? identity.role)}</span>
  <span class="email">${escapeHtml(identity.email)}</span>
</button></li>`,
    )
    .join('\n');
  const alert = error ? `<p class="error" role="alert">${escapeHtml(error)}</p>` : '';
  const body = `<h1>Choose a demo identity</h1>
<p class="muted">This local sign-in stands in for Google while Gradepass runs on your machine. No password is asked.</p>
${alert}
<section aria-labelledby="known-heading">
<h2 id="known-heading">Demo people</h2>
<form method="post" action="/authorize">
${hidden}
<ul class="identities">
${buttons || '<li class="muted">No demo people are configured.</li>'}
</ul>
</form>
</section>
<section aria-labelledby="new-heading">
<h2 id="new-heading">Someone new</h2>
<form method="post" action="/authorize">
${hidden}
<label for="new-email">E-mail</label>
<input id="new-email" name="email" type="email" required autocomplete="email" placeholder="name@example.test">
<label for="new-name">Name <span class="muted">(optional)</span></label>
<input id="new-name" name="name" type="text" autocomplete="name">
<p><button type="submit">Sign in with this e-mail</button></p>
</form>
</section>`;
  return page('Sign in', body, extraStyles);
}

export function problemPage(message: string): string {
  return page('Sign-in problem', `<h1>Sign-in problem</h1>\n<p class="error" role="alert">${escapeHtml(message)}</p>`);
}
