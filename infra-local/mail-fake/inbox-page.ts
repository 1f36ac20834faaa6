// HTML for the developers' inbox. Every message field is untrusted: escape it all.
import type { StoredMessage } from './store';

export function escapeHtml(value: string): string {
  return value
    .replaceAll('&', '&amp;')
    .replaceAll('<', '&lt;')
    .replaceAll('>', '&gt;')
    .replaceAll('"', '&quot;')
    .replaceAll("'", '&#39;');
}

// Makes http(s) URLs in the text part clickable; everything else stays escaped text.
function linkify(text: string): string {
  return text
    .split(/(https?:\/\/[^\s<>"']+)/g)
    .map((part, index) =>
      index % 2 === 1
        ? `<a href="${escapeHtml(part)}" rel="noopener noreferrer" target="_blank">${escapeHtml(part)}</a>`
        : escapeHtml(part),
    )
    .join('');
}

function formatDate(iso: string): string {
  return `${iso.slice(0, 10)} ${iso.slice(11, 19)} UTC`;
}

const STYLE = `
  :root { color-scheme: light; --ink: #1f2933; --muted: #52606d; --line: #d9e2ec; --accent: #0b5cad; }
  * { box-sizing: border-box; }
  body { margin: 0; font: 15px/1.5 system-ui, -apple-system, "Segoe UI", sans-serif; color: var(--ink); background: #f5f7fa; }
  header { background: #102a43; color: #fff; padding: 0.8rem 1.5rem; display: flex; gap: 1rem; align-items: baseline; }
  header h1 { font-size: 1.1rem; margin: 0; }
  header a, header span { color: #d9e2ec; font-size: 0.9rem; }
  main { max-width: 70rem; margin: 1.5rem auto; padding: 0 1.5rem; }
  table { width: 100%; border-collapse: collapse; background: #fff; border: 1px solid var(--line); }
  th, td { text-align: left; padding: 0.55rem 0.8rem; border-bottom: 1px solid var(--line); vertical-align: top; }
  th { font-size: 0.8rem; text-transform: uppercase; letter-spacing: 0.04em; color: var(--muted); background: #f0f4f8; }
  tr:hover td { background: #f0f7ff; }
  td.when { white-space: nowrap; color: var(--muted); font-variant-numeric: tabular-nums; }
  a { color: var(--accent); }
  .empty { background: #fff; border: 1px dashed var(--line); padding: 2rem; text-align: center; color: var(--muted); }
  dl { display: grid; grid-template-columns: max-content 1fr; gap: 0.3rem 1rem; background: #fff; border: 1px solid var(--line); padding: 1rem; margin: 0 0 1.2rem; }
  dt { color: var(--muted); } dd { margin: 0; overflow-wrap: anywhere; }
  h2 { font-size: 1rem; margin: 1.2rem 0 0.5rem; }
  pre { white-space: pre-wrap; overflow-wrap: anywhere; background: #fff; border: 1px solid var(--line); padding: 1rem; margin: 0; font: 14px/1.5 ui-monospace, monospace; }
  iframe { width: 100%; height: 60vh; resize: vertical; border: 1px solid var(--line); background: #fff; }
  .none { color: var(--muted); font-style: italic; }
`;

function page(title: string, body: string, refresh = false): string {
  return `<!doctype html>
<html lang="en-GB">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
${refresh ? '<meta http-equiv="refresh" content="5">' : ''}
<title>${escapeHtml(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<header><h1>Benchwright local inbox</h1><a href="/">All messages</a><a href="/api/messages">JSON</a></header>
<main>
${body}
</main>
</body>
</html>
`;
}

export function renderInbox(messages: StoredMessage[], smtpPort: number): string {
  if (messages.length === 0) {
    return page(
      'Benchwright local inbox',
      `<p class="empty">No messages yet. Mail sent to SMTP 127.0.0.1:${smtpPort} appears here (this page refreshes every 5 s).</p>`,
      true,
    );
  }
  const rows = messages
    .map((message) => {
      const href = `/messages/${encodeURIComponent(message.id)}`;
      return `<tr>
  <td class="when"><time datetime="${escapeHtml(message.date)}">${escapeHtml(formatDate(message.date))}</time></td>
  <td>${escapeHtml(message.to.join(', '))}</td>
  <td><a href="${escapeHtml(href)}">${escapeHtml(message.subject || '(no subject)')}</a></td>
</tr>`;
    })
    .join('\n');
  return page(
    'Benchwright local inbox',
    `<table>
<caption class="none">${messages.length} message${messages.length === 1 ? '' : 's'}, newest first; refreshes every 5 s</caption>
<thead><tr><th scope="col">Received</th><th scope="col">To</th><th scope="col">Subject</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>`,
    true,
  );
}

export function renderMessage(message: StoredMessage): string {
  const html =
    message.html === null
      ? '<p class="none">No HTML part.</p>'
      : // No allow-scripts and no allow-same-origin: the message cannot run code or reach this page.
        `<iframe title="HTML part" sandbox="allow-popups allow-popups-to-escape-sandbox" srcdoc="${escapeHtml(message.html)}"></iframe>`;
  const text = message.text ? `<pre>${linkify(message.text)}</pre>` : '<p class="none">No text part.</p>';
  return page(
    `${message.subject || '(no subject)'} · Benchwright local inbox`,
    `<dl>
  <dt>Subject</dt><dd>${escapeHtml(message.subject || '(no subject)')}</dd>
  <dt>From</dt><dd>${escapeHtml(message.from)}</dd>
  <dt>To</dt><dd>${escapeHtml(message.to.join(', '))}</dd>
  <dt>Received</dt><dd><time datetime="${escapeHtml(message.date)}">${escapeHtml(formatDate(message.date))}</time></dd>
  <dt>Id</dt><dd><a href="/api/messages/${escapeHtml(encodeURIComponent(message.id))}">${escapeHtml(message.id)}</a></dd>
</dl>
<h2>Text part</h2>
${text}
<h2>HTML part</h2>
${html}`,
  );
}

export function renderNotFound(): string {
  return page('Not found · Benchwright local inbox', '<p class="empty">No such message. It may have been cleared.</p>');
}
