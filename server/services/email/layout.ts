const escapeMap: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };
export const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => escapeMap[c]);

/** The last line of every e-mail about a request: why the person receives it and where a reply goes. */
export const requestFooter =
  'You receive this because you are part of this driveway entrance request in Gradepass. Reply to reach the office.';

export interface EmailContent {
  greeting: string;
  paragraphs: string[];
  link?: { href: string; label: string };
}

export function renderText(content: EmailContent, footer: string) {
  const lines = [content.greeting, '', ...content.paragraphs.flatMap((p) => [p, ''])];
  if (content.link) lines.push(`${content.link.label}: ${content.link.href}`, '');
  lines.push('--', footer);
  return lines.join('\n');
}

export function renderHtml(content: EmailContent, footer: string) {
  const body = content.paragraphs.map((p) => `<p style="margin:0 0 14px">${escapeHtml(p)}</p>`).join('');
  const button = content.link
    ? `<p style="margin:20px 0"><a href="${escapeHtml(content.link.href)}" style="background:#1d4a38;color:#fff;padding:10px 16px;border-radius:6px;text-decoration:none;font-weight:bold">${escapeHtml(content.link.label)}</a></p>`
    : '';
  return `<!doctype html><html><body style="margin:0;background:#faf8f3;font-family:Georgia,serif;color:#1c1f1d">
<div style="max-width:560px;margin:0 auto;padding:24px">
<p style="font-size:20px;font-weight:bold;color:#1d4a38;border-bottom:3px solid #f2b33d;padding-bottom:8px">Gradepass</p>
<p style="margin:0 0 14px">${escapeHtml(content.greeting)}</p>${body}${button}
<p style="font-size:12px;color:#6b7280;margin-top:24px">${escapeHtml(footer)}</p></div></body></html>`;
}
