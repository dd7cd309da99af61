import { escapeHtml, page } from '../lib/html.js';
import type { StoredMessage } from './message-store.js';

const when = (iso: string) => new Date(iso).toLocaleString('en-US', { dateStyle: 'medium', timeStyle: 'medium' });

export function inboxPage(messages: StoredMessage[]): string {
  const rows = [...messages]
    .reverse()
    .map(
      (m) => `<tr>
  <td><time datetime="${escapeHtml(m.receivedAt)}">${escapeHtml(when(m.receivedAt))}</time></td>
  <td>${escapeHtml(m.from)}</td>
  <td>${escapeHtml(m.to.join(', '))}</td>
  <td><a href="/messages/${encodeURIComponent(m.id)}">${escapeHtml(m.subject || '(no subject)')}</a></td>
</tr>`,
    )
    .join('\n');
  const table = messages.length
    ? `<table>
<caption class="muted">Newest first. JSON at <a href="/api/messages">/api/messages</a>.</caption>
<thead><tr><th scope="col">Received</th><th scope="col">From</th><th scope="col">To</th><th scope="col">Subject</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>
<form method="post" action="/clear"><p><button type="submit" class="secondary">Delete all messages</button></p></form>`
    : '<p class="muted">No messages yet. Anything the app sends over SMTP shows up here.</p>';
  return page('Caught e-mail', `<h1>Caught e-mail</h1>\n${table}`);
}

export function messagePage(m: StoredMessage): string {
  const id = encodeURIComponent(m.id);
  // The HTML part comes from the app under test, so it is shown only inside a sandboxed frame with no scripts.
  const html = m.html
    ? `<h2>HTML part</h2>
<iframe title="HTML part of the message" sandbox src="/messages/${id}/html"></iframe>`
    : '<p class="muted">This message has no HTML part.</p>';
  const body = `<p><a href="/">← All messages</a></p>
<h1>${escapeHtml(m.subject || '(no subject)')}</h1>
<dl>
  <dt>From</dt><dd>${escapeHtml(m.from)}</dd>
  <dt>To</dt><dd>${escapeHtml(m.to.join(', '))}</dd>
  <dt>Received</dt><dd><time datetime="${escapeHtml(m.receivedAt)}">${escapeHtml(when(m.receivedAt))}</time></dd>
  <dt>Message-ID</dt><dd>${escapeHtml(m.messageId)}</dd>
</dl>
<h2>Text part</h2>
<pre>${escapeHtml(m.text || '(no text part)')}</pre>
${html}`;
  return page(m.subject || 'Message', body);
}

export function notFoundPage(): string {
  return page('Not found', '<h1>Not found</h1><p><a href="/">Back to all messages</a></p>');
}
