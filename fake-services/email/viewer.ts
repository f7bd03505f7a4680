// HTML outbox viewer for the fake e-mail provider: a list of received messages and one page
// per message. Every link of a message is also listed outside the sandboxed frame so a
// browser test can open a magic link with an ordinary click.
import { escapeHtml } from "../shared/http";
import type { StoredMessage } from "./outbox";

const STYLES = `
:root{--ink:#18212b;--muted:#5d6876;--line:#d8dde4;--paper:#f3f5f7;--card:#fff;--accent:#17577e;--band:#26323f}
*{box-sizing:border-box}
body{margin:0;font:15px/1.5 system-ui,-apple-system,"Segoe UI",Roboto,sans-serif;color:var(--ink);background:var(--paper)}
a{color:var(--accent)}
.band{background:var(--band);color:#fff;padding:14px 24px;display:flex;flex-wrap:wrap;align-items:baseline;gap:6px 18px}
.band h1{margin:0;font-size:17px;font-weight:600;letter-spacing:.01em}
.band .note{color:#c3ccd6;font-size:13px}
.band a{color:#fff}
main{max-width:1000px;margin:22px auto;padding:0 16px}
.tools{display:flex;flex-wrap:wrap;gap:10px;align-items:center;margin-bottom:14px}
.tools input{font:inherit;padding:6px 9px;border:1px solid var(--line);border-radius:6px;min-width:260px}
.tools button,.tools .btn{font:inherit;padding:6px 12px;border:1px solid var(--accent);background:var(--accent);color:#fff;border-radius:6px;text-decoration:none;cursor:pointer}
.tools .btn.quiet{background:transparent;color:var(--accent)}
.count{color:var(--muted);font-size:13px;margin-left:auto}
table{width:100%;border-collapse:separate;border-spacing:0;background:var(--card);border:1px solid var(--line);border-radius:8px;overflow:hidden}
th,td{text-align:left;padding:9px 12px;border-bottom:1px solid var(--line);vertical-align:top}
tr:last-child td{border-bottom:0}
th{font-size:12px;text-transform:uppercase;letter-spacing:.05em;color:var(--muted);background:#eaeef2;font-weight:600}
td.when,td.id{white-space:nowrap;font-variant-numeric:tabular-nums;color:var(--muted);font-size:13px}
td.id code{font-size:12px}
.empty{padding:36px;text-align:center;color:var(--muted);background:var(--card);border:1px dashed var(--line);border-radius:8px}
.sheet{background:var(--card);border:1px solid var(--line);border-radius:8px;padding:16px 18px;margin-bottom:16px}
.sheet h2{margin:0 0 10px;font-size:19px}
dl{display:grid;grid-template-columns:max-content 1fr;gap:4px 16px;margin:0}
dt{color:var(--muted);font-size:13px}
dd{margin:0;word-break:break-word}
h3{font-size:13px;text-transform:uppercase;letter-spacing:.05em;color:var(--muted);margin:18px 0 8px}
iframe{width:100%;height:62vh;border:1px solid var(--line);border-radius:8px;background:#fff}
ul.links{margin:0;padding-left:20px}
ul.links li{margin:3px 0;word-break:break-all}
pre{white-space:pre-wrap;word-break:break-word;background:var(--card);border:1px solid var(--line);border-radius:8px;padding:14px;font:13px/1.5 ui-monospace,Menlo,Consolas,monospace}
`;

function page(title: string, body: string): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>${escapeHtml(title)}</title><style>${STYLES}</style></head>
<body><div class="band"><h1><a href="/" style="text-decoration:none">Local outbox</a></h1>
<span class="note">Stand-in for the e-mail provider. Nothing here was delivered to anyone.</span></div>
<main>${body}</main></body></html>`;
}

function formatWhen(iso: string): string {
  // The instant in UTC, to the second: the viewer is a developer tool, not a member screen.
  return `${iso.slice(0, 10)} ${iso.slice(11, 19)} UTC`;
}

export function renderOutboxPage(messages: StoredMessage[], filterTo: string | null): string {
  const rows = messages
    .map(
      (m) => `<tr>
