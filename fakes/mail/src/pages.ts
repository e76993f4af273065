import type { CapturedMessage } from './store.js';

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

const CSS = `
body { margin: 0; font: 15px/1.5 system-ui, sans-serif; color: #24211c; background: #faf7f2; }
header { background: #3d2f22; color: #fbefd9; padding: .7rem 1.25rem; display: flex; gap: 1rem; align-items: baseline; flex-wrap: wrap; }
header a { color: inherit; text-decoration: none; font-weight: 700; }
header small { opacity: .8; }
.wrap { max-width: 60rem; margin: 0 auto; padding: 1rem 1.25rem 3rem; }
.bar { display: flex; gap: .5rem; align-items: center; justify-content: space-between; flex-wrap: wrap; margin-bottom: .75rem; }
.bar input { padding: .3rem .5rem; border: 1px solid #b9ab98; border-radius: 4px; font: inherit; }
.bar button, .btn { padding: .3rem .8rem; border: 1px solid #6b5440; background: #fff; color: #3d2f22; border-radius: 4px; font: inherit; cursor: pointer; text-decoration: none; }
table { width: 100%; border-collapse: collapse; background: #fff; border: 1px solid #e0d6c8; }
th, td { text-align: left; padding: .45rem .6rem; border-bottom: 1px solid #eee5d9; vertical-align: top; }
th { font-size: .8rem; text-transform: uppercase; letter-spacing: .05em; color: #6b5440; background: #f4ede3; }
td a { color: #7a3e12; }
.empty { padding: 2rem; text-align: center; color: #7b6d5c; background: #fff; border: 1px dashed #cdbfad; }
dl { display: grid; grid-template-columns: max-content 1fr; gap: .2rem 1rem; background: #fff; border: 1px solid #e0d6c8; padding: .75rem 1rem; margin: 0 0 1rem; }
dt { color: #6b5440; } dd { margin: 0; word-break: break-word; }
h2 { font-size: 1rem; margin: 1.25rem 0 .4rem; }
pre { white-space: pre-wrap; background: #fff; border: 1px solid #e0d6c8; padding: .75rem 1rem; margin: 0; }
iframe { width: 100%; height: 28rem; border: 1px solid #e0d6c8; background: #fff; }
ul.files { background: #fff; border: 1px solid #e0d6c8; margin: 0; padding: .5rem 1rem .5rem 2rem; }
`;

function page(title: string, body: string): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title><style>${CSS}</style></head>
<body><header><a href="/">Captured mail</a><small>Local stand-in: nothing here was delivered to anyone.</small></header>
<div class="wrap">${body}</div></body></html>`;
}

function formatDate(iso: string): string {
  return iso.replace('T', ' ').replace(/\.\d+Z$/, ' UTC');
}

export function listPage(messages: CapturedMessage[], toFilter: string): string {
  const rows = messages
    .map(
      (m) => `<tr><td>${escapeHtml(formatDate(m.receivedAt))}</td><td>${escapeHtml(m.from)}</td>
<td>${escapeHtml((m.to.length ? m.to : m.envelope.to).join(', '))}</td>
<td><a href="/messages/${encodeURIComponent(m.id)}">${escapeHtml(m.subject || '(no subject)')}</a></td>
<td>${m.attachments.length || ''}</td></tr>`,
    )
    .join('\n');
  const table = messages.length
    ? `<table><thead><tr><th>Received</th><th>From</th><th>To</th><th>Subject</th><th>Files</th></tr></thead><tbody>${rows}</tbody></table>`
    : `<p class="empty">${toFilter ? 'No message to that address.' : 'No mail captured yet.'}</p>`;
  return page(
    'Captured mail',
    `<div class="bar"><form method="get" action="/"><input type="search" name="to" placeholder="Filter by recipient" value="${escapeHtml(toFilter)}">
<button type="submit">Filter</button></form>
<form method="post" action="/clear"><button type="submit">Delete all</button></form></div>
${table}`,
  );
}

export function messagePage(m: CapturedMessage): string {
  const base = `/api/messages/${encodeURIComponent(m.id)}`;
  const fields: [string, string][] = [
    ['From', m.fromName ? `${m.fromName} <${m.from}>` : m.from],
    ['To', m.to.join(', ')],
    ...(m.cc.length ? ([['Cc', m.cc.join(', ')]] as [string, string][]) : []),
    ['Envelope', `${m.envelope.from || '<>'} → ${m.envelope.to.join(', ')}`],
    ['Subject', m.subject],
    ['Date', formatDate(m.date)],
    ['Message-ID', m.messageId ?? ''],
  ];
  const meta = fields.map(([k, v]) => `<dt>${k}</dt><dd>${escapeHtml(v)}</dd>`).join('');
  const html = m.html === null ? '' : `<h2>HTML</h2><iframe sandbox="" title="HTML body" srcdoc="${escapeHtml(m.html)}"></iframe>`;
  const text = m.text === null ? '' : `<h2>Text</h2><pre>${escapeHtml(m.text)}</pre>`;
  const files = m.attachments.length
    ? `<h2>Attachments</h2><ul class="files">${m.attachments
        .map(
          (a, i) =>
            `<li><a href="${base}/attachments/${i}">${escapeHtml(a.filename)}</a> (${escapeHtml(a.contentType)}, ${a.size} bytes)</li>`,
        )
        .join('')}</ul>`
    : '';
  return page(
    m.subject || '(no subject)',
    `<div class="bar"><a class="btn" href="/">← All mail</a><a class="btn" href="${base}/raw">Download .eml</a></div>
<dl>${meta}</dl>${html}${text}${files}`,
  );
}

export function notFoundPage(): string {
  return page('Not found', '<p class="empty">No such message. It may have been deleted.</p>');
}
