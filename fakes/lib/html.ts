const entities: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

export function escapeHtml(value: unknown): string {
  return String(value ?? '').replace(/[&<>"']/g, (ch) => entities[ch]);
}

// One small sheet for every stand-in page: serif headings and a deep green accent, nothing fetched from elsewhere.
const styles = `
  :root { --accent: #1f5130; --accent-dark: #143a22; --ink: #1d2420; --muted: #58625c; --line: #d6ddd8; --paper: #fbfbf8; }
  * { box-sizing: border-box; }
  body { margin: 0; font: 16px/1.5 system-ui, sans-serif; color: var(--ink); background: var(--paper); }
  header { background: var(--accent); color: #fff; padding: 0.75rem 1.5rem; }
  header p { margin: 0; font-family: Georgia, 'Times New Roman', serif; font-weight: bold; letter-spacing: 0.02em; }
  main { max-width: 56rem; margin: 0 auto; padding: 1.5rem; }
  h1, h2 { font-family: Georgia, 'Times New Roman', serif; color: var(--accent-dark); line-height: 1.2; }
  a { color: var(--accent); }
  button, .button { font: inherit; padding: 0.5rem 1rem; border-radius: 0.375rem; border: 1px solid var(--accent);
    background: var(--accent); color: #fff; cursor: pointer; text-decoration: none; display: inline-block; }
  button.secondary { background: #fff; color: var(--accent); }
  button:hover, .button:hover { background: var(--accent-dark); color: #fff; }
  :focus-visible { outline: 3px solid #e0a526; outline-offset: 2px; }
  label { display: block; font-weight: 600; margin-top: 0.75rem; }
  input[type=email], input[type=text] { font: inherit; width: 100%; max-width: 24rem; padding: 0.45rem 0.6rem;
    border: 1px solid var(--muted); border-radius: 0.375rem; }
  table { width: 100%; border-collapse: collapse; }
  th, td { text-align: left; padding: 0.5rem; border-bottom: 1px solid var(--line); vertical-align: top; }
  .muted { color: var(--muted); }
  .error { color: #8a1c1c; font-weight: 600; }
  pre { white-space: pre-wrap; background: #fff; border: 1px solid var(--line); padding: 1rem; border-radius: 0.375rem; }
  iframe { width: 100%; min-height: 24rem; border: 1px solid var(--line); background: #fff; border-radius: 0.375rem; }
`;

// The app's own mark, inline: without an icon the browser asks for /favicon.ico and logs the stand-in's 404.
const icon = `data:image/svg+xml,${encodeURIComponent(
  '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32"><rect width="32" height="32" rx="6" fill="#1d4a38"/><path d="M4 24 L12 22 L28 9" stroke="#f2b33d" stroke-width="3" fill="none" stroke-linecap="round"/></svg>',
)}`;

/** A complete page; `body` must already be escaped where it carries outside text. */
export function page(title: string, body: string, extraCss = ''): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)} · Gradepass</title>
<link rel="icon" href="${icon}">
<style>${styles}${extraCss}</style>
</head>
<body>
<header><p>Gradepass · local stand-in</p></header>
<main>
${body}
</main>
</body>
</html>`;
}