<td class="when">${escapeHtml(formatWhen(m.createdAt))}</td>
<td>${escapeHtml(m.to.join(", "))}</td>
<td><a href="/messages/${encodeURIComponent(m.id)}">${escapeHtml(m.subject)}</a></td>
<td class="id"><code>${escapeHtml(m.id)}</code></td></tr>`,
    )
    .join("\n");
  const table = messages.length
    ? `<table><thead><tr><th>Received</th><th>To</th><th>Subject</th><th>Id</th></tr></thead><tbody>${rows}</tbody></table>`
    : `<div class="empty">No messages${filterTo ? ` to ${escapeHtml(filterTo)}` : ""} yet.</div>`;
  const tools = `<form class="tools" method="get" action="/">
<input type="search" name="to" placeholder="Filter by recipient address" value="${escapeHtml(filterTo ?? "")}">
<button type="submit">Filter</button><a class="btn quiet" href="/">Refresh</a>
<span class="count">${messages.length} message${messages.length === 1 ? "" : "s"}, newest first</span></form>`;
  return page("Local outbox", tools + table);
}

/** Every href in an HTML body, de-duplicated, in document order. */
export function extractLinks(html: string): string[] {
  const found: string[] = [];
  for (const m of html.matchAll(/<a\b[^>]*?\bhref\s*=\s*("([^"]*)"|'([^']*)'|([^\s>]+))/gi)) {
    const raw = m[2] ?? m[3] ?? m[4] ?? "";
    const href = raw.replace(/&amp;/g, "&").replace(/&quot;/g, '"').replace(/&#39;/g, "'");
    if (href && !found.includes(href)) found.push(href);
  }
  return found;
}

function extractTextLinks(text: string): string[] {
  return [...new Set(text.match(/https?:\/\/[^\s<>"')]+/g) ?? [])];
}

function isNavigable(href: string): boolean {
  return /^(https?:|mailto:|\/)/i.test(href);
}

export function renderMessagePage(m: StoredMessage): string {
  const meta: [string, string][] = [
    ["From", m.from],
    ["To", m.to.join(", ")],
    ...(m.cc.length ? ([["Cc", m.cc.join(", ")]] as [string, string][]) : []),
    ...(m.bcc.length ? ([["Bcc", m.bcc.join(", ")]] as [string, string][]) : []),
    ...(m.replyTo.length ? ([["Reply-To", m.replyTo.join(", ")]] as [string, string][]) : []),
    ["Received", formatWhen(m.createdAt)],
    ["Id", m.id],
    ...Object.entries(m.headers).map(([k, v]) => [k, v] as [string, string]),
  ];
  const dl = meta.map(([k, v]) => `<dt>${escapeHtml(k)}</dt><dd>${escapeHtml(v)}</dd>`).join("");
  const links = [...(m.html ? extractLinks(m.html) : []), ...(m.text ? extractTextLinks(m.text) : [])].filter(
    (href, i, all) => isNavigable(href) && all.indexOf(href) === i,
  );
  const linkList = links.length
    ? `<h3>Links in this message</h3><ul class="links">${links
        .map((h) => `<li><a href="${escapeHtml(h)}">${escapeHtml(h)}</a></li>`)
        .join("")}</ul>`
    : "";
  // The frame runs no scripts and gets no same-origin access; <base target="_top"> makes a
  // click inside it replace this page, as a mail client opening a link would.
  const frame = m.html
    ? `<h3>HTML body</h3><iframe title="Message body" sandbox="allow-popups allow-popups-to-escape-sandbox allow-top-navigation-by-user-activation" srcdoc="${escapeHtml(
        `<base target="_top">${m.html}`,
      )}"></iframe>`
    : "";
  const text = m.text ? `<h3>Text body</h3><pre>${escapeHtml(m.text)}</pre>` : "";
  const body = `<p><a href="/">&larr; All messages</a></p>
<section class="sheet"><h2>${escapeHtml(m.subject)}</h2><dl>${dl}</dl>${linkList}</section>${frame}${text}`;
  return page(m.subject, body);
}

export function renderNotFoundPage(id: string): string {
  return page("Not found", `<div class="empty">No message with id <code>${escapeHtml(id)}</code>.</div>`);
}
