import { escapeHtml } from './html-escape';
import type { MailAddress, MailMessage } from './mail-message';

// The sink's pages for a developer: a list of received mail and one message at a time.
// Quiet on purpose: neutral greys, one blue for links, system fonts, nothing moving.

const STYLE = `
  :root { color-scheme: light; --ink: #1d2125; --muted: #5f676f; --line: #dde1e5; --paper: #f5f6f7; --link: #235a97; }
  * { box-sizing: border-box; }
  body { margin: 0; background: var(--paper); color: var(--ink); font: 15px/1.5 system-ui, -apple-system, "Segoe UI", sans-serif; }
  header { display: flex; align-items: center; justify-content: space-between; gap: 1rem;
           padding: .9rem 1.5rem; background: #fff; border-bottom: 1px solid var(--line); }
  header h1 { font-size: 1.05rem; margin: 0; font-weight: 600; }
  header a { color: inherit; text-decoration: none; }
  main { max-width: 62rem; margin: 1.5rem auto; padding: 0 1.5rem; }
  a { color: var(--link); }
  table { width: 100%; border-collapse: collapse; background: #fff; border: 1px solid var(--line); }
  th, td { text-align: left; padding: .55rem .8rem; border-bottom: 1px solid var(--line); vertical-align: top; }
  th { font-size: .8rem; font-weight: 600; color: var(--muted); text-transform: uppercase; letter-spacing: .04em; }
  td.time { white-space: nowrap; color: var(--muted); font-variant-numeric: tabular-nums; }
  .empty { padding: 2.5rem; text-align: center; color: var(--muted); background: #fff; border: 1px solid var(--line); }
  .card { background: #fff; border: 1px solid var(--line); padding: 1.2rem 1.4rem; margin-bottom: 1.2rem; }
  .card h2 { font-size: 1.15rem; margin: 0 0 .8rem; }
  .card h3 { font-size: .8rem; margin: 0 0 .6rem; color: var(--muted); text-transform: uppercase; letter-spacing: .04em; }
  dl { display: grid; grid-template-columns: max-content 1fr; gap: .25rem 1rem; margin: 0; }
  dt { color: var(--muted); } dd { margin: 0; overflow-wrap: anywhere; }
  pre { white-space: pre-wrap; overflow-wrap: anywhere; margin: 0; font: 14px/1.5 ui-monospace, "SFMono-Regular", Menlo, monospace; }
  iframe { width: 100%; min-height: 28rem; border: 1px solid var(--line); background: #fff; }
  button { font: inherit; padding: .35rem .9rem; border: 1px solid var(--line); background: #fff; border-radius: 4px; cursor: pointer; }
  button:focus-visible, a:focus-visible { outline: 3px solid #9cc0e8; outline-offset: 2px; }
  ul { margin: 0; padding-left: 1.2rem; }
  caption { text-align: left; padding-bottom: .5rem; color: var(--muted); }
`;

function layout(title: string, body: string, actions = ''): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<header><h1><a href="/">Waygrade mail sink</a></h1>${actions}</header>
<main>
${body}
</main>
</body>
</html>`;
}

export function formatTime(iso: string | null): string {
  if (!iso) return '—';
  return `${iso.slice(0, 10)} ${iso.slice(11, 19)} UTC`;
}

function addressList(addresses: MailAddress[]): string {
  return addresses.map((entry) => (entry.name ? `${entry.name} <${entry.address}>` : entry.address)).join(', ');
}

export function renderMessageList(messages: MailMessage[], recipientFilter: string | null): string {
  const clearForm = `<form method="post" action="/messages/clear"><button type="submit">Clear all</button></form>`;
  const filterNote = recipientFilter
    ? `<p>Showing mail to <strong>${escapeHtml(recipientFilter)}</strong>. <a href="/">Show all</a></p>`
    : '';
  if (messages.length === 0) {
    return layout('Waygrade mail sink', `${filterNote}<p class="empty">No mail received yet.</p>`, clearForm);
  }
  const rows = messages
    .map(
      (message) => `<tr>
<td>${escapeHtml(addressList(message.to) || message.envelope.to.join(', '))}</td>
<td><a href="/messages/${encodeURIComponent(message.id)}">${escapeHtml(message.subject || '(no subject)')}</a></td>
<td class="time"><time datetime="${escapeHtml(message.receivedAt)}">${escapeHtml(formatTime(message.receivedAt))}</time></td>
</tr>`,
    )
    .join('\n');
  return layout(
    'Waygrade mail sink',
    `${filterNote}<table>
<caption>${messages.length} message${messages.length === 1 ? '' : 's'}, newest first</caption>
<thead><tr><th scope="col">To</th><th scope="col">Subject</th><th scope="col">Received</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>`,
    clearForm,
  );
}

export function renderMessage(message: MailMessage): string {
  const id = encodeURIComponent(message.id);
  const headerRows: [string, string][] = [
    ['From', addressList(message.from)],
    ['To', addressList(message.to)],
    ['Cc', addressList(message.cc)],
    ['Envelope to', message.envelope.to.join(', ')],
    ['Date', formatTime(message.date)],
    ['Received', formatTime(message.receivedAt)],
    ['Message-ID', message.messageId ?? ''],
  ];
  const headers = headerRows
    .filter(([, value]) => value !== '')
    .map(([label, value]) => `<dt>${label}</dt><dd>${escapeHtml(value)}</dd>`)
    .join('');
  const attachments = message.attachments.length
    ? `<section class="card"><h3>Attachments</h3><ul>${message.attachments
        .map(
          (attachment) =>
            `<li><a href="/api/messages/${id}/attachments/${attachment.index}">${escapeHtml(
              attachment.filename ?? `attachment ${attachment.index + 1}`,
            )}</a> (${escapeHtml(attachment.contentType)}, ${attachment.size.toLocaleString('en')} bytes)</li>`,
        )
        .join('')}</ul></section>`
    : '';
  // The HTML body is untrusted: it is shown from its own route, in a sandboxed frame that may
  // run no script, and under a CSP that blocks every remote load (no tracking pixels either).
  const html = message.html
    ? `<section class="card"><h3>HTML</h3><iframe title="HTML body" sandbox src="/messages/${id}/html"></iframe></section>`
    : '';
  const text = message.text
    ? `<section class="card"><h3>Text</h3><pre>${escapeHtml(message.text)}</pre></section>`
    : '';
  return layout(
    `${message.subject || '(no subject)'} · Waygrade mail sink`,
    `<p><a href="/">← All mail</a></p>
<section class="card"><h2>${escapeHtml(message.subject || '(no subject)')}</h2><dl>${headers}</dl>
<p><a href="/api/messages/${id}/raw">Raw source</a></p></section>
${attachments}${html}${text}`,
  );
}

export function renderNotFound(): string {
  return layout('Not found · Waygrade mail sink', `<p class="empty">No such message. It may have been cleared.</p>`);
}
