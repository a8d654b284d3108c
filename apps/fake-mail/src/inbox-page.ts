import escapeHtml from 'escape-html';
import type { MessageDto } from './message-store';

const STYLE = `
  :root { color-scheme: light; --ink: #1d2a33; --muted: #5b6b75; --line: #d5dde2; --accent: #0b5c7a; }
  * { box-sizing: border-box; }
  body { margin: 0; font: 16px/1.5 system-ui, sans-serif; color: var(--ink); background: #f6f8f9; }
  header { padding: 1rem 1.25rem; background: #fff; border-bottom: 1px solid var(--line); }
  header h1 { margin: 0; font-size: 1.25rem; }
  header p { margin: .25rem 0 0; color: var(--muted); font-size: .9rem; }
  main { max-width: 60rem; margin: 0 auto; padding: 1rem 1.25rem 3rem; }
  ol { list-style: none; margin: 0; padding: 0; background: #fff; border: 1px solid var(--line); border-radius: .5rem; }
  li + li { border-top: 1px solid var(--line); }
  li a { display: grid; grid-template-columns: 1fr auto; gap: .125rem 1rem; padding: .75rem 1rem; color: inherit; text-decoration: none; }
  li a:hover, li a:focus-visible { background: #eef4f7; outline: none; }
  .subject { font-weight: 600; }
  .meta { color: var(--muted); font-size: .875rem; }
  .empty { padding: 2rem 1rem; text-align: center; color: var(--muted); }
  a.back { color: var(--accent); }
  dl { display: grid; grid-template-columns: max-content 1fr; gap: .25rem 1rem; margin: 1rem 0; }
  dt { color: var(--muted); }
  dd { margin: 0; overflow-wrap: anywhere; }
  h2 { font-size: 1.1rem; margin: 1.5rem 0 .5rem; }
  pre { white-space: pre-wrap; overflow-wrap: anywhere; background: #fff; border: 1px solid var(--line); border-radius: .5rem; padding: 1rem; margin: 0; }
  iframe { width: 100%; min-height: 30rem; border: 1px solid var(--line); border-radius: .5rem; background: #fff; }
`;

function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<header><h1>Local mail sink</h1><p>Development only: every message sent to this SMTP server stops here and is never delivered.</p></header>
<main>${body}</main>
</body>
</html>`;
}

/** The inbox list, newest first, each row linking to the message page. */
export function renderInbox(messages: MessageDto[]): string {
  const rows = messages
    .map(
      (m) => `<li><a href="/messages/${encodeURIComponent(m.id)}">
  <span class="subject">${escapeHtml(m.subject || '(no subject)')}</span>
  <time class="meta" datetime="${escapeHtml(m.receivedAt)}">${escapeHtml(formatTime(m.receivedAt))}</time>
  <span class="meta">From ${escapeHtml(m.from || '(unknown)')} · To ${escapeHtml(m.to.join(', '))}</span>
</a></li>`,
    )
    .join('\n');
  const list = messages.length
    ? `<ol aria-label="Messages, newest first">${rows}</ol>`
    : '<p class="empty">No messages yet.</p>';
  return layout(`Inbox (${messages.length})`, `<h2>Inbox (${messages.length})</h2>${list}`);
}

/** One message: headers, the text part, and the HTML part inside a sandboxed frame. */
export function renderMessage(m: MessageDto): string {
  const html =
    m.html === null
      ? '<p class="meta">This message has no HTML part.</p>'
      : `<iframe title="HTML part of the message" sandbox srcdoc="${escapeHtml(m.html)}"></iframe>`;
  const body = `<p><a class="back" href="/">← Back to the inbox</a></p>
<h2>${escapeHtml(m.subject || '(no subject)')}</h2>
<dl>
  <dt>From</dt><dd>${escapeHtml(m.from)}</dd>
  <dt>To</dt><dd>${escapeHtml(m.to.join(', '))}</dd>
  <dt>Received</dt><dd><time datetime="${escapeHtml(m.receivedAt)}">${escapeHtml(formatTime(m.receivedAt))}</time></dd>
</dl>
<h2>Text</h2>
<pre>${escapeHtml(m.text || '(empty)')}</pre>
<h2>HTML</h2>
${html}`;
  return layout(m.subject || 'Message', body);
}

/** A small page for an unknown message id. */
export function renderNotFound(): string {
  return layout(
    'Message not found',
    '<h2>Message not found</h2><p>It may have been cleared.</p><p><a class="back" href="/">← Back to the inbox</a></p>',
  );
}

function formatTime(iso: string): string {
  return iso.replace('T', ' ').replace(/\.\d+Z$/, ' UTC');
}
